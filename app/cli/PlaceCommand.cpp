#include "PlaceCommand.h"

#include "AnalysedFile.h"
#include "ArgumentList.h"
#include "CornerPlacement.h"
#include "Errors.h"
#include "HazardCaution.h"
#include "TextTable.h"
#include "ValueParser.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace tauline::cli {

const char* const kPlaceHelp =
    "tauline place FILE --corner N --to HZ [--vary PART] [--series E24] [--json]\n"
    "  Solves for the value of one part that moves a corner to a chosen\n"
    "  frequency, on the exact corner (not its estimate), then gives the\n"
    "  nearest values of a standard series below and above with the frequency\n"
    "  the corner lands on with each.\n"
    "  --corner N     the corner, numbered 1, 2, ... from low to high frequency\n"
    "                 as 'tauline analyze' lists them\n"
    "  --to HZ        the target frequency\n"
    "  --vary PART    the part to change (default: the one the corner is most\n"
    "                 sensitive to, largest |d ln f / d ln x|)\n"
    "  --series S     E12, E24 (default) or E96 (IEC 60063)\n"
    "  --json         one JSON object instead of the table\n"
    "  A target the corner cannot reach (it saturates at a limit as the part\n"
    "  goes to 0 or infinity, meets another corner, or vanishes) is reported\n"
    "  with the reason and exit status 1.\n";

namespace {

std::string signedPercent(double relative)
{
    if (std::abs(relative) < 5e-5)
        return "0 %";
    char buffer[32];
    std::snprintf(buffer, sizeof buffer, "%+.2f %%", 100.0 * relative);
    return buffer;
}

int cornerOption(const std::string& text)
{
    if (text.empty() || text.find_first_not_of("0123456789") != std::string::npos || text.size() > 6)
        throw UsageError("--corner: \"" + text + "\" is not a corner number (1, 2, ... from low to high)");
    const int n = std::stoi(text);
    if (n < 1)
        throw UsageError("--corner: corners are numbered from 1");
    return n;
}

const char* typeWord(RootType type)
{
    return type == RootType::Pole ? "pole" : "zero";
}

void writeTable(std::ostream& out, const CornerPlacement& p)
{
    out << "Corner " << p.corner + 1 << " (" << typeWord(p.type) << ", now "
        << formatQuantity(p.startHz, "Hz", 4) << ") to " << formatQuantity(p.targetHz, "Hz", 4) << " by changing "
        << p.part << " (now " << formatValue(p.startValue, p.kind)
        << ", d ln f / d ln " << p.part << " = " << fixedPoint(p.sensitivity, 3) << ")\n\n";
    TextTable table({"", p.part, "corner", "off target"});
    table.addRow({"exact", formatQuantity(p.value, valueUnit(p.kind), 6), formatQuantity(p.hz, "Hz", 6),
                  signedPercent(p.hz / p.targetHz - 1.0)});
    for (const auto& v : p.nearest)
        table.addRow({seriesName(p.series), v.text, v.hz ? formatQuantity(*v.hz, "Hz", 4) : "not followed",
                      v.hz ? signedPercent(*v.hz / p.targetHz - 1.0) : "-"});
    table.print(out);
    if (p.landingCorner != p.corner)
        out << "\n  The corner passes others on the way: it is corner " << p.landingCorner + 1
            << " at the new value.\n";
}

nlohmann::ordered_json placementJson(const CornerPlacement& p)
{
    using nlohmann::ordered_json;
    ordered_json nearest = ordered_json::array();
    for (const auto& v : p.nearest)
        nearest.push_back({{"value", v.value},
                           {"text", v.text},
                           {"hz", v.hz ? ordered_json(*v.hz) : ordered_json(nullptr)},
                           {"corner", v.corner >= 0 ? ordered_json(v.corner + 1) : ordered_json(nullptr)}});
    return {{"corner", p.corner + 1},
            {"type", typeWord(p.type)},
            {"hz", p.startHz},
            {"target_hz", p.targetHz},
            {"part", p.part},
            {"kind", kindName(p.kind)},
            {"start_value", p.startValue},
            {"sensitivity", p.sensitivity},
            {"value", p.value},
            {"value_text", formatQuantity(p.value, valueUnit(p.kind), 6)},
            {"placed_hz", p.hz},
            {"placed_corner", p.landingCorner + 1},
            {"series", seriesName(p.series)},
            {"nearest", nearest},
            {"analyses", p.steps}};
}

}  // namespace

int runPlace(const std::vector<std::string>& arguments, std::ostream& out, std::ostream& err)
{
    ArgumentList args = parseArguments(arguments, {{"--corner", true},
                                                   {"--to", true},
                                                   {"--vary", true},
                                                   {"--series", true},
                                                   {"--json"},
                                                   {"--help"},
                                                   {"-h"}});
    if (args.has("--help") || args.has("-h")) {
        out << kPlaceHelp;
        return 0;
    }
    if (args.positional.empty())
        throw UsageError("place needs a network file");
    if (args.positional.size() > 1)
        throw UsageError("place takes one network file (\"" + args.positional[1] + "\" is extra)");
    for (const char* needed : {"--corner", "--to"})
        if (!args.has(needed))
            throw UsageError(std::string("place needs --corner N and --to HZ; ") + needed + " is missing");
    PlacementRequest request;
    request.corner = cornerOption(*args.value("--corner")) - 1;
    try {
        request.targetHz = parseFrequency(*args.value("--to"));
    } catch (const InputError& e) {
        throw UsageError(std::string("--to: ") + e.what());
    }
    if (const std::string* series = args.value("--series")) {
        const auto parsed = seriesFromName(*series);
        if (!parsed)
            throw UsageError("--series: \"" + *series + "\" is not one of E12, E24, E96");
        request.series = *parsed;
    }
    if (const std::string* part = args.value("--vary"))
        request.part = *part;

    const std::string path = args.positional.front();
    AnalysedFile file;
    if (!loadAndAnalyze(path, err, file))
        return 1;
    // A corner or part the file does not have is a wrong argument, not a
    // wrong file.
    const int count = static_cast<int>(file.analysis.breakpoints.size());
    if (request.corner >= count)
        throw UsageError("--corner: " + path + " has " + std::to_string(count) +
                         (count == 1 ? " corner" : " corners") + " (see 'tauline analyze " + path + "')");
    if (request.part) {
        const auto& parts = file.loaded.network.parts;
        if (std::none_of(parts.begin(), parts.end(), [&](const Part& p) { return p.name == *request.part; }))
            throw UsageError("--vary: " + path + " has no part named " + *request.part);
    }

    CornerPlacement placement;
    try {
        placement = placeCorner(file.loaded.network, request);
    } catch (const InputError& e) {
        for (const auto& problem : e.problems())
            err << path << ": " << problem << '\n';
        return 1;
    } catch (const std::exception& e) {
        err << path << ": the placement failed: " << e.what() << '\n';
        return 1;
    }
    for (const auto& w : file.warnings())
        err << path << ": warning: " << w << '\n';
    if (file.needsCaution())
        err << path << ": caution: " << hazardCautionText() << '\n';
    if (args.has("--json"))
        out << placementJson(placement).dump(2, ' ', false, nlohmann::ordered_json::error_handler_t::replace) << '\n';
    else
        writeTable(out, placement);
    return 0;
}

}  // namespace tauline::cli
