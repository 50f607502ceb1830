#include "ExactResponse.h"

#include "EquilibratedLu.h"
#include "Errors.h"
#include "OriginMultiplicity.h"
#include "PencilRoots.h"
#include "RootPolynomial.h"

#include <algorithm>
#include <cmath>
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

// The lowest non-zero numerator coefficient K' from exact evaluations:
// H(s) = K'·s^(mz−mp)·Π(1 − s/z)/Π(1 − s/p). Three points a decade and a
// half apart around s1, each clear of the roots; the median guards against
// one that lands where the nodal matrix is badly conditioned. The points are
// on the imaginary axis: there a node's small conductance and large
// susceptance sit in separate parts of one entry, and no digits are lost
// adding them.
double gainFromEvaluation(const NodalModel& model, const std::vector<cd>& poles, const std::vector<cd>& zeros,
                          double s1)
{
    std::vector<double> estimates;
    const int power = originCount(zeros) - originCount(poles);
    for (double at : {s1, s1 / 30.0, s1 * 30.0}) {
        for (int attempt = 0; attempt < 6; ++attempt, at *= 1.37) {
            const cd s(0.0, at);
            const cd zf = productOfFactors(zeros, s);
            const cd pf = productOfFactors(poles, s);
            if (std::abs(zf) < 1e-6 || std::abs(pf) < 1e-6)
                continue;  // too near a root for a clean quotient
            estimates.push_back((directResponse(model, s) * pf / (zf * std::pow(s, power))).real());
            break;
        }
    }
    if (estimates.empty())
        throw InputError("response: cannot evaluate the network away from its poles and zeros");
    std::sort(estimates.begin(), estimates.end());
    return estimates[estimates.size() / 2];
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
    const Eigen::MatrixXcd x = EquilibratedLu<cd>(a).solve(model.b.cast<cd>());
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

    // The zeros' pencil: the nodal matrix bordered by input and output.
    const int n = model.unknowns();
    PencilRootProblem zeros;
    zeros.a0 = Eigen::MatrixXd::Zero(n + 1, n + 1);
    zeros.a0.topLeftCorner(n, n) = model.G;
    zeros.a0.block(0, n, n, 1) = model.b;
    zeros.a0.block(n, 0, 1, n) = model.c.transpose();
    zeros.ports = Eigen::MatrixXd::Zero(n + 1, model.capacitorCount());
    zeros.ports.topRows(n) = model.ports;
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
            singularEverywhere = singularEverywhere && !(EquilibratedLu<cd>(bordered).reciprocalCondition() >= 1e-15);
        }
        if (singularEverywhere)
            throw InputError("response: the output does not depend on the input (the response is zero at every frequency)");
    }

    std::vector<NodalModel::Edge> sourceEdge;
    if (model.kind == ResponseKind::VoltageGain)
        sourceEdge.push_back({model.inputNodes[0], model.inputNodes[1]});

    // At the origin: one pole per piece with no DC path to the reference.
    PencilRootProblem poles{model.G, model.ports, model.capacitance, true, low, high};
    out.rawPoles = finitePencilRoots(poles, floatingComponents(dcComponents(model, sourceEdge))).roots;

    // At the origin: an impedance's zeros are the port-shorted network's
    // floating pieces; a transfer's are bounded by rank tests on the
    // bordered pencil there, and only inside those bounds by root sizes.
    if (model.kind == ResponseKind::Impedance) {
        const int count = floatingComponents(dcComponents(model, {{model.inputNodes[0], model.inputNodes[1]}}));
        out.rawZeros = finitePencilRoots(zeros, count).roots;
    } else {
        out.rawZeros = finitePencilRoots(zeros, originMultiplicity(zeros)).roots;
    }

    const double s1 = geometricMeanMagnitude(out.rawPoles, out.rawZeros, std::sqrt(low * high));
    const double rawGain = gainFromEvaluation(model, out.rawPoles, out.rawZeros, s1);
    out.rawDenominator = polynomialFromRoots(out.rawPoles);
    out.rawNumerator = polynomialFromRoots(out.rawZeros);
    for (auto& a : out.rawNumerator)
        a *= rawGain;

    out.poles = out.rawPoles;
    out.zeros = out.rawZeros;
    cancelCommonRoots(out.poles, out.zeros);
    // K' is the same in theory; evaluated again from the reduced roots it
    // does not carry the rounding of the pairs that cancelled.
    out.gainConstant =
        gainFromEvaluation(model, out.poles, out.zeros, geometricMeanMagnitude(out.poles, out.zeros, s1));
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
