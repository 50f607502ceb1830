#include "ExactResponse.h"

#include "EquilibratedLu.h"
#include "Errors.h"
#include "OriginMultiplicity.h"
#include "PencilRoots.h"
#include "RootPolynomial.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <set>

namespace tauline {

namespace {

using cd = std::complex<double>;

int floatingComponents(const std::vector<int>& labels)
{
    std::set<int> floating;
    for (int l : labels)
        if (l != 0)
            floating.insert(l);
    return static_cast<int>(floating.size());
}

// H at one point on the imaginary axis (there a node's small conductance
// and large susceptance sit in separate parts of one entry, and no digits are
// lost adding them), with how much the output's sum cancels: Σ|c_i·x_i|/|H|.
// The sum is taken in extended precision over x and its last correction
// kept apart, which recovers most of what the cancellation would lose.
struct Evaluation {
    cd s;
    cd h;
    double cancellation = 1.0;
};

Eigen::Matrix<std::complex<long double>, Eigen::Dynamic, Eigen::Dynamic> extendedMatrix(const NodalModel& model, cd s)
{
    using Extended = std::complex<long double>;
    return model.extendedG.cast<Extended>() + Extended(s.real(), s.imag()) * model.extendedC.cast<Extended>();
}

Evaluation evaluateWithCancellation(const NodalModel& model, double omega)
{
    using Extended = std::complex<long double>;
    const cd s(0.0, omega);
    const Eigen::MatrixXcd a = model.G.cast<cd>() + s * model.C.cast<cd>();
    const EquilibratedLu<cd> lu(a, extendedMatrix(model, s));
    const Eigen::MatrixXcd x = lu.solve(model.b.cast<cd>(), 2);
    const Eigen::MatrixXcd correction = lu.solve(lu.residual(model.b.cast<cd>(), x).cast<cd>(), 0);
    Extended sum = 0.0L;
    long double magnitude = 0.0L;
    for (int i = 0; i < model.unknowns(); ++i) {
        if (model.c(i) == 0.0)
            continue;
        const Extended term = static_cast<long double>(model.c(i)) *
                              (Extended(x(i, 0)) + Extended(correction(i, 0)));
        sum += term;
        magnitude += std::abs(term);
    }
    Evaluation out;
    out.s = s;
    out.h = cd(static_cast<double>(sum.real()), static_cast<double>(sum.imag()));
    out.cancellation = std::abs(sum) > 0.0L ? static_cast<double>(magnitude / std::abs(sum)) : 1e300;
    return out;
}

// Points to evaluate H at for the gain: decades around s1, where the
// output's cancellation differs (it grows with frequency on some networks,
// falls on others).
std::vector<Evaluation> gainEvaluations(const NodalModel& model, double s1)
{
    std::vector<Evaluation> out;
    for (double factor : {1.0, 1.0 / 30.0, 30.0, 1e-3, 1e3})
        out.push_back(evaluateWithCancellation(model, s1 * factor * 1.0137));
    return out;
}

// The lowest non-zero numerator coefficient K' from exact evaluations:
// H(s) = K'·s^(mz−mp)·Π(1 − s/z)/Π(1 − s/p), taken at the point where the
// error is smallest: the evaluation's cancellation, the roots' rounding as
// the factors amplify it near a root, and the imaginary part K' must not
// have (each an estimate of relative error).
double gainFromEvaluation(const std::vector<Evaluation>& points, const std::vector<cd>& poles,
                          const std::vector<cd>& zeros)
{
    const int power = originCount(zeros) - originCount(poles);
    double best = 0.0;
    double bestError = std::numeric_limits<double>::infinity();
    for (const Evaluation& e : points) {
        const cd zf = productOfFactors(zeros, e.s);
        const cd pf = productOfFactors(poles, e.s);
        if (std::abs(zf) < 1e-6 || std::abs(pf) < 1e-6 || e.h == cd(0.0, 0.0))
            continue;  // too near a root for a clean quotient
        const cd estimate = e.h * pf / (zf * std::pow(e.s, power));
        double amplified = 0.0;
        for (const auto* list : {&zeros, &poles})
            for (const cd& r : *list)
                if (r != cd(0.0, 0.0))
                    amplified += std::abs(e.s / r) / std::abs(1.0 - e.s / r);
        const double error = std::max({1e-16 * e.cancellation, 1e-13 * amplified,
                                       std::abs(estimate.imag()) / std::abs(estimate)});
        if (error < bestError) {
            bestError = error;
            best = estimate.real();
        }
    }
    if (!std::isfinite(bestError))
        throw InputError("response: cannot evaluate the network away from its poles and zeros");
    return best;
}

double geometricMeanMagnitude(const std::vector<cd>& a, const std::vector<cd>& b, double fallback)
{
    double sum = 0.0;
    int count = 0;
    for (const auto* list : {&a, &b})
        for (const auto& r : *list)
            if (r != cd(0.0, 0.0)) {
                sum += std::log(std::abs(r));
                ++count;
            }
    return count ? std::exp(sum / count) : fallback;
}

void cancelCommonRoots(std::vector<cd>& poles, std::vector<cd>& zeros)
{
    std::vector<bool> poleUsed(poles.size(), false);
    std::vector<cd> keptZeros;
    for (const auto& z : zeros) {
        bool cancelled = false;
        for (size_t i = 0; i < poles.size() && !cancelled; ++i) {
            if (poleUsed[i])
                continue;
            const double scale = std::max(std::abs(poles[i]), std::abs(z));
            if (std::abs(poles[i] - z) <= kCancellationTolerance * scale) {
                poleUsed[i] = true;
                cancelled = true;
            }
        }
        if (!cancelled)
            keptZeros.push_back(z);
    }
    std::vector<cd> keptPoles;
    for (size_t i = 0; i < poles.size(); ++i)
        if (!poleUsed[i])
            keptPoles.push_back(poles[i]);
    poles = std::move(keptPoles);
    zeros = std::move(keptZeros);
}

// A complex root whose real part is below what double precision resolves
// beside its size lies on the jω axis (an ideal notch's zeros): Q is
// infinite, not 1e15, and the polynomial's odd terms are exactly zero.
// Roots are accurate to ~1e-15 of their size; a real damping of 1e-13 of
// it (Q = 5e12) no physical network resolves.
void snapToImaginaryAxis(std::vector<cd>& roots)
{
    for (cd& r : roots)
        if (r.imag() != 0.0 && std::abs(r.real()) <= 1e-13 * std::abs(r))
            r = cd(0.0, r.imag());
}

}  // namespace

double lowestRate(const NodalModel& model)
{
    return 1.0 / (model.sumResistance * model.sumCapacitance);
}

double highestRate(const NodalModel& model)
{
    const double parts = (model.resistorCount + 1.0) * (model.capacitorCount() + 1.0);
    return std::max(lowestRate(model) * 10.0, parts / (model.minResistance * model.minCapacitance));
}

cd directResponse(const NodalModel& model, cd s)
{
    const Eigen::MatrixXcd a = model.G.cast<cd>() + s * model.C.cast<cd>();
    const Eigen::MatrixXcd x = EquilibratedLu<cd>(a, extendedMatrix(model, s)).solve(model.b.cast<cd>());
    return model.c.cast<cd>().dot(x.col(0));  // dot conjugates its first argument: c is real
}

cd ExactResponse::evaluate(cd s) const
{
    return evaluateFactored(gainConstant, originPower, zeros, poles, s);
}

ExactResponse solveExact(const NodalModel& model)
{
    ExactResponse out;
    const double low = lowestRate(model);
    const double high = highestRate(model);

    // The pencils in coordinates where a floating piece's singularity at
    // DC is exact (see anchorFloatingPieces); evaluations keep the model.
    const NodalModel anchored = anchorFloatingPieces(model);

    // The zeros' pencil: the nodal matrix bordered by input and output.
    const int n = model.unknowns();
    PencilRootProblem zeros;
    zeros.a0 = borderedByResponse(anchored);
    zeros.a0Extended = zeros.a0.cast<long double>();
    zeros.a0Extended.topLeftCorner(n, n) = anchored.extendedG;
    zeros.ports = Eigen::MatrixXd::Zero(n + 1, model.capacitorCount());
    zeros.ports.topRows(n) = anchored.ports;
    zeros.capacitance = model.capacitance;
    zeros.symmetric = model.kind == ResponseKind::Impedance;
    zeros.lowRate = low;
    zeros.highRate = high;

    // A response that is zero at every frequency has no numerator at all: the
    // bordered nodal matrix is singular at every s. Tested on the imaginary
    // axis (no digits lost between conductance and susceptance) at two
    // unrelated frequencies, against rounding-level conditioning only, so a
    // network with a tiny but real gain is not mistaken for one with none.
    {
        const Eigen::MatrixXd reactive = zeros.ports * zeros.capacitance.asDiagonal() * zeros.ports.transpose();
        bool singularEverywhere = true;
        for (double w : {std::sqrt(low * high), 0.37 * std::sqrt(low * high) + 2.9 * low}) {
            const Eigen::MatrixXcd bordered = zeros.a0.cast<cd>() + cd(0.0, w) * reactive.cast<cd>();
            if (EquilibratedLu<cd>(bordered).reciprocalCondition() >= 1e-15) {
                singularEverywhere = false;
                break;
            }
            // With part values over many decades a real response can leave
            // the bordered matrix that badly conditioned too: the output's
            // own sum then says whether H is more than rounding.
            const Evaluation e = evaluateWithCancellation(model, w);
            if (e.h != cd(0.0, 0.0) && e.cancellation < 1e12) {
                singularEverywhere = false;
                break;
            }
        }
        if (singularEverywhere)
            throw InputError("response: the output does not depend on the input (the response is zero at every frequency)");
    }

    std::vector<NodalModel::Edge> sourceEdge;
    if (model.kind == ResponseKind::VoltageGain)
        sourceEdge.push_back({model.inputNodes[0], model.inputNodes[1]});

    // At the origin: one pole per piece with no DC path to the reference.
    PencilRootProblem poles;
    poles.a0 = anchored.G;
    poles.a0Extended = anchored.extendedG;
    poles.ports = anchored.ports;
    poles.capacitance = model.capacitance;
    poles.symmetric = true;
    poles.lowRate = low;
    poles.highRate = high;
    out.rawPoles = finitePencilRoots(poles, floatingComponents(dcComponents(model, sourceEdge))).roots;

    // At the origin: an impedance's zeros are the port-shorted network's
    // floating pieces; a transfer's are bounded by rank tests on the
    // bordered pencil there, and only inside those bounds by root sizes.
    if (model.kind == ResponseKind::Impedance) {
        const int count = floatingComponents(dcComponents(model, {{model.inputNodes[0], model.inputNodes[1]}}));
        out.rawZeros = finitePencilRoots(zeros, count).roots;
    } else {
        // The roots are found on the pencil as it is (deflation leaves
        // rounding where the degree drops, and spurious far roots came of
        // it) and refined on the deflated one.
        const OriginDeflation origin = deflateOrigin(zeros);
        out.rawZeros = origin.removed > 0 ? finitePencilRoots(zeros, origin.bounds, origin.deflated).roots
                                          : finitePencilRoots(zeros, origin.bounds).roots;
    }

    snapToImaginaryAxis(out.rawPoles);
    snapToImaginaryAxis(out.rawZeros);

    const double s1 = geometricMeanMagnitude(out.rawPoles, out.rawZeros, std::sqrt(low * high));
    const std::vector<Evaluation> points = gainEvaluations(model, s1);
    const double rawGain = gainFromEvaluation(points, out.rawPoles, out.rawZeros);
    out.rawDenominator = polynomialFromRoots(out.rawPoles);
    out.rawNumerator = polynomialFromRoots(out.rawZeros);
    for (auto& a : out.rawNumerator)
        a *= rawGain;

    out.poles = out.rawPoles;
    out.zeros = out.rawZeros;
    cancelCommonRoots(out.poles, out.zeros);
    // K' is the same in theory; taken again from the reduced roots it does
    // not carry the rounding of the pairs that cancelled.
    out.gainConstant = gainFromEvaluation(points, out.poles, out.zeros);
    out.originPower = originCount(out.zeros) - originCount(out.poles);
    out.denominator = polynomialFromRoots(out.poles);
    out.numerator = polynomialFromRoots(out.zeros);
    for (auto& a : out.numerator)
        a *= out.gainConstant;

    if (out.originPower > 0)
        out.dc = {LimitKind::Zero, 0.0};
    else if (out.originPower < 0)
        out.dc = {LimitKind::Infinite, 0.0};
    else
        out.dc = {LimitKind::Finite, out.gainConstant};

    const int excess = static_cast<int>(out.numerator.size()) - static_cast<int>(out.denominator.size());
    if (excess > 0)
        out.hf = {LimitKind::Infinite, 0.0};
    else if (excess < 0)
        out.hf = {LimitKind::Zero, 0.0};
    else
        out.hf = {LimitKind::Finite, out.numerator.back() / out.denominator.back()};
    return out;
}

}  // namespace tauline
