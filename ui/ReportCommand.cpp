#include "ReportCommand.h"

#include "Errors.h"
#include "NetworkFile.h"
#include "SvgCommand.h"
#include "ReviewPage.h"

#include <QFile>
#include <QFileInfo>

#include <iostream>
#include <optional>
#include <stdexcept>

namespace tauline::ui {

namespace {

constexpr int kOk = 0;
constexpr int kFailed = 1;

const char* const kHelp =
    "tauline report FILE --svg OUT.svg [--from HZ --to HZ]\n"
    "  Writes a design-review page as SVG, without a display: title and date,\n"
    "  the schematic (placed automatically for a file without a drawing), the\n"
    "  magnitude plot, the corner table with the parts that set each corner,\n"
    "  the time constants with the resistances seen, and the caution.\n"
    "  --svg OUT.svg     the file to write; nothing is written on failure\n"
    "  --from HZ --to HZ the plot's frequency range; by default every corner\n"
    "                    with a decade to spare\n";

}  // namespace

const char* reportCommandHelp()
{
    return kHelp;
}

int reportCommand(const QStringList& arguments)
{
    const auto parsed = svgCommandArguments(arguments, "report", kHelp);
    if (const int* status = std::get_if<int>(&parsed))
        return *status;
    const auto& [file, out, range] = std::get<SvgCommandArguments>(parsed);
    ReviewContent content;
    try {
        const tauline::LoadedNetwork loaded = tauline::readNetworkFile(QFile::encodeName(file).toStdString());
        for (const auto& warning : loaded.warnings)
            std::cerr << file.toStdString() << ": warning: " << warning << '\n';
        content = reviewContentOf(loaded.network, loaded.drawing, QFileInfo(file).fileName());
    } catch (const tauline::InputError& error) {
        printFileProblems(file, error);
        return kFailed;
    } catch (const std::exception& error) {
        // The engine gave up on this network (not the user's input as such).
        std::cerr << file.toStdString() << ": cannot be analysed: " << error.what() << '\n';
        return kFailed;
    }
    content.rangeHz = range;

    QString error;
    if (!writeReviewPageSvg(content, out, &error)) {
        std::cerr << error.toStdString() << '\n';
        return kFailed;
    }
    return kOk;
}

int runReportCommand(int argc, char* argv[])
{
    return runWithoutDisplay(argc, argv, reportCommand);
}

}  // namespace tauline::ui
