#pragma once

namespace tauline::ui {

// `tauline` with no subcommand, or with a file only: the editor. Opens FILE
// when given, the compiled-in sample otherwise. Returns the exit status.
int runEditor(int argc, char* argv[]);

}  // namespace tauline::ui
