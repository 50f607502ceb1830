#include "AnalysedFile.h"

#include "Errors.h"
#include "HazardCaution.h"

#include <charconv>
#include <cmath>
#include <cstdio>

namespace tauline::cli {

std::vector<std::string> AnalysedFile::warnings() const
{
    std::vector<std::string> all = loaded.warnings;
    all.insert(all.end(), analysis.warnings.begin(), analysis.warnings.end());
    return all;
}

bool AnalysedFile::needsCaution() const
{
    return suggestsHazardousUse(loaded.network.title);
}

bool loadAndAnalyze(const std::string& path, std::ostream& err, AnalysedFile& result)
{
    result.path = path;
    try {
        result.loaded = readNetworkFile(path);
    } catch (const InputError& e) {
        // The reader's messages already begin with the path.
        for (const auto& problem : e.problems())
            err << problem << '\n';
        return false;
    }
    try {
        result.analysis = analyze(result.loaded.network);
    } catch (const InputError& e) {
        for (const auto& problem : e.problems())
            err << path << ": " << problem << '\n';
        return false;
    } catch (const std::exception& e) {
        // Not the user's mistake, but still a file that could not be analysed.
        err << path << ": the analysis failed: " << e.what() << '\n';
        return false;
    }
    return true;
}

const char* nullTimeConstantState(const Analysis& analysis, const ElementTimeConstant& element)
{
    if (element.tauNull)
        return "finite";
    if (analysis.kind != ResponseKind::Impedance && analysis.dc.kind != LimitKind::Finite)
        return "undefined";
    return "infinite";
}

const char* unitSymbol(ResponseKind kind)
{
    return kind == ResponseKind::VoltageGain ? "V/V" : "\u03A9";
}

std::string exactNumber(double value)
{
    if (std::isnan(value))
        return "nan";
    if (std::isinf(value))
        return value > 0 ? "inf" : "-inf";
    char buffer[64];
    auto [end, ec] = std::to_chars(buffer, buffer + sizeof buffer, value);
    return std::string(buffer, end);
}

std::string fixedPoint(double value, int decimals)
{
    if (!std::isfinite(value))
        return exactNumber(value);
    char buffer[64];
    std::snprintf(buffer, sizeof buffer, "%.*f", decimals, value);
    // A tiny negative value prints as "-0.00": keep the sign only where a
    // digit shows it.
    const bool onlyZeros = std::string(buffer).find_first_not_of("-0.") == std::string::npos;
    if (onlyZeros && buffer[0] == '-')
        return std::string(buffer + 1);
    return buffer;
}

}  // namespace tauline::cli
