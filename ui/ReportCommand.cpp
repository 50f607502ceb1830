#include "ReportCommand.h"

#include "Errors.h"
#include "NetworkFile.h"
#include "QuantityText.h"
#include "ReviewPage.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QFile>
#include <QFileInfo>

#include <cstdlib>
#include <iostream>
#include <optional>
#include <stdexcept>

namespace tauline::ui {

namespace {

constexpr int kOk = 0;
constexpr int kFailed = 1;
constexpr int kBadUsage = 2;

const char* const kUsage = "usage: tauline report FILE --svg OUT.svg [--from HZ --to HZ]\n";

const char* const kHelp =
    "tauline report FILE --svg OUT.svg [--from HZ --to HZ]\n"
    "  Writes a design-review page as SVG, without a display: title and date,\n"
    "  the schematic (placed automatically for a file without a drawing), the\n"
    "  magnitude plot, the corner table with the parts that set each corner,\n"
    "  the time constants with the resistances seen, and the caution.\n"
    "  --svg OUT.svg     the file to write; nothing is written on failure\n"
    "  --from HZ --to HZ the plot's frequency range; by default every corner\n"
    "                    with a decade to spare\n";

int badUsage(const QString& message)
{
    std::cerr << "tauline report: " << message.toStdString() << '\n' << kUsage;
    return kBadUsage;
}

// Messages from the reader already name the file; the engine's name a part.
void printProblems(const QString& file, const tauline::InputError& error)
{
    const std::string prefix = file.toStdString();
    for (const auto& problem : error.problems()) {
        if (problem.rfind(prefix, 0) == 0)
            std::cerr << problem << '\n';
        else
            std::cerr << prefix << ": " << problem << '\n';
    }
}

}  // namespace

const char* reportCommandHelp()
{
    return kHelp;
}

int reportCommand(const QStringList& arguments)
{
    for (const QString& argument : arguments.mid(1))
        if (argument == QStringLiteral("--help") || argument == QStringLiteral("-h")) {
            std::cout << kHelp;
            return kOk;
        }
    QCommandLineParser parser;
    parser.setSingleDashWordOptionMode(QCommandLineParser::ParseAsLongOptions);
    const QCommandLineOption svgOption(QStringLiteral("svg"), QStringLiteral("Output SVG file."),
                                       QStringLiteral("OUT.svg"));
    const QCommandLineOption fromOption(QStringLiteral("from"), QStringLiteral("Lowest frequency (Hz)."),
                                        QStringLiteral("HZ"));
    const QCommandLineOption toOption(QStringLiteral("to"), QStringLiteral("Highest frequency (Hz)."),
                                      QStringLiteral("HZ"));
    parser.addOptions({svgOption, fromOption, toOption});
    parser.addPositionalArgument(QStringLiteral("FILE"), QStringLiteral("The network file."));
    if (!parser.parse(arguments))
        return badUsage(parser.errorText());

    const QStringList positional = parser.positionalArguments();
    if (positional.size() != 1)
        return badUsage(positional.isEmpty() ? QStringLiteral("no network file given")
                                             : QStringLiteral("more than one network file given"));
    if (!parser.isSet(svgOption) || parser.value(svgOption).isEmpty())
        return badUsage(QStringLiteral("--svg OUT.svg is required"));
    if (parser.values(svgOption).size() > 1 || parser.values(fromOption).size() > 1
        || parser.values(toOption).size() > 1)
        return badUsage(QStringLiteral("an option is given more than once"));
    if (parser.isSet(fromOption) != parser.isSet(toOption))
        return badUsage(QStringLiteral("--from and --to go together"));

    std::optional<std::pair<double, double>> range;
    if (parser.isSet(fromOption)) {
        const auto from = parseFrequencyText(parser.value(fromOption));
        const auto to = parseFrequencyText(parser.value(toOption));
        if (!from)
            return badUsage(QStringLiteral("--from \"%1\" is not a positive frequency in Hz")
                                .arg(parser.value(fromOption)));
        if (!to)
            return badUsage(QStringLiteral("--to \"%1\" is not a positive frequency in Hz")
                                .arg(parser.value(toOption)));
        if (!(*from < *to))
            return badUsage(QStringLiteral("--from must be below --to"));
        range = std::make_pair(*from, *to);
    }

    const QString file = positional.front();
    const QString out = parser.value(svgOption);
    ReviewContent content;
    try {
        const tauline::LoadedNetwork loaded = tauline::readNetworkFile(QFile::encodeName(file).toStdString());
        for (const auto& warning : loaded.warnings)
            std::cerr << file.toStdString() << ": warning: " << warning << '\n';
        content = reviewContentOf(loaded.network, loaded.drawing, QFileInfo(file).fileName());
    } catch (const tauline::InputError& error) {
        printProblems(file, error);
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
    // Standard error is for the user's problems, one line each: Qt's own
    // notes about the session (no runtime directory, no display) stay out.
    qInstallMessageHandler([](QtMsgType type, const QMessageLogContext&, const QString& message) {
        if (type == QtCriticalMsg || type == QtFatalMsg)
            std::cerr << message.toStdString() << '\n';
    });
    // The page's chart and drawing need a GUI application; a batch job has
    // no display.
    if (!std::getenv("QT_QPA_PLATFORM"))
        setenv("QT_QPA_PLATFORM", "offscreen", 1);
    std::optional<QApplication> app;
    if (!QCoreApplication::instance())
        app.emplace(argc, argv);
    QStringList arguments;
    for (int i = 0; i < argc; ++i)
        if (i != 1)  // "report"
            arguments << QString::fromLocal8Bit(argv[i]);
    return reportCommand(arguments);
}

}  // namespace tauline::ui
