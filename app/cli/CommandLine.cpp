#include "CommandLine.h"

#include "AnalysedFile.h"
#include "AnalysisJson.h"
#include "AnalysisText.h"
#include "ArgumentList.h"
#include "Errors.h"
#include "HazardCaution.h"
#include "PlaceCommand.h"
#include "SweepOutput.h"
#include "ValueParser.h"

#include <string>
#include <vector>

namespace tauline {

namespace {

using cli::ArgumentList;
using cli::UsageError;

// Far more points than any plot needs; a typo such as 1e9 would otherwise
// fill memory and the terminal.
constexpr long kMaxSweepPoints = 100000;

constexpr const char* kUsage =
    "usage: tauline analyze FILE [--json]\n"
    "       tauline sweep FILE (--at HZ[,HZ...] | --from HZ --to HZ --points N) [--json | --csv]\n"
    "       tauline place FILE --corner N --to HZ [--vary PART] [--series E24] [--json]\n"
    "       tauline plot FILE --svg OUT.svg [--from HZ --to HZ]   (with the editor)\n";

constexpr const char* kAnalyzeHelp =
    "tauline analyze FILE [--json]\n"
    "  Reads a network file and prints its response: dc and high-frequency\n"
    "  limits, order, exact poles and zeros, the transfer function, every\n"
    "  capacitor's time constant with the resistance it sees (the other\n"
    "  capacitors open, the input zeroed) and its null time constant (the\n"
    "  response nulled; for an impedance, the port shorted), and the corners\n"
    "  of the straight-line sketch with exact and estimated frequency.\n"
    "  Estimates come from the time-constant sums (ratios of successive\n"
    "  coefficients of the numerator or denominator); corners whose estimate\n"
    "  is more than 10 % off are flagged.\n"
    "  --json   one JSON object instead of the table: response, unit, order,\n"
    "           dc, hf, poles, zeros, numerator, denominator, time_constants,\n"
    "           breakpoints, and more. Infinite quantities are null with a\n"
    "           sibling field saying so (limit, tau_state, tau_null_state).\n";

constexpr const char* kSweepHelp =
    "tauline sweep FILE (--at HZ[,HZ...] | --from HZ --to HZ --points N) [--json | --csv]\n"
    "  The exact response at chosen frequencies, low to high, duplicates once.\n"
    "  --at HZ,HZ,...   these frequencies (the option may be repeated)\n"
    "  --from HZ --to HZ --points N\n"
    "                   N log-spaced frequencies from HZ to HZ (N >= 2)\n"
    "  --json           a JSON array of {hz, re, im, db, deg}\n"
    "  --csv            a header line hz,re,im,db,deg and one row per frequency\n"
    "  Without --json or --csv a table is printed. Phase is in degrees,\n"
    "  wrapped to (-180, 180]; dB is 20·log10|H| (dB-ohm for impedances).\n";

constexpr const char* kFrequencyHelp =
    "Frequencies (HZ) are positive numbers in hertz with an optional SI prefix\n"
    "and an optional unit Hz, as values are written in network files:\n"
    "  1500, 1.5k, 1k5, 1.5 kHz, 2.2e3, 100m (= 0.1 Hz), 1M (= 1 MHz).\n"
    "  Prefixes are case-sensitive: m is milli, M is mega; k and K are kilo;\n"
    "  f p n u µ m k M G T are understood.\n";

constexpr const char* kExitHelp =
    "Exit status: 0 success; 1 the file could not be read or analysed (one\n"
    "message per problem on standard error, naming the file and the part or\n"
    "field); 2 bad usage.\n";

bool isHelpWord(std::string_view word)
{
    return word == "help" || word == "--help" || word == "-h";
}

std::string singleFile(const ArgumentList& args, const char* command)
{
    if (args.positional.empty())
        throw UsageError(std::string(command) + " needs a network file");
    if (args.positional.size() > 1)
        throw UsageError(std::string(command) + " takes one network file, got " +
                         std::to_string(args.positional.size()) + " (\"" + args.positional[1] + "\" is extra)");
    return args.positional.front();
}

double frequencyOption(const std::string& option, const std::string& text)
{
    try {
        return parseFrequency(text);
    } catch (const InputError& e) {
        throw UsageError(option + ": " + e.what());
    }
}

long pointsOption(const std::string& text)
{
    if (text.empty() || text.find_first_not_of("0123456789") != std::string::npos || text.size() > 9)
        throw UsageError("--points: \"" + text + "\" is not a whole number of points");
    long points = std::stol(text);
    if (points < 2)
        throw UsageError("--points: a sweep from --from to --to needs at least 2 points");
    if (points > kMaxSweepPoints)
        throw UsageError("--points: at most " + std::to_string(kMaxSweepPoints) + " points");
    return points;
}

int runAnalyze(const std::vector<std::string>& arguments, std::ostream& out, std::ostream& err)
{
    ArgumentList args = cli::parseArguments(arguments, {{"--json"}, {"--help"}, {"-h"}});
    if (args.has("--help") || args.has("-h")) {
        out << kAnalyzeHelp << '\n' << kExitHelp;
        return 0;
    }
    const std::string path = singleFile(args, "analyze");

    cli::AnalysedFile file;
    if (!cli::loadAndAnalyze(path, err, file))
        return 1;
    if (args.has("--json")) {
        for (const auto& w : file.warnings())
            err << path << ": warning: " << w << '\n';
        out << cli::analysisJson(file).dump(2, ' ', false, nlohmann::ordered_json::error_handler_t::replace) << '\n';
    } else {
        cli::writeAnalysisText(out, file);
    }
    return 0;
}

std::vector<double> sweepFrequencies(const ArgumentList& args)
{
    const bool at = args.has("--at");
    const bool range = args.has("--from") || args.has("--to") || args.has("--points");
    if (at && range)
        throw UsageError("give either --at or --from/--to/--points, not both");
    if (!at && !range)
        throw UsageError("sweep needs --at HZ[,HZ...] or --from HZ --to HZ --points N");

    if (at) {
        std::vector<double> hz;
        for (const auto& list : args.values.at("--at")) {
            size_t start = 0;
            while (true) {
                size_t comma = list.find(',', start);
                std::string item = list.substr(start, comma == std::string::npos ? std::string::npos : comma - start);
                hz.push_back(frequencyOption("--at", item));
                if (comma == std::string::npos)
                    break;
                start = comma + 1;
            }
        }
        return hz;
    }

    for (const char* needed : {"--from", "--to", "--points"})
        if (!args.has(needed))
            throw UsageError(std::string("a range sweep needs --from, --to and --points; ") + needed + " is missing");
    double from = frequencyOption("--from", *args.value("--from"));
    double to = frequencyOption("--to", *args.value("--to"));
    long points = pointsOption(*args.value("--points"));
    if (!(from < to))
        throw UsageError("--from must be below --to");
    return logSpacedHz(from, to, int(points));
}

int runSweep(const std::vector<std::string>& arguments, std::ostream& out, std::ostream& err)
{
    ArgumentList args = cli::parseArguments(arguments, {{"--at", true, true},
                                                        {"--from", true},
                                                        {"--to", true},
                                                        {"--points", true},
                                                        {"--json"},
                                                        {"--csv"},
                                                        {"--help"},
                                                        {"-h"}});
    if (args.has("--help") || args.has("-h")) {
        out << kSweepHelp << '\n' << kFrequencyHelp << '\n' << kExitHelp;
        return 0;
    }
    if (args.has("--json") && args.has("--csv"))
        throw UsageError("give --json or --csv, not both");
    const std::string path = singleFile(args, "sweep");
    std::vector<double> hz = sweepFrequencies(args);

    cli::AnalysedFile file;
    if (!cli::loadAndAnalyze(path, err, file))
        return 1;
    cli::SweepFormat format = args.has("--json")  ? cli::SweepFormat::Json
                              : args.has("--csv") ? cli::SweepFormat::Csv
                                                  : cli::SweepFormat::Table;
    if (format != cli::SweepFormat::Table) {
        for (const auto& w : file.warnings())
            err << path << ": warning: " << w << '\n';
        if (file.needsCaution())
            err << path << ": caution: " << hazardCautionText() << '\n';
    }
    cli::writeSweep(out, file, sweep(file.analysis, std::move(hz)), format);
    return 0;
}

}  // namespace

bool isCommandLineCommand(std::string_view word)
{
    return word == "analyze" || word == "sweep" || word == "place";
}

void printCommandLineHelp(std::ostream& out)
{
    out << "Tauline: time constants, poles and zeros of RC networks.\n\n"
        << kUsage << '\n'
        << kAnalyzeHelp << '\n'
        << kSweepHelp << '\n'
        << cli::kPlaceHelp << '\n'
        << kFrequencyHelp << '\n'
        << kExitHelp;
}

int runCommandLine(int argc, char** argv, std::ostream& out, std::ostream& err)
{
    std::vector<std::string> arguments(argv + (argc > 0 ? 1 : 0), argv + argc);
    try {
        if (arguments.empty())
            throw UsageError("no command given");
        const std::string command = arguments.front();
        std::vector<std::string> rest(arguments.begin() + 1, arguments.end());
        if (isHelpWord(command)) {
            printCommandLineHelp(out);
            return 0;
        }
        if (command == "analyze")
            return runAnalyze(rest, out, err);
        if (command == "sweep")
            return runSweep(rest, out, err);
        if (command == "place")
            return cli::runPlace(rest, out, err);
        throw UsageError("unknown command \"" + command + "\"");
    } catch (const UsageError& e) {
        err << "tauline: " << e.what() << '\n' << kUsage << "Run 'tauline --help' for details.\n";
        return 2;
    }
}

}  // namespace tauline
