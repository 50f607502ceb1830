#pragma once

#include <QByteArray>

namespace tauline::ui {

// Qt's text layout breaks a line into runs wherever the script changes (the
// Greek Ω after the Latin "k" of "22 kΩ" or "dB"), and QSvgGenerator writes
// each run as a <text> element of its own, so a script or a screen reader
// reads "22 k" and "Ω" apart. This joins such runs back into one element:
// neighbouring <text> elements with the same position on the line, font and
// colour, where the next one starts exactly where the previous one's text
// ends in that font. Separate labels on one line (table cells, tick labels)
// are set apart by a gap and stay as they are.
//
// The check measures with the fonts of this process, so call it on SVG the
// process has just written, with a resolution that matches the text layout's.
QByteArray joinScriptRuns(const QByteArray& svg);

}  // namespace tauline::ui
