// The time-constant sums against the exact pencil.
#include "Analysis.h"
#include "EngineTestNetworks.h"
#include "ExactResponse.h"
#include "NodalModel.h"
#include "RootPolynomial.h"
#include "RandomNetwork.h"
#include "TimeConstantEngine.h"

#include <catch2/catch.hpp>

using namespace tauline;
using namespace tauline::testing;

namespace {

void requireSameCoefficients(const std::vector<double>& engine, const std::vector<double>& exact, double tol)
{
    REQUIRE(engine.size() == exact.size());
    for (size_t k = 0; k < exact.size(); ++k) {
        INFO("coefficient " << k << ": engine " << engine[k] << ", exact " << exact[k]);
        CHECK(closeRelative(engine[k], exact[k], tol));
    }
}

RandomNetworkShape shapeFor(int trial, int capacitors, ResponseKind kind)
{
    RandomNetworkShape shape;
    shape.nodes = 3 + trial % 6;
    shape.resistors = shape.nodes + 1 + trial % 5;
    shape.capacitors = capacitors;
    shape.kind = kind;
    return shape;
}

}  // namespace

TEST_CASE("b1 is the sum of the open-circuit time constants", "[engine][sums]")
{
    // b1 = Σ τ_i⁰ and the dominant-pole estimate p1 ≈ 1/b1: Gray, Hurst,
    // Lewis & Meyer, Analysis and Design of Analog Integrated Circuits, 5th
    // ed., 2009, §7.2 (zero-value time constants).
    std::mt19937 rng(72);
    for (int trial = 0; trial < 40; ++trial) {
        const Network net = randomNetwork(rng, shapeFor(trial, 1 + trial % 6, ResponseKind::VoltageGain));
        const NodalModel model = buildNodalModel(net);
        const ExactResponse exact = solveExact(model);
        const TimeConstantEngine engine(model, exact);
        double sum = 0.0;
        for (const auto& tc : engine.firstOrder()) {
            REQUIRE(tc.tau);
            sum += *tc.tau;
        }
        // A capacitor across the ideal input source sees 0 Ω: b1 may be 0.
        const double b1 = exact.rawDenominator.size() >= 2 ? exact.rawDenominator[1] : 0.0;
        CHECK(closeRelative(b1, sum, 1e-9));
    }
}

TEST_CASE("b2 and a1 from the pair time constants and transfer constants", "[engine][sums]")
{
    // b2 = Σ_{i<j} τ_i⁰·τ_j^i and a1 = Σ τ_i⁰·H^i: Hajimiri, "Generalized
    // time- and transfer-constant circuit analysis", IEEE TCAS-I 57(6), 2010,
    // the second-order denominator and first-order numerator terms; Cochrun &
    // Grabel, "A method for the determination of the transfer function of
    // electronic circuits", IEEE Trans. Circuit Theory CT-20(1), 1973
    // (volume and issue from memory).
    std::mt19937 rng(2010);
    for (int trial = 0; trial < 40; ++trial) {
        const auto kind = trial % 2 ? ResponseKind::VoltageGain : ResponseKind::Transimpedance;
        const Network net = randomNetwork(rng, shapeFor(trial, 2 + trial % 4, kind));
        const NodalModel model = buildNodalModel(net);
        const ExactResponse exact = solveExact(model);
        const TimeConstantEngine engine(model, exact);
        const int n = model.capacitorCount();

        double b2 = 0.0;
        double a1 = 0.0;
        for (int i = 0; i < n; ++i) {
            const double taui = *engine.resistanceSeen(i, {}) * model.capacitance(i);
            a1 += taui * *engine.transferConstant({i});
            for (int j = i + 1; j < n; ++j)
                b2 += taui * *engine.resistanceSeen(j, {i}) * model.capacitance(j);
        }
        REQUIRE(exact.rawDenominator.size() >= 3);
        CHECK(closeRelative(exact.rawDenominator[2], b2, 1e-9));
        // The raw numerator keeps every root; a1 is its s¹ coefficient.
        if (exact.rawNumerator.size() >= 2 && std::abs(a1) > 1e-14 * std::abs(exact.rawNumerator[0]) * exact.rawDenominator[1])
            CHECK(closeRelative(exact.rawNumerator[1], a1, 1e-9));
    }
}

