// The exact solver's root refinement (two-sided Rayleigh quotient on the
// pencil) and its deflation of origin roots (deflateOrigin), on networks with
// part values over 1 Ω–10 MΩ and 1 pF–100 µF where the shifted eigenproblems
// alone left zeros 1e-9…5e-9 off.
#include "EngineTestNetworks.h"
#include "ExactResponse.h"
#include "NetworkFile.h"
#include "NodalModel.h"
#include "OriginMultiplicity.h"

#include <Eigen/Dense>
#include <algorithm>
#include <catch2/catch.hpp>
#include <complex>
#include <string>
#include <vector>

using namespace tauline;
using namespace tauline::testing;

namespace {

using cd = std::complex<double>;

// Each wanted root has a computed one within `tol` relative (counts equal).
void checkRoots(std::vector<cd> got, std::vector<double> want, double tol)
{
    REQUIRE(got.size() == want.size());
    for (double w : want) {
        auto nearest = std::min_element(got.begin(), got.end(),
                                        [&](cd a, cd b) { return std::abs(a - w) < std::abs(b - w); });
        INFO("wanted " << w << ", nearest " << nearest->real() << " " << nearest->imag() << "i");
        CHECK(std::abs(*nearest - w) <= tol * std::abs(w));
        got.erase(nearest);
    }
}

// Seed 61595 of the wide stress run (no gnd, transimpedance); its zero at
// 4.7e5 rad/s came out 4.7e-9 off. The same file the SymPy reference reads
// (test_wide_values.py).
NodalModel noGroundTransimpedance()
{
    return buildNodalModel(
        readNetworkFile(std::string(TAULINE_WIDE_NETWORKS_DIR) + "/wide-61595-no-gnd-transimpedance.tauline").network);
}

// det of the bordered pencil [G + sC, b; cᵀ, 0] of a model.
cd borderedDeterminant(const NodalModel& m, cd s)
{
    const int n = m.unknowns();
    Eigen::MatrixXcd a = Eigen::MatrixXcd::Zero(n + 1, n + 1);
    a.topLeftCorner(n, n) = m.G.cast<cd>() + s * m.C.cast<cd>();
    a.block(0, n, n, 1) = m.b.cast<cd>();
    a.block(n, 0, 1, n) = m.c.transpose().cast<cd>();
    return a.fullPivLu().determinant();
}

cd deflatedDeterminant(const PencilRootProblem& p, cd s)
{
    const Eigen::MatrixXd& left = p.leftPorts.size() ? p.leftPorts : p.ports;
    const Eigen::MatrixXd b = left * p.capacitance.asDiagonal() * p.ports.transpose();
    return (p.a0.cast<cd>() + s * b.cast<cd>()).fullPivLu().determinant();
}

}  // namespace

TEST_CASE("a zero of a wide-valued transimpedance is refined to 1e-9", "[exact][refinement]")
{
    // SymPy reference: exact rational nodal analysis (Meurer et al., SymPy:
    // symbolic computing in Python, PeerJ Computer Science 3:e103, 2017) via
    // tests/reference/sympy_network.py on this network, roots at 40 digits.
    const ExactResponse exact = solveExact(noGroundTransimpedance());
    checkRoots(exact.zeros, {-474321.67117651878348, -0.74186201508757233826}, 1e-9);
}

TEST_CASE("deflating an origin zero keeps the other roots of the bordered pencil", "[exact][origin][refinement]")
{
    // common practice (no source): an AC-coupled divider, in —C1— out, R1 from
    // out to gnd and R2 ‖ C2 from out to gnd, has H(s) = s·C1·R/(1 + s(C1+C2)R)
    // with R = R1‖R2: one zero exactly at the origin and no other. The
    // deflated pencil must have det = const · det(bordered)/s at any s.
    const NodalModel m = buildNodalModel(transfer(ResponseKind::VoltageGain,
                                                  {part("C1", 100e-9, "in", "out"), part("R1", 10e3, "out", "gnd"),
                                                   part("R2", 47e3, "out", "gnd"), part("C2", 3.3e-9, "out", "gnd")},
                                                  "in", "out"));
    const int n = m.unknowns();
    PencilRootProblem zeros;
    zeros.a0 = borderedByResponse(m);
    zeros.ports = Eigen::MatrixXd::Zero(n + 1, m.capacitorCount());
    zeros.ports.topRows(n) = m.ports;
    zeros.capacitance = m.capacitance;
    zeros.lowRate = lowestRate(m);
    zeros.highRate = highestRate(m);

    const OriginDeflation d = deflateOrigin(zeros);
    REQUIRE(d.removed == 1);
    const cd s1(-300.0, 50.0);
    const cd s2(1200.0, -7.0);
    const cd ratio1 = deflatedDeterminant(d.deflated, s1) * s1 / borderedDeterminant(m, s1);
    const cd ratio2 = deflatedDeterminant(d.deflated, s2) * s2 / borderedDeterminant(m, s2);
    CHECK(std::abs(ratio1 - ratio2) <= 1e-9 * std::abs(ratio1));

    // Circuit law above: the zero at 0 and no other finite zero.
    const ExactResponse exact = solveExact(m);
    REQUIRE(exact.zeros.size() == 1);
    CHECK(exact.zeros[0] == cd(0.0, 0.0));
    // and its pole at −1/((C1 + C2)·R)
    const double r = 10e3 * 47e3 / (10e3 + 47e3);
    REQUIRE(exact.poles.size() == 1);
    CHECK(closeRelative(exact.poles[0].real(), -1.0 / ((100e-9 + 3.3e-9) * r), 1e-12));
}
