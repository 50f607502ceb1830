#pragma once

// What `tauline plot` and `tauline report` share: both read one network
// file and write one SVG without a display, with the same options and exit
// statuses.

#include "Errors.h"

#include <QString>
#include <QStringList>

#include <functional>
#include <optional>
#include <utility>
#include <variant>

namespace tauline::ui {

struct SvgCommandArguments {
    QString file;
    QString out;
    std::optional<std::pair<double, double>> rangeHz;  // --from, --to
};

// Reads "PROGRAM FILE --svg OUT.svg [--from HZ --to HZ]" (the subcommand,
// `name`, already removed). Either the arguments, or the exit status already
// settled and printed: 0 after --help (which prints `help`), 2 after bad
// usage (the problem, then `help`'s first line as the usage).
std::variant<SvgCommandArguments, int> svgCommandArguments(const QStringList& arguments, const char* name,
                                                           const char* help);

// One line per problem on stderr, each naming the file (the reader's
// messages already do; the engine's name a part).
void printFileProblems(const QString& file, const tauline::InputError& error);

// Runs `command` with the program name and everything after argv[1] (the
// subcommand), inside a QApplication on the offscreen platform unless one is
// chosen, with Qt's own session notes kept off stderr.
int runWithoutDisplay(int argc, char* argv[], const std::function<int(const QStringList&)>& command);

}  // namespace tauline::ui