TEST_CASE("b3 from the third-order time constants", "[engine][sums]")
{
    // b3 = Σ_{i<j<k} τ_i⁰·τ_j^i·τ_k^{ij}: Hajimiri, IEEE TCAS-I 57(6), 2010
    // (the general k-th order term; issue number from memory).
    std::mt19937 rng(3);
    for (int trial = 0; trial < 20; ++trial) {
        const Network net = randomNetwork(rng, shapeFor(trial, 3 + trial % 3, ResponseKind::Impedance));
        const NodalModel model = buildNodalModel(net);
        const ExactResponse exact = solveExact(model);
        const TimeConstantEngine engine(model, exact);
        const int n = model.capacitorCount();
        auto tau = [&](int j, const std::vector<int>& shorted) {
            return *engine.resistanceSeen(j, shorted) * model.capacitance(j);
        };
        double b3 = 0.0;
        for (int i = 0; i < n; ++i)
            for (int j = i + 1; j < n; ++j)
                for (int k = j + 1; k < n; ++k)
                    b3 += tau(i, {}) * tau(j, {i}) * tau(k, {i, j});
        INFO("trial " << trial);
        const double exactB3 = exact.rawDenominator.size() > 3 ? exact.rawDenominator[3] : 0.0;
        CHECK(closeRelative(exactB3, b3, 1e-9));
    }
}

TEST_CASE("pair time constants from Schur complements equal direct re-solves", "[engine][sums]")
{
    // Identity of the design note: shorting port i turns R_jj into its
    // Schur complement (common practice, no source).
    std::mt19937 rng(9);
    const Network net = randomNetwork(rng, shapeFor(3, 5, ResponseKind::Impedance));
    const NodalModel model = buildNodalModel(net);
    const ExactResponse exact = solveExact(model);
    const TimeConstantEngine engine(model, exact);
    for (const auto& pair : engine.secondOrder()) {
        const auto idx = [&](const std::string& name) {
            return static_cast<int>(std::find(model.capacitorNames.begin(), model.capacitorNames.end(), name) -
                                    model.capacitorNames.begin());
        };
        const auto direct = engine.resistanceSeen(idx(pair.element), {idx(pair.shorted)});
        REQUIRE(direct);
        REQUIRE(pair.r);
        CHECK(*pair.r == Approx(*direct).epsilon(1e-10).margin(1e-12 * model.sumResistance));
    }
}

