#pragma once

#include <ostream>
#include <string_view>

namespace tauline {

// The display-free commands: `analyze` and `sweep` (command-line.md), and
// `help`. argv[0] is the program, argv[1] the command. Returns the exit
// status: 0 success, 1 the file could not be read or analysed (one line per
// problem on err, naming the file), 2 bad usage.
int runCommandLine(int argc, char** argv, std::ostream& out, std::ostream& err);

// True for the words runCommandLine handles without the editor: "analyze",
// "sweep". (Help is the editor's when it is built; see app/main.cpp.)
bool isCommandLineCommand(std::string_view word);

// The full command-line help.
void printCommandLineHelp(std::ostream& out);

}  // namespace tauline
