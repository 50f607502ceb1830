// The points a Bode chart's kept reference curve draws (its visible series).
// For the editor tests only: it needs the UI library.
#pragma once

#include "BodeChart.h"
#include "ReferenceCurve.h"

#include <QList>
#include <QPointF>
#include <QtCharts/QLineSeries>

namespace tauline::testing {

inline QList<QPointF> referencePoints(const tauline::ui::BodeChart& chart)
{
    QList<QPointF> points;
    for (QLineSeries* s : chart.reference()->series())
        if (s->isVisible())
            points += s->points();
    return points;
}

}  // namespace tauline::testing
