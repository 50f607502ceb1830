#pragma once

#include "AnalysedFile.h"

#include <ostream>

namespace tauline::cli {

// The readable report `tauline analyze FILE` prints: response, limits,
// roots, time constants with the resistance each part sees, corners with
// exact and estimated frequency, warnings and, where it applies, the caution.
void writeAnalysisText(std::ostream& out, const AnalysedFile& file);

}  // namespace tauline::cli
