// Every capacitor's time constant in part names: the resistance it sees in
// the engine's two reference states, reduced series–parallel.
#pragma once

#include "Analysis.h"
#include "Network.h"
#include "ResistanceExpression.h"

#include <optional>
#include <string>
#include <vector>

namespace tauline {

struct TimeConstantExpression {
    std::string element;
    double farads = 0.0;
    // Other capacitors open, input zeroed (a voltage input shorted, a
    // current input opened).
    std::optional<ResistanceExpression> seen;
    // The response nulled: for an impedance the port shorted; for a transfer
    // the output held at zero by the free input (null double injection).
    // Empty where that state has no series–parallel form, or where the null
    // time constant is undefined (nullDefined false).
    std::optional<ResistanceExpression> nulled;
    bool nullDefined = true;

    // "C2 · (R4 ∥ (R2 + R3))", "0" (ends joined), "∞" (no resistive path),
    // "C1 · bridge(…)" where part of it is a bridge.
    std::string tauText() const;
    // As tauText(); "no series–parallel form" or "undefined" where empty.
    std::string nullTauText() const;
};

// One entry per analysis.timeConstants entry, same order. The null state of
// a transfer exists where the engine's does (dc value finite and non-zero).
std::vector<TimeConstantExpression> timeConstantExpressions(const Network& network, const Analysis& analysis);

// The text above for expression e of capacitor `element`.
std::string tauExpressionText(const std::string& element, const ResistanceExpression& e);

}  // namespace tauline
