#include "PlacementDrag.h"

#include "BodeChart.h"
#include "QuantityText.h"

#include <QGraphicsLineItem>
#include <QGraphicsSimpleTextItem>
#include <QMouseEvent>
#include <QPen>
#include <QtCharts/QChartView>
#include <QtCharts/QLineSeries>

#include <cmath>

namespace tauline::ui {

namespace {
// Below this movement a press and release is a click, not a drag.
constexpr int kDragStartPixels = 4;
}

PlacementDrag::PlacementDrag(QChartView* view, BodeChart* chart) : QObject(chart), view_(view), chart_(chart)
{
    view_->viewport()->installEventFilter(this);
    line_ = new QGraphicsLineItem(chart_);
    line_->setPen(QPen(QColor(0x1f, 0x4e, 0x9a), 1.5, Qt::DashLine));
    line_->setZValue(40);
    line_->hide();
    label_ = new QGraphicsSimpleTextItem(chart_);
    label_->setBrush(QColor(0x1f, 0x4e, 0x9a));
    label_->setZValue(41);
    label_->hide();
}

bool PlacementDrag::eventFilter(QObject* watched, QEvent* event)
{
    if (watched != view_->viewport())
        return false;
    switch (event->type()) {
    case QEvent::MouseButtonPress: {
        const auto* mouse = static_cast<QMouseEvent*>(event);
        dragging_ = false;
        corner_.reset();
        if (mouse->button() == Qt::LeftButton) {
            pressedAt_ = mouse->position().toPoint();
            corner_ = chart_->cornerAt(view_->mapToScene(pressedAt_));
        }
        break;
    }
    case QEvent::MouseMove: {
        if (!corner_)
            break;
        const auto* mouse = static_cast<QMouseEvent*>(event);
        const QPoint at = mouse->position().toPoint();
        if (!dragging_ && (at - pressedAt_).manhattanLength() >= kDragStartPixels)
            dragging_ = true;
        if (dragging_) {
            if (const auto hz = chart_->frequencyAt(view_->mapToScene(at)))
                showTarget(*hz);
        }
        break;
    }
    case QEvent::MouseButtonRelease: {
        const auto* mouse = static_cast<QMouseEvent*>(event);
        if (corner_ && dragging_ && mouse->button() == Qt::LeftButton) {
            const int index = *corner_;
            const auto hz = chart_->frequencyAt(view_->mapToScene(mouse->position().toPoint()));
            hideTarget();
            corner_.reset();
            dragging_ = false;
            if (hz)
                emit chart_->cornerDragged(index, *hz);
            break;
        }
        hideTarget();
        corner_.reset();
        dragging_ = false;
        break;
    }
    default: break;
    }
    return false;
}

void PlacementDrag::showTarget(double hz)
{
    const QRectF area = chart_->plotArea();
    const double x = chart_->mapToPosition(QPointF(std::log10(hz), 0.0), chart_->sketchSeries()).x();
    line_->setLine(x, area.top(), x, area.bottom());
    line_->show();
    label_->setText(tr("corner %1 → %2").arg(*corner_ + 1).arg(frequencyText(hz)));
    const QRectF box = label_->boundingRect();
    const double left = std::min(x + 4.0, area.right() - box.width());
    label_->setPos(left, area.top() + 2.0);
    label_->show();
}

void PlacementDrag::hideTarget()
{
    line_->hide();
    label_->hide();
}

}  // namespace tauline::ui
