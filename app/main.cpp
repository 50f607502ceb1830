// tauline: the display-free commands (analyze, sweep) run without Qt; the
// editor and `plot` belong to the Qt side and are only there when it is built.
#include "CommandLine.h"

#include <iostream>
#include <string>
#include <string_view>

#ifdef TAULINE_WITH_UI
#include "EditorLaunch.h"
#include "PlotCommand.h"
#include "ReportCommand.h"
#endif

int main(int argc, char* argv[])
{
    const std::string_view command = argc >= 2 ? argv[1] : "";
    if (tauline::isCommandLineCommand(command))
        return tauline::runCommandLine(argc, argv, std::cout, std::cerr);

#ifdef TAULINE_WITH_UI
    // The Qt side: `plot FILE --svg OUT`, or the editor (a file, nothing).
    if (command == "--help" || command == "-h" || command == "help") {
        std::cout << "tauline [FILE]\n  Opens the editor on FILE, or on a sample network.\n\n";
        tauline::printCommandLineHelp(std::cout);
        std::cout << '\n' << tauline::ui::plotCommandHelp();
        std::cout << '\n' << tauline::ui::reportCommandHelp();
        return 0;
    }
    if (command == "plot")
        return tauline::ui::runPlotCommand(argc, argv);
    if (command == "report")
        return tauline::ui::runReportCommand(argc, argv);
    return tauline::ui::runEditor(argc, argv);
#else
    if (command == "--help" || command == "-h" || command == "help")
        return tauline::runCommandLine(argc, argv, std::cout, std::cerr);
#endif

    const bool qtCommand = command == "plot" || command == "report";
    std::cerr << "tauline: " << (qtCommand ? "'" + std::string(command) + "' needs the editor, which" : "the editor")
              << " is not built in this program.\n"
                 "Use 'tauline analyze FILE' or 'tauline sweep FILE ...'; 'tauline --help' lists them.\n";
    return 2;
}
