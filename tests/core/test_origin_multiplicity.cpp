// The number of a transfer's zeros at s = 0, counted by rank tests on the
// bordered pencil, against responses that follow from circuit laws.
#include "EngineTestNetworks.h"
#include "ExactResponse.h"
#include "NodalModel.h"
#include "OriginMultiplicity.h"

#include <catch2/catch.hpp>

using namespace tauline;
using namespace tauline::testing;

namespace {

int rootsAtOrigin(const std::vector<std::complex<double>>& roots)
{
    int count = 0;
    for (const auto& r : roots)
        count += r == std::complex<double>(0.0, 0.0) ? 1 : 0;
    return count;
}

PencilRootProblem identityPortPencil(const Eigen::MatrixXd& a0)
{
    PencilRootProblem p;
    p.a0 = a0;
    p.ports = Eigen::MatrixXd::Identity(a0.rows(), a0.cols());
    p.capacitance = Eigen::VectorXd::Ones(a0.rows());
    p.lowRate = 1.0;
    p.highRate = 10.0;
    return p;
}

}  // namespace

TEST_CASE("origin multiplicity of small pencils follows their determinants", "[engine][origin]")
{
    // common practice (no source): det(A0 + s·I) is the characteristic
    // polynomial of −A0; a 2×2 Jordan block at 0 gives s², diag(0, 1) gives
    // s·(s + 1), and diag(1e-7, 1) a slow root at −1e-7 that is not at 0.
    auto exact = [](const Eigen::MatrixXd& a0, int m) {
        const OriginRootBounds bounds = originMultiplicity(identityPortPencil(a0));
        CHECK(bounds.atLeast == m);
        CHECK(bounds.atMost >= m);
    };
    Eigen::MatrixXd jordan(2, 2);
    jordan << 0.0, 1.0, 0.0, 0.0;
    exact(jordan, 2);
    Eigen::MatrixXd three = Eigen::MatrixXd::Zero(3, 3);
    three(0, 1) = 2.0;
    three(1, 2) = 5.0;  // one Jordan chain of length 3
    exact(three, 3);
    exact(Eigen::Vector2d(0.0, 1.0).asDiagonal(), 1);
    exact(Eigen::Vector2d(1e-7, 1.0).asDiagonal(), 0);
    // A clearly regular A0: s = 0 is no root, and nothing may be snapped there.
    CHECK(originMultiplicity(identityPortPencil(Eigen::Vector2d(0.5, 1.0).asDiagonal())).atMost == 0);
}

TEST_CASE("two cascaded C-R high-pass sections: H ~ s^2 at dc", "[engine][origin]")
{
    // common practice (no source): each series-C, shunt-R section passes
    // s·R·C of its input at low frequency, where the next section's input
    // impedance 1/(sC) swamps R and does not load it. H ≈ R1C1·R2C2·s².
    const double r1 = 4.7e3, c1 = 2.2e-7, r2 = 33e3, c2 = 1e-8;
    const Network net = transfer(ResponseKind::VoltageGain,
                                 {part("C1", c1, "in", "a"), part("R1", r1, "a", kGroundNode), part("C2", c2, "a", "out"),
                                  part("R2", r2, "out", kGroundNode)},
                                 "in", "out");
    const ExactResponse e = solveExact(buildNodalModel(net));
    CHECK(rootsAtOrigin(e.rawZeros) == 2);
    CHECK(e.rawZeros.size() == 2);
    CHECK(e.originPower == 2);
    CHECK(e.dc.kind == LimitKind::Zero);
    CHECK(closeRelative(e.gainConstant, r1 * c1 * r2 * c2, 1e-9));
}

TEST_CASE("capacitive divider: the origin zero cancels the floating node's pole", "[engine][origin]")
{
    // common practice (no source): the middle node reaches nothing through
    // resistors, so det(G + sC) has a root at 0; the gain is C1/(C1 + C2) at
    // every frequency, so the numerator has the same root there (m = 0 net).
    const Network net = transfer(ResponseKind::VoltageGain,
                                 {part("C1", 4.7e-9, "in", "mid"), part("C2", 1e-9, "mid", kGroundNode)}, "in", "mid");
    const ExactResponse e = solveExact(buildNodalModel(net));
    CHECK(rootsAtOrigin(e.rawZeros) == rootsAtOrigin(e.rawPoles));
    CHECK(e.originPower == 0);
    REQUIRE(e.dc.kind == LimitKind::Finite);
    CHECK(closeRelative(e.dc.value, 4.7 / 5.7, 1e-12));
}

TEST_CASE("ac-coupled transimpedance: one zero at the origin", "[engine][origin]")
{
    // common practice (no source): current into R1 to ground, coupled by C1
    // into R2 to ground; at low frequency C1 carries s·C1·(R1 i) into R2, so
    // v_out ≈ R1·R2·C1·s·i.
    const double r1 = 10e3, r2 = 1e3, c1 = 1e-6;
    const Network net = transfer(ResponseKind::Transimpedance,
                                 {part("R1", r1, "in", kGroundNode), part("C1", c1, "in", "out"),
                                  part("R2", r2, "out", kGroundNode)},
                                 "in", "out");
    const ExactResponse e = solveExact(buildNodalModel(net));
    CHECK(rootsAtOrigin(e.rawZeros) == 1);
    CHECK(e.originPower == 1);
    CHECK(e.dc.kind == LimitKind::Zero);
    CHECK(closeRelative(e.gainConstant, r1 * r2 * c1, 1e-9));
}

TEST_CASE("a node with no resistive path: a double origin zero cancels its pole", "[engine][origin]")
{
    // common practice (no source): C1 into R1 to ground makes v_a ≈ s·R1·C1·v_in
    // at low frequency; R2 carries no current at dc (C3 in series with C4
    // is open there), so v_out follows v_a and H ≈ s·R1·C1. Node b between
    // C3 and C4 has no resistive path: a pole at 0 in det(G + sC), which
    // the numerator's double root at 0 cancels once.
    const double r1 = 2.2e3, c1 = 1e-7, r2 = 47e3, c3 = 1e-9;
    const Network net = transfer(ResponseKind::VoltageGain,
                                 {part("C1", c1, "in", "a"), part("R1", r1, "a", kGroundNode),
                                  part("R2", r2, "a", "out"), part("C3", c3, "out", "b"), part("C4", 2.2e-9, "b", kGroundNode)},
                                 "in", "out");
    const ExactResponse e = solveExact(buildNodalModel(net));
    CHECK(rootsAtOrigin(e.rawPoles) == 1);
    CHECK(rootsAtOrigin(e.rawZeros) == 2);
    CHECK(e.originPower == 1);
    CHECK(e.dc.kind == LimitKind::Zero);
    CHECK(closeRelative(e.gainConstant, r1 * c1, 1e-9));
}
