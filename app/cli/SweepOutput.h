#pragma once

#include "AnalysedFile.h"

#include <ostream>
#include <vector>

namespace tauline::cli {

enum class SweepFormat { Table, Json, Csv };

// `tauline sweep` output: a JSON array of {hz, re, im, db, deg}, CSV with the
// header hz,re,im,db,deg (numbers that read back exactly), or a table.
void writeSweep(std::ostream& out, const AnalysedFile& file, const std::vector<SweepPoint>& points,
                SweepFormat format);

}  // namespace tauline::cli
