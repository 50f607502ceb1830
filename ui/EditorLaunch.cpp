#include "EditorLaunch.h"

#include "MainWindow.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QIcon>

#include <cstdio>

namespace tauline::ui {

int runEditor(int argc, char* argv[])
{
    QApplication app(argc, argv);
    QApplication::setOrganizationName(QStringLiteral("Tauline"));
    QApplication::setApplicationName(QStringLiteral("Tauline"));
    QApplication::setApplicationVersion(QStringLiteral("0.1"));
    QApplication::setWindowIcon(QIcon(QStringLiteral(":/resources/icons/tauline.svg")));

    QCommandLineParser parser;
    parser.setApplicationDescription(
        QStringLiteral("Draw an RC network and read its time constants, corners and Bode plot."));
    parser.addHelpOption();
    parser.addVersionOption();
    parser.addPositionalArgument(QStringLiteral("FILE"), QStringLiteral("A .tauline network to open."),
                                 QStringLiteral("[FILE]"));
    // Bad usage exits with 2, as everywhere on Tauline's command line.
    if (!parser.parse(QApplication::arguments())) {
        std::fprintf(stderr, "tauline: %s\n", qPrintable(parser.errorText()));
        return 2;
    }
    if (parser.isSet(QStringLiteral("version"))) {
        parser.showVersion();  // exits
    }
    if (parser.isSet(QStringLiteral("help")))
        parser.showHelp(0);  // exits
    const QStringList files = parser.positionalArguments();
    if (files.size() > 1) {
        std::fprintf(stderr, "tauline: give at most one file to open\n");
        return 2;
    }

    MainWindow window;
    if (files.isEmpty())
        window.openStartupSample();
    else
        window.openFile(files.front());  // a failure shows in the status bar
    window.show();
    return app.exec();
}

}  // namespace tauline::ui