namespace {

// The terms of a_k in the transfer-constant form: for every set S of k
// ports, det(R_SS·C_S)·H^S = τ_i⁰·τ_j^i·…·H^{ij…} (Hajimiri, IEEE TCAS-I
// 57(6), 2010; issue from memory). Their signed sum is a_k; the sum of their
// magnitudes is what a_k can be resolved against: where terms of both signs
// cancel, the coefficient is ill-conditioned whatever computes it.
// Enumerated, 2ⁿ sets: a check for n ≤ 12, never the engine's way.
struct CoefficientTerms {
    std::vector<double> sum;
    std::vector<double> magnitude;
};

CoefficientTerms coefficientTerms(const NodalModel& model, const TimeConstantEngine& engine)
{
    const int n = model.capacitorCount();
    CoefficientTerms out{std::vector<double>(n + 1, 0.0), std::vector<double>(n + 1, 0.0)};
    for (int mask = 0; mask < (1 << n); ++mask) {
        std::vector<int> set;
        for (int i = 0; i < n; ++i)
            if (mask >> i & 1)
                set.push_back(i);
        const int k = static_cast<int>(set.size());
        Eigen::MatrixXd tau(k, k);
        for (int a = 0; a < k; ++a)
            for (int b = 0; b < k; ++b)
                tau(a, b) = engine.opened().r(set[a], set[b]) *
                            std::sqrt(model.capacitance(set[a]) * model.capacitance(set[b]));
        // A set holding a capacitor loop shorts nothing new: det 0, and the
        // bordered matrix for H^S is singular.
        const auto h = engine.transferConstant(set);
        if (!h)
            continue;
        const double term = (k ? tau.determinant() : 1.0) * *h;
        out.sum[k] += term;
        out.magnitude[k] += std::abs(term);
    }
    return out;
}

// The exact solver forms its numerator from the zeros, K·Π(1 − s/z): where
// zeros lie on both sides of the axis, a coefficient is a sum of root
// products of both signs. The sum of their magnitudes, |K|·e_k(1/|z|), is
// how far that referee resolves it (common practice, no source).
std::vector<double> rootTermMagnitudes(const ExactResponse& exact)
{
    std::vector<std::complex<double>> magnitudes;
    for (const auto& z : exact.rawZeros)
        magnitudes.push_back(z == std::complex<double>(0.0, 0.0) ? z : std::complex<double>(-std::abs(z), 0.0));
    std::vector<double> out = polynomialFromRoots(magnitudes);
    const double gain = std::abs(exact.rawNumerator[static_cast<size_t>(originCount(exact.rawZeros))]);
    for (auto& a : out)
        a *= gain;
    out.resize(std::max(out.size(), exact.rawNumerator.size()), 0.0);
    return out;
}

// Every coefficient of the engine's numerator against the exact pencil's:
// 1e-9 relative, or, for a coefficient whose terms cancel by more than a
// factor 100, 1e-9 of the sum of their magnitudes.
struct NumeratorTally {
    int numerators = 0;
    int relative = 0;
    int illConditioned = 0;
};

void checkNumerator(const NodalModel& model, const ExactResponse& exact, const TimeConstantEngine& engine,
                    NumeratorTally& tally)
{
    const auto num = engine.numerator();
    REQUIRE(num);
    REQUIRE(num->size() == exact.rawNumerator.size());
    const CoefficientTerms terms = coefficientTerms(model, engine);
    const std::vector<double> rootTerms = rootTermMagnitudes(exact);
    const double dc = exact.rawNumerator.front();
    for (size_t k = 0; k < num->size(); ++k) {
        const double want = exact.rawNumerator[k];
        // The terms are in H⁰'s units over the denominator's b_0 = 1.
        const double magnitude = std::abs(terms.magnitude[k] * dc / terms.sum[0]);
        const double yardstick = std::max(magnitude, rootTerms[k]);
        INFO("coefficient " << k << ": engine " << (*num)[k] << ", exact " << want << " (relative difference "
                            << std::abs((*num)[k] - want) / std::abs(want) << "), terms' magnitude " << magnitude
                            << ", root products' magnitude " << rootTerms[k]);
        // The enumeration checks itself: its sum is a_k.
        CHECK(std::abs(terms.sum[k] * dc / terms.sum[0] - want) <= 1e-6 * yardstick);
        if (yardstick > 100.0 * std::abs(want)) {
            CHECK(std::abs((*num)[k] - want) <= 1e-9 * yardstick);
            ++tally.illConditioned;
        } else {
            CHECK(closeRelative((*num)[k], want, 1e-9));
            ++tally.relative;
        }
    }
    ++tally.numerators;
}

}  // namespace

