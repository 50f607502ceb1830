// A problem found in the drawing (the struct SchematicDocument.h publishes).
#pragma once

#include <QPointF>
#include <QString>
#include <QStringList>

namespace tauline::ui {

// A problem found in the drawing, shown where it is (never blocks editing).
struct DrawingProblem {
    QString message;
    QPointF where;        // scene position
    QStringList parts;    // parts involved, if any
    // Minor problems are normal while drawing (an open end); the canvas shows
    // them as a small mark without text.
    bool minor = false;
};

}  // namespace tauline::ui
