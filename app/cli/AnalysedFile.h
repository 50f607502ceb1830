#pragma once

#include "Analysis.h"
#include "NetworkFile.h"

#include <ostream>
#include <string>
#include <vector>

namespace tauline::cli {

// A network file read and analysed, with everything the outputs share.
struct AnalysedFile {
    std::string path;
    LoadedNetwork loaded;
    Analysis analysis;

    // The reader's warnings, then the engine's.
    std::vector<std::string> warnings() const;
    bool needsCaution() const;
};

// Reads and analyses `path`. On failure writes one line per problem to err,
// each naming the file, and returns false (the command exits with 1).
bool loadAndAnalyze(const std::string& path, std::ostream& err, AnalysedFile& result);

// "finite", "infinite" or "undefined" (the null double injection does not
// exist for a transfer response whose dc value is zero or infinite).
const char* nullTimeConstantState(const Analysis& analysis, const ElementTimeConstant& element);

// The response's unit for people: "Ω" or "V/V".
const char* unitSymbol(ResponseKind kind);

// The shortest decimal text that reads back as the same double ("0.1",
// not "0.10000000000000001"); "inf", "-inf", "nan" for the rest.
std::string exactNumber(double value);

// `decimals` places after the point ("-15.12"); a value that rounds to zero
// has no sign ("0.00", not "-0.00"); non-finite ones as exactNumber.
std::string fixedPoint(double value, int decimals);

}  // namespace tauline::cli
