// The exact solver's change of unknowns for pieces with no DC path to the
// reference (anchorFloatingPieces).
#include "EngineTestNetworks.h"
#include "NodalModel.h"

#include <Eigen/Dense>
#include <catch2/catch.hpp>
#include <complex>

using namespace tauline;
using namespace tauline::testing;

namespace {

// x and y form a piece joined to the rest by capacitors only; its two
// resistors in parallel make row sums that do not cancel in floating point.
Network networkWithFloatingPiece()
{
    return transfer(ResponseKind::Transimpedance,
                    {part("R1", 1000.0, "in", "gnd"), part("R2", 3300.0, "in", "m"), part("R3", 6800.0, "m", "gnd"),
                     part("C1", 47e-9, "m", "x"), part("R4", 3300.0, "x", "y"), part("R5", 4700.0, "x", "y"),
                     part("C2", 22e-9, "y", "gnd"), part("C3", 10e-9, "x", "in")},
                    "in", "y");
}

std::complex<double> pencilDeterminant(const NodalModel& m, std::complex<double> s)
{
    const Eigen::MatrixXcd a = m.G.cast<std::complex<double>>() + s * m.C.cast<std::complex<double>>();
    return a.partialPivLu().determinant();
}

}  // namespace

TEST_CASE("a floating piece's anchor has exactly zero conductance rows and columns", "[exact][anchored]")
{
    // Kirchhoff's current law: a piece with no resistive path to the
    // reference carries no DC current out, so its conductance rows sum to
    // zero (common practice (no source)).
    const NodalModel model = buildNodalModel(networkWithFloatingPiece());
    const NodalModel anchored = anchorFloatingPieces(model);
    int zeroRows = 0;
    for (int i = 0; i < anchored.unknowns(); ++i)
        if (anchored.G.row(i).isZero(0.0) && anchored.G.col(i).isZero(0.0)) {
            ++zeroRows;
            CHECK(anchored.extendedG.row(i).isZero(0.0L));
        }
    CHECK(zeroRows == 1);
    int zeroBefore = 0;
    for (int i = 0; i < model.unknowns(); ++i)
        zeroBefore += model.G.row(i).isZero(0.0) ? 1 : 0;
    CHECK(zeroBefore == 0);
}

TEST_CASE("the anchored pencil has the same determinant and response vectors", "[exact][anchored]")
{
    // A change of unknowns v = T·y with det T = 1 leaves det(G + sC) and
    // cᵀ(G + sC)⁻¹b unchanged (common practice (no source)).
    const NodalModel model = buildNodalModel(networkWithFloatingPiece());
    const NodalModel anchored = anchorFloatingPieces(model);
    for (double w : {10.0, 3.7e3, 2.2e5, 9e7}) {
        const std::complex<double> s(0.0, w);
        const auto before = pencilDeterminant(model, s);
        const auto after = pencilDeterminant(anchored, s);
        INFO("omega " << w);
        CHECK(std::abs(before - after) <= 1e-12 * std::abs(before));
        const Eigen::MatrixXcd a0 = model.G.cast<std::complex<double>>() + s * model.C.cast<std::complex<double>>();
        const Eigen::MatrixXcd a1 =
            anchored.G.cast<std::complex<double>>() + s * anchored.C.cast<std::complex<double>>();
        const std::complex<double> h0 = model.c.cast<std::complex<double>>().dot(
            a0.partialPivLu().solve(model.b.cast<std::complex<double>>()));
        const std::complex<double> h1 = anchored.c.cast<std::complex<double>>().dot(
            a1.partialPivLu().solve(anchored.b.cast<std::complex<double>>()));
        CHECK(std::abs(h0 - h1) <= 1e-12 * std::abs(h0));
    }
}
