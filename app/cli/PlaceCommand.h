#pragma once

#include <ostream>
#include <string>
#include <vector>

namespace tauline::cli {

// `tauline place FILE --corner N --to HZ [--vary PART] [--series E24] [--json]`:
// the part value that moves corner N (1-based, low to high) to HZ, and the
// nearest values of a standard series with where the corner lands. Returns
// the exit status (0; 1 unreadable, unanalysable or unreachable). Throws
// UsageError for bad arguments, including a corner or part the file does
// not have.
int runPlace(const std::vector<std::string>& arguments, std::ostream& out, std::ostream& err);

extern const char* const kPlaceHelp;

}  // namespace tauline::cli
