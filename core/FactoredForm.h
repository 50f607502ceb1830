// The exact response written the way a designer reads it:
//   H(s) = H0 · (1 + s/ωz1)… / (1 + s/ωp1)…
// real roots as (1 + s/ω), complex pairs as (1 + s/(Q·ω0) + (s/ω0)²), roots
// at the origin as powers of s (Erickson & Maksimović, Fundamentals of Power
// Electronics, 3rd ed., §8.1, the normalised form). Each ω set by one
// capacitor alone is named by that capacitor's time constant in part names.
#pragma once

#include "Analysis.h"
#include "ResistanceExpressions.h"

#include <string>
#include <vector>

namespace tauline {

struct FactoredTerm {
    RootType type = RootType::Pole;
    bool quadratic = false;       // a complex pair
    double omega = 0.0;           // rad/s: |root|, ω0 for a pair
    double q = 0.0;               // pair only, > 0
    bool rightHalfPlane = false;  // root with positive real part: a minus sign
    int breakpoint = -1;          // index into Analysis::breakpoints
    std::string label;            // "ωp1", "ωz2", "ω0p1"
    // "1/(C1 · (R1 ∥ R2))" where the root equals 1/τ of one capacitor (input
    // zeroed for a pole, response nulled for a zero) to 1e-9 — which it does
    // exactly when that capacitor is decoupled from every other one, the only
    // capacitor being the plainest case. Empty otherwise.
    std::string expression;
};

struct FactoredForm {
    ResponseKind kind = ResponseKind::Impedance;
    // originPower 0: H0 = constant. Otherwise H = constant · s^originPower · …;
    // for a voltage gain this is written (s/ωo)^m with ωo = |constant|^(−1/m).
    double constant = 0.0;
    int originPower = 0;
    std::vector<FactoredTerm> zeros;  // low to high
    std::vector<FactoredTerm> poles;

    // One line: "H(s) = 14.7 kΩ · (1 + s/ωz1) / (1 + s/ωp1)".
    std::string formula() const;
    // One line per ω: "ωp1 = 1/(C1 · R2) = 45.45 krad/s (7.234 kHz)".
    std::vector<std::string> definitions() const;
    // formula() then definitions(), one per line.
    std::string text() const;
};

FactoredForm factoredForm(const Analysis& analysis, const std::vector<TimeConstantExpression>& expressions);

// One text per breakpoint: its ω in part names where the factored form has
// one, else "".
std::vector<std::string> cornerExpressions(const FactoredForm& form, std::size_t breakpointCount);

}  // namespace tauline
