#pragma once

#include "Analysis.h"
#include "ExactResponse.h"
#include "NodalModel.h"

#include <optional>
#include <vector>

namespace tauline {

// The resistances seen by the capacitor ports in one reference state of the
// network (input zeroed, or response nulled): one factorisation of the nodal
// matrix, one back-substitution per port. Ports whose two nodes lie in
// different DC components (no resistive path between them in that state) see
// an infinite resistance; the matrix entries of such ports are not used.
struct PortResistance {
    bool defined = false;
    Eigen::MatrixXd r;
    // The same before rounding to double: where ports lie close together
    // (a capacitor loop, a port the nulling nearly shorts) the principal
    // minors are differences of entries, and the numerator needs the digits
    // past double.
    Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic> rExtended;
    std::vector<bool> finite;
    bool allFinite() const;
};

// The time- and transfer-constant view of a network: every τ_i⁰, τ_i^N, the
// higher-order τ_j^{S}, the transfer constants H^{S}, and the coefficients
// they give — all from the two port matrices and their Schur complements,
// never by enumerating subsets. (The n-extra-element theorem: Middlebrook,
// Vorpérian & Lindal, "The N extra element theorem", IEEE TCAS-I 45(9),
// 1998; Hajimiri, "Generalized time- and transfer-constant circuit
// analysis", IEEE TCAS-I 57(6), 2010; issue numbers from memory.)
class TimeConstantEngine {
public:
    TimeConstantEngine(const NodalModel& model, const ExactResponse& exact);

    const PortResistance& opened() const { return opened_; }  // input zeroed
    const PortResistance& nulled() const { return nulled_; }  // response nulled

    std::vector<ElementTimeConstant> firstOrder() const;
    std::vector<PairTimeConstant> secondOrder() const;

    // Resistance seen by port j with the ports in `shorted` at their
    // infinite-value state, all others open, input zeroed. Empty if infinite.
    std::optional<double> resistanceSeen(int j, const std::vector<int>& shorted) const;
    // H with the ports in `shorted` shorted and all others open. Empty where
    // infinite or undefined.
    std::optional<double> transferConstant(const std::vector<int>& shorted) const;

    // b_k = e_k(eig(R·C)) = Σ τ_i⁰·τ_j^i·…; a_k = H⁰·e_k(eig(Rᴺ·C)).
    // Empty where the reference state has an infinite port (the exact
    // solver's polynomial stands alone there).
    std::optional<std::vector<double>> denominator() const;
    std::optional<std::vector<double>> numerator() const;

private:
    const NodalModel& model_;
    std::optional<double> dcValue_;  // H⁰ when finite and non-zero
    PortResistance opened_;
    PortResistance nulled_;
};

}  // namespace tauline
