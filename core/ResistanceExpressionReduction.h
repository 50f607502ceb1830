// Reducing a resistive network seen between two nodes to an expression, the
// way it is done by hand: drop what carries no current, merge parallel
// branches, merge series branches through a node nothing else touches,
// repeat. The reference states of the time-constant view also need two ideal
// elements: the nullator (no voltage, no current: a nulled output) and the
// norator (any voltage, any current: the free input of the null double
// injection). They are resolved by the usual equivalences — a norator with a
// resistor in series or in parallel is a norator; a resistor in parallel with
// a nullator carries no current and drops out; a resistor in series with a
// nullator is a nullator; a nullator in parallel with a norator is a short,
// in series with one an open circuit (Carlin, "Singular network elements",
// IEEE Trans. Circuit Theory 11(1), 1964; issue from memory).
#pragma once

#include "ResistanceExpression.h"

#include <optional>
#include <vector>

namespace tauline {

struct ReductionBranch {
    enum class Type { Resistance, Short, Nullator, Norator };
    int a = 0;
    int b = 0;
    Type type = Type::Resistance;
    ResistanceExpression resistance;  // Resistance only
};

// The resistance between nodes `from` and `to` (0 … nodes−1). Empty when a
// nullator or norator is left that the equivalences above do not resolve
// (the network seen then has no series–parallel form); a remainder of plain
// resistors that no step reduces comes back as a Bridge.
std::optional<ResistanceExpression> reduceTwoTerminal(int nodes, std::vector<ReductionBranch> branches, int from,
                                                      int to);

}  // namespace tauline
