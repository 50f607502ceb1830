#pragma once

#include "AnalysedFile.h"

#include <nlohmann/json.hpp>

namespace tauline::cli {

// The object `tauline analyze --json` prints (command-line.md): every field
// the contract names, plus title, warnings, pair_time_constants, the
// estimates' errors and, for hazardous networks, the caution.
nlohmann::ordered_json analysisJson(const AnalysedFile& file);

}  // namespace tauline::cli
