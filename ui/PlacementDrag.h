#pragma once

#include <QObject>
#include <QPoint>

#include <optional>

class QChartView;
class QGraphicsLineItem;
class QGraphicsSimpleTextItem;

namespace tauline::ui {

class BodeChart;

// Dragging a corner's marker sideways on the Bode chart: a press on a marker
// and a move of a few pixels start the drag, a dashed line and a label show
// the target while the button is held, and the release makes the chart emit
// cornerDragged(index, hz). It watches the view's mouse events without
// taking them, so clicking a marker still selects its corner.
class PlacementDrag : public QObject {
    Q_OBJECT
public:
    PlacementDrag(QChartView* view, BodeChart* chart);

    bool isDragging() const { return dragging_; }

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    void showTarget(double hz);
    void hideTarget();

    QChartView* view_;
    BodeChart* chart_;
    std::optional<int> corner_;
    QPoint pressedAt_;
    bool dragging_ = false;
    QGraphicsLineItem* line_ = nullptr;
    QGraphicsSimpleTextItem* label_ = nullptr;
};

}  // namespace tauline::ui
