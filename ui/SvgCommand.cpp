#include "SvgCommand.h"

#include "QuantityText.h"

#include <QApplication>
#include <QCommandLineParser>

#include <cstdlib>
#include <iostream>

namespace tauline::ui {

namespace {

// The arguments, or what is wrong with them.
std::variant<SvgCommandArguments, QString> parseSvgCommandArguments(const QStringList& arguments)
{
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
        return parser.errorText();

    const QStringList positional = parser.positionalArguments();
    if (positional.size() != 1)
        return positional.isEmpty() ? QStringLiteral("no network file given")
                                    : QStringLiteral("more than one network file given");
    if (!parser.isSet(svgOption) || parser.value(svgOption).isEmpty())
        return QStringLiteral("--svg OUT.svg is required");
    if (parser.values(svgOption).size() > 1 || parser.values(fromOption).size() > 1
        || parser.values(toOption).size() > 1)
        return QStringLiteral("an option is given more than once");
    if (parser.isSet(fromOption) != parser.isSet(toOption))
        return QStringLiteral("--from and --to go together");

    SvgCommandArguments out;
    out.file = positional.front();
    out.out = parser.value(svgOption);
    if (parser.isSet(fromOption)) {
        const auto from = parseFrequencyText(parser.value(fromOption));
        const auto to = parseFrequencyText(parser.value(toOption));
        if (!from)
            return QStringLiteral("--from \"%1\" is not a positive frequency in Hz").arg(parser.value(fromOption));
        if (!to)
            return QStringLiteral("--to \"%1\" is not a positive frequency in Hz").arg(parser.value(toOption));
        if (!(*from < *to))
            return QStringLiteral("--from must be below --to");
        out.rangeHz = std::make_pair(*from, *to);
    }
    return out;
}

}  // namespace

std::variant<SvgCommandArguments, int> svgCommandArguments(const QStringList& arguments, const char* name,
                                                           const char* help)
{
    for (const QString& argument : arguments.mid(1))
        if (argument == QStringLiteral("--help") || argument == QStringLiteral("-h")) {
            std::cout << help;
            return 0;
        }
    auto parsed = parseSvgCommandArguments(arguments);
    if (const QString* message = std::get_if<QString>(&parsed)) {
        const std::string text = help;
        std::cerr << "tauline " << name << ": " << message->toStdString() << '\n'
                  << "usage: " << text.substr(0, text.find('\n') + 1);
        return 2;
    }
    return std::get<SvgCommandArguments>(std::move(parsed));
}

void printFileProblems(const QString& file, const tauline::InputError& error)
{
    const std::string prefix = file.toStdString();
    for (const auto& problem : error.problems()) {
        if (problem.rfind(prefix, 0) == 0)
            std::cerr << problem << '\n';
        else
            std::cerr << prefix << ": " << problem << '\n';
    }
}

int runWithoutDisplay(int argc, char* argv[], const std::function<int(const QStringList&)>& command)
{
    // Standard error is for the user's problems, one line each: Qt's own
    // notes about the session (no runtime directory, no display) stay out.
    qInstallMessageHandler([](QtMsgType type, const QMessageLogContext&, const QString& message) {
        if (type == QtCriticalMsg || type == QtFatalMsg)
            std::cerr << message.toStdString() << '\n';
    });
    // Charts and drawings need a GUI application; a batch job has no display.
    if (!std::getenv("QT_QPA_PLATFORM"))
        setenv("QT_QPA_PLATFORM", "offscreen", 1);
    std::optional<QApplication> app;
    if (!QCoreApplication::instance())
        app.emplace(argc, argv);
    QStringList arguments;
    for (int i = 0; i < argc; ++i)
        if (i != 1)  // the subcommand
            arguments << QString::fromLocal8Bit(argv[i]);
    return command(arguments);
}

}  // namespace tauline::ui
