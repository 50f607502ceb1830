// Comparing networks: whether an edit changed what the analysis sees, and
// whether a drawing still describes the netlist it was saved with.
#pragma once

#include "Network.h"

namespace tauline::ui {

// Same parts (name, kind, value, nodes, in order) and the same response.
// The title and the value texts are ignored: they do not change the analysis.
bool sameAnalysis(const tauline::Network& a, const tauline::Network& b);

// The same up to renaming nodes ("gnd" stays "gnd"): every part of `file`
// appears in `drawn` with the same kind and value, joined the same way, and
// the responses match. `drawn` may hold extra parts only if
// `allowExtraParts` (the file reader leaves separate pieces out).
bool sameConnectivity(const tauline::Network& file, const tauline::Network& drawn, bool allowExtraParts);

}  // namespace tauline::ui
