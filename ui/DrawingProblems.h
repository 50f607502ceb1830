// Everything wrong with a drawing, each placed where it is: open wire ends and
// part ends, parts shorted or with both ends on one node, floating parts,
// parts cut off from the response, two names for one node, and the markers'
// own problems. The markers' problems (why there is no response) come first,
// open ends (minor) last.
#pragma once

#include "DerivedNetwork.h"

namespace tauline::ui {

QList<DrawingProblem> findDrawingProblems(const DrawingSnapshot& drawing, const Connectivity& connectivity,
                                          const DerivedNetwork& derived);

}  // namespace tauline::ui
