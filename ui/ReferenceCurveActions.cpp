#include "ReferenceCurveActions.h"

#include "BodeChart.h"

#include <QAction>
#include <QtCharts/QChartView>

namespace tauline::ui {

ReferenceCurveActions::ReferenceCurveActions(BodeChart* chart, QObject* parent)
    : QObject(parent), chart_(chart)
{
    keep_ = new QAction(tr("&Keep Curve as Reference"), this);
    keep_->setObjectName(QStringLiteral("keepReferenceAction"));
    keep_->setStatusTip(tr("Keep the curve shown now, drawn faintly, to compare the next edits with"));
    dismiss_ = new QAction(tr("&Dismiss Reference"), this);
    dismiss_->setObjectName(QStringLiteral("dismissReferenceAction"));
    dismiss_->setStatusTip(tr("Remove the kept reference curve"));
    connect(keep_, &QAction::triggered, this, &ReferenceCurveActions::keep);
    connect(dismiss_, &QAction::triggered, this, &ReferenceCurveActions::dismiss);
    updateEnabled();
}

void ReferenceCurveActions::addTo(QChartView* view) const
{
    view->setContextMenuPolicy(Qt::ActionsContextMenu);
    view->addAction(keep_);
    view->addAction(dismiss_);
}

void ReferenceCurveActions::keep()
{
    // Nothing to keep while the plot shows a message instead of a curve.
    if (chart_->analysis())
        chart_->keepReference();
    updateEnabled();
}

void ReferenceCurveActions::dismiss()
{
    chart_->dismissReference();
    updateEnabled();
}

void ReferenceCurveActions::updateEnabled()
{
    dismiss_->setEnabled(chart_->hasReference());
}

}  // namespace tauline::ui
