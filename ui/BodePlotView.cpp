#include "BodePlotView.h"

#include "BodeChart.h"
#include "QuantityText.h"

#include <QGraphicsLineItem>
#include <QLabel>
#include <QMouseEvent>
#include <QPen>
#include <QVBoxLayout>
#include <QtCharts/QChartView>
#include <QtCharts/QLineSeries>
#include <QtCharts/QScatterSeries>

#include <cmath>

namespace tauline::ui {

BodePlotView::BodePlotView(QWidget* parent) : QWidget(parent)
{
    chart_ = new BodeChart;
    view_ = new QChartView(chart_, this);
    view_->setRenderHint(QPainter::Antialiasing);
    view_->setMouseTracking(true);
    view_->viewport()->setMouseTracking(true);
    view_->viewport()->installEventFilter(this);
    view_->setMinimumSize(320, 220);

    hairline_ = new QGraphicsLineItem(chart_);
    hairline_->setPen(QPen(QColor(0x44, 0x44, 0x44, 140), 1, Qt::DotLine));
    hairline_->setZValue(30);
    hairline_->hide();

    readout_ = new QLabel(this);
    readout_->setTextFormat(Qt::PlainText);
    readout_->setMinimumHeight(readout_->fontMetrics().height() + 4);
    readout_->setText(tr("Move the mouse over the plot to read the curves."));
    readout_->setStyleSheet(QStringLiteral("color: #444; padding: 1px 6px;"));

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    layout->addWidget(view_, 1);
    layout->addWidget(readout_);

    connect(chart_->poleSeries(), &QScatterSeries::clicked, this,
            &BodePlotView::cornerMarkerClicked);
    connect(chart_->zeroSeries(), &QScatterSeries::clicked, this,
            &BodePlotView::cornerMarkerClicked);
}

void BodePlotView::setAnalysis(const tauline::Analysis& analysis)
{
    chart_->setAnalysis(analysis);
    hairline_->hide();
}

void BodePlotView::showMessage(const QString& message)
{
    chart_->showMessage(message);
    hideReadout();
}

void BodePlotView::setPhaseVisible(bool visible)
{
    chart_->setPhaseVisible(visible);
}

void BodePlotView::setUserRange(std::optional<std::pair<double, double>> rangeHz)
{
    chart_->setUserRange(rangeHz);
}

void BodePlotView::highlightCorner(int index)
{
    chart_->setHighlightedCorner(index);
}

void BodePlotView::showReadoutAt(double hz)
{
    const auto reading = chart_->readingAt(hz);
    if (!reading) {
        hideReadout();
        return;
    }
    const ResponseKind kind = chart_->analysis()->kind;
    QString text = tr("f = %1    exact %2    sketch %3")
                       .arg(frequencyText(reading->hz), decibelText(reading->exactDb, kind),
                            decibelText(reading->sketchDb, kind));
    if (chart_->isPhaseVisible())
        text += tr("    phase %1°").arg(reading->phaseDeg, 0, 'f', 1);
    readout_->setText(text);

    const QRectF area = chart_->plotArea();
    const double x = chart_->mapToPosition(QPointF(std::log10(hz), 0.0), chart_->sketchSeries()).x();
    if (x >= area.left() && x <= area.right()) {
        hairline_->setLine(x, area.top(), x, area.bottom());
        hairline_->show();
    }
}

void BodePlotView::hideReadout()
{
    hairline_->hide();
}

QString BodePlotView::readoutText() const
{
    return readout_->text();
}

bool BodePlotView::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == view_->viewport()) {
        if (event->type() == QEvent::MouseMove) {
            const auto* mouse = static_cast<QMouseEvent*>(event);
            const QPointF scenePos = view_->mapToScene(mouse->position().toPoint());
            if (const auto hz = chart_->frequencyAt(scenePos))
                showReadoutAt(*hz);
            else
                hideReadout();
        } else if (event->type() == QEvent::Leave) {
            hideReadout();
        }
    }
    return QWidget::eventFilter(watched, event);
}

void BodePlotView::cornerMarkerClicked(const QPointF& point)
{
    const auto& analysis = chart_->analysis();
    if (!analysis)
        return;
    int best = -1;
    double bestDistance = 0.05;  // decades
    for (std::size_t i = 0; i < analysis->breakpoints.size(); ++i) {
        const double d = std::abs(std::log10(analysis->breakpoints[i].hz) - point.x());
        if (d < bestDistance) {
            bestDistance = d;
            best = static_cast<int>(i);
        }
    }
    if (best >= 0)
        emit cornerClicked(best);
}

}  // namespace tauline::ui
