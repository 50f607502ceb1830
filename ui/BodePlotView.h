#pragma once

#include "Analysis.h"

#include <QWidget>

#include <optional>
#include <utility>

class QChartView;
class QGraphicsLineItem;
class QLabel;

namespace tauline::ui {

class BodeChart;

// The Bode chart on screen: the chart itself, a hairline that follows the
// mouse and a readout of the frequency and both curves under it.
class BodePlotView : public QWidget {
    Q_OBJECT
public:
    explicit BodePlotView(QWidget* parent = nullptr);

    BodeChart* chart() const { return chart_; }
    QChartView* chartView() const { return view_; }

    void setAnalysis(const tauline::Analysis& analysis);
    void showMessage(const QString& message);
    void setPhaseVisible(bool visible);
    void setUserRange(std::optional<std::pair<double, double>> rangeHz);
    void highlightCorner(int index);

    // Puts the hairline and readout at a frequency (the mouse does this too).
    void showReadoutAt(double hz);
    void hideReadout();
    QString readoutText() const;

signals:
    void cornerClicked(int index);

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    void cornerMarkerClicked(const QPointF& point);

    BodeChart* chart_ = nullptr;
    QChartView* view_ = nullptr;
    QLabel* readout_ = nullptr;
    QGraphicsLineItem* hairline_ = nullptr;
};

}  // namespace tauline::ui
