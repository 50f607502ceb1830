#pragma once

#include <QStringList>

namespace tauline::ui {

// `tauline report FILE --svg OUT.svg [--from HZ --to HZ]`: the design-review
// page written as SVG without a display. argv[1] is "report". Exit status as
// `plot`: 0 success, 2 bad usage, 1 when the file cannot be read, analysed
// or written; OUT is left untouched on failure.
int runReportCommand(int argc, char* argv[]);

// What `tauline --help` and `tauline report --help` print about it.
const char* reportCommandHelp();

// The same once a QApplication exists: arguments are the program name and
// everything after "report".
int reportCommand(const QStringList& arguments);

}  // namespace tauline::ui
