#include "PlotCommand.h"

#include "Errors.h"
#include "NetworkFile.h"
#include "PlotExport.h"
#include "SvgCommand.h"

#include <QFileInfo>

#include <cmath>
#include <iostream>
#include <optional>

namespace tauline::ui {

namespace {

constexpr int kOk = 0;
constexpr int kFailed = 1;

const char* const kHelp =
    "tauline plot FILE --svg OUT.svg [--from HZ --to HZ]\n"
    "  Writes the magnitude plot as SVG, without a display: the exact curve,\n"
    "  the straight-line sketch (dashed) and every corner marked and labelled,\n"
    "  on axes in Hz and dB (dB-ohm for impedances).\n"
    "  --svg OUT.svg     the file to write; nothing is written on failure\n"
    "  --from HZ --to HZ the frequency range; by default every corner with a\n"
    "                    decade to spare\n";

}  // namespace

const char* plotCommandHelp()
{
    return kHelp;
}

int plotCommand(const QStringList& arguments)
{
    const auto parsed = svgCommandArguments(arguments, "plot", kHelp);
    if (const int* status = std::get_if<int>(&parsed))
        return *status;
    const auto& [file, out, range] = std::get<SvgCommandArguments>(parsed);
    PlotSnapshot snapshot;
    snapshot.userRangeHz = range;
    try {
        const tauline::LoadedNetwork loaded = tauline::readNetworkFile(file.toStdString());
        for (const auto& warning : loaded.warnings)
            std::cerr << file.toStdString() << ": warning: " << warning << '\n';
        snapshot.analysis = tauline::analyze(loaded.network);
        snapshot.title = QString::fromStdString(loaded.network.title);
        if (snapshot.title.isEmpty())
            snapshot.title = QFileInfo(file).completeBaseName();
    } catch (const tauline::InputError& error) {
        printFileProblems(file, error);
        return kFailed;
    }

    QString error;
    if (!writePlotSvg(snapshot, out, &error)) {
        std::cerr << error.toStdString() << '\n';
        return kFailed;
    }
    return kOk;
}

int runPlotCommand(int argc, char* argv[])
{
    return runWithoutDisplay(argc, argv, plotCommand);
}

}  // namespace tauline::ui
