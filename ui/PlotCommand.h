#pragma once

#include <QStringList>

namespace tauline::ui {

// `tauline plot FILE --svg OUT.svg [--from HZ --to HZ]`: the magnitude plot
// written as SVG without a display (the offscreen platform is chosen when
// none is set). argv[1] is "plot". Returns 0 on success, 2 for bad usage,
// 1 when the file cannot be read, analysed or written; OUT is left untouched
// on failure.
int runPlotCommand(int argc, char* argv[]);

// What `tauline --help` and `tauline plot --help` print about it.
const char* plotCommandHelp();

// The same once a QApplication exists: arguments are the program name and
// everything after "plot".
int plotCommand(const QStringList& arguments);

}  // namespace tauline::ui
