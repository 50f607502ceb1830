#pragma once

#include <QObject>

class QAction;
class QChartView;

namespace tauline::ui {

class BodeChart;

// "Keep Curve as Reference" and "Dismiss Reference" for a Bode chart: the
// user keeps the curve shown now, edits, and sees the change against it.
// The window puts the actions in its View menu; they also sit in the plot's
// context menu once added to the plot's view (addTo).
class ReferenceCurveActions : public QObject {
    Q_OBJECT
public:
    ReferenceCurveActions(BodeChart* chart, QObject* parent);

    QAction* keepAction() const { return keep_; }
    QAction* dismissAction() const { return dismiss_; }

    // Adds both actions to the chart view's context menu.
    void addTo(QChartView* view) const;

private:
    void keep();
    void dismiss();
    void updateEnabled();

    BodeChart* chart_;
    QAction* keep_;
    QAction* dismiss_;
};

}  // namespace tauline::ui