TEST_CASE("engine coefficients equal the exact pencil's to 1e-9", "[engine][sums]")
{
    // b_k = e_k(eig(R·C)) and a_k = H⁰·e_k(eig(Rᴺ·C)) against the
    // determinants of the nodal pencil (design note; identity of
    // Middlebrook, Vorpérian & Lindal, "The N extra element theorem",
    // IEEE TCAS-I 45(9), 1998; issue from memory). Every numerator of every
    // trial is compared, every coefficient at 1e-9 relative — except one
    // that is itself ill-conditioned: where its terms (Hajimiri's
    // τ_i⁰·τ_j^i·…·H^{ij…}, coefficientTerms) or the exact solver's root
    // products (rootTermMagnitudes) have both signs and sum to less than a
    // hundredth of their magnitudes, it is held to 1e-9 of that magnitude,
    // the most either side can resolve. On these 90 networks (1 to 12
    // capacitors, 30 with values over 1 Ω–10 MΩ and 1 pF–100 µF) that is
    // none: all 530 numerator coefficients are compared relative, because
    // every term has H⁰'s sign here (measured: Σ|terms| = |a_k|). Before the
    // numerator was formed from Rᴺ itself in double-double, 28 of the 60
    // transfer numerators (the wide-valued ones and those past 8
    // capacitors) were left out: the rank-one form lost up to 6 digits
    // (5.7e-7, and a spurious s⁹ term on one). Now the worst is 1e-11
    // against SymPy.
    std::mt19937 rng(1998);
    const ResponseKind kinds[] = {ResponseKind::Impedance, ResponseKind::VoltageGain, ResponseKind::Transimpedance};
    NumeratorTally tally;
    for (int trial = 0; trial < 90; ++trial) {
        RandomNetworkShape shape = shapeFor(trial, 1 + trial % 12, kinds[trial % 3]);
        shape.nodes += shape.capacitors / 2;
        shape.resistors += shape.capacitors;
        if (trial % 5 == 0) {  // values over 1 Ω–10 MΩ and 1 pF–100 µF
            shape.minR = 1.0;
            shape.maxR = 1e7;
            shape.minC = 1e-12;
            shape.maxC = 1e-4;
        }
        const Network net = randomNetwork(rng, shape);
        const NodalModel model = buildNodalModel(net);
        const ExactResponse exact = solveExact(model);
        const TimeConstantEngine engine(model, exact);
        INFO("trial " << trial);
        const auto den = engine.denominator();
        REQUIRE(den);
        requireSameCoefficients(*den, exact.rawDenominator, 1e-9);
        checkNumerator(model, exact, engine, tally);
    }
    CHECK(tally.numerators == 90);
    CHECK(tally.relative + tally.illConditioned == 530);
}

TEST_CASE("equal two-section RC ladder poles", "[engine][ladder]")
{
    // Denominator 1 + 3x + x² with x = sRC: roots x = −0.381966 and
    // −2.618034 (exact roots of the quadratic; common practice, no source).
    const double r = 4.7e3, c = 22e-9;
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", r, "in", "a"), part("C1", c, "a", kGroundNode),
                                         part("R2", r, "a", "b"), part("C2", c, "b", kGroundNode)},
                                        "in", "b"));
    REQUIRE(a.poles.size() == 2);
    const double x1 = (3.0 - std::sqrt(5.0)) / 2.0;
    const double x2 = (3.0 + std::sqrt(5.0)) / 2.0;
    CHECK(x1 == Approx(0.381966).epsilon(1e-6));
    CHECK(a.poles[0].real() == Approx(-x1 / (r * c)).epsilon(1e-12));
    CHECK(a.poles[1].real() == Approx(-x2 / (r * c)).epsilon(1e-12));
    // Not well separated: the b0/b1 estimate is 1/(3RC), 13 % below 0.382/RC.
    REQUIRE(a.breakpoints.size() == 2);
    CHECK(a.breakpoints[0].estimateHz == Approx(1.0 / (3.0 * r * c) / (2.0 * M_PI)).epsilon(1e-12));
    CHECK(a.breakpoints[0].poorlySeparated);
}

TEST_CASE("well-separated poles are estimated by 1/b1 and b1/b2", "[engine][ladder]")
{
    // p1 ≈ 1/b1, p2 ≈ b1/b2 when |p2| ≫ |p1|: Gray, Hurst, Lewis & Meyer,
    // 5th ed., §7.3. A ladder whose second section is 1000× faster.
    const Analysis a = analyze(transfer(ResponseKind::VoltageGain,
                                        {part("R1", 10e3, "in", "a"), part("C1", 100e-9, "a", kGroundNode),
                                         part("R2", 100.0, "a", "b"), part("C2", 10e-9, "b", kGroundNode)},
                                        "in", "b"));
    REQUIRE(a.breakpoints.size() == 2);
    for (const auto& bp : a.breakpoints) {
        CHECK(std::abs(bp.estimateError) < 0.02);
        CHECK_FALSE(bp.poorlySeparated);
    }
}
