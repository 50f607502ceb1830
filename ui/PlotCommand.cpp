#include "PlotCommand.h"

#include "Errors.h"
#include "NetworkFile.h"
#include "PlotExport.h"
#include "QuantityText.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QFileInfo>

#include <cmath>
#include <cstdlib>
#include <iostream>
#include <optional>

namespace tauline::ui {

namespace {

constexpr int kOk = 0;
constexpr int kFailed = 1;
constexpr int kBadUsage = 2;

const char* const kUsage = "usage: tauline plot FILE --svg OUT.svg [--from HZ --to HZ]\n";

const char* const kHelp =
    "tauline plot FILE --svg OUT.svg [--from HZ --to HZ]\n"
    "  Writes the magnitude plot as SVG, without a display: the exact curve,\n"
    "  the straight-line sketch (dashed) and every corner marked and labelled,\n"
    "  on axes in Hz and dB (dB-ohm for impedances).\n"
    "  --svg OUT.svg     the file to write; nothing is written on failure\n"
    "  --from HZ --to HZ the frequency range; by default every corner with a\n"
    "                    decade to spare\n";

int badUsage(const QString& message)
{
    std::cerr << "tauline plot: " << message.toStdString() << '\n' << kUsage;
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

const char* plotCommandHelp()
{
    return kHelp;
}

int plotCommand(const QStringList& arguments)
{
    for (const QString& argument : arguments.mid(1))
        if (argument == QStringLiteral("--help") || argument == QStringLiteral("-h")) {
            std::cout << kHelp;
            return kOk;
        }
    QCommandLineParser parser;
    parser.setApplicationDescription(QStringLiteral("Write the magnitude plot of a network as SVG."));
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
        printProblems(file, error);
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
    // Standard error is for the user's problems, one line each: Qt's own
    // notes about the session (no runtime directory, no display) stay out.
    qInstallMessageHandler([](QtMsgType type, const QMessageLogContext&, const QString& message) {
        if (type == QtCriticalMsg || type == QtFatalMsg)
            std::cerr << message.toStdString() << '\n';
    });
    // Charts need a GUI application; a batch job has no display.
    if (!std::getenv("QT_QPA_PLATFORM"))
        setenv("QT_QPA_PLATFORM", "offscreen", 1);
    std::optional<QApplication> app;
    if (!QCoreApplication::instance())
        app.emplace(argc, argv);
    QStringList arguments;
    for (int i = 0; i < argc; ++i)
        if (i != 1)  // "plot"
            arguments << QString::fromLocal8Bit(argv[i]);
    return plotCommand(arguments);
}

}  // namespace tauline::ui
