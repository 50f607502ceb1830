// Drawing a wire: the dashed preview, orthogonal bends, ending on a
// terminal or another wire.
#include "SchematicScene.h"

#include "CanvasStyle.h"
#include "SchematicDocument.h"
#include "WireGeometry.h"
#include "commands/AddWireCommand.h"

#include <QGraphicsPathItem>
#include <QPainterPath>
#include <QUndoStack>

namespace tauline::ui {

void SchematicScene::startWire(QPoint at, bool horizontalFirst)
{
    cancelWire();
    wireActive_ = true;
    wirePoints_ = {at};
    wireHorizontalFirst_ = horizontalFirst;
    wirePreview_ = new QGraphicsPathItem;
    QPen pen(style::wire(), style::kWireWidth, Qt::DashLine, Qt::RoundCap, Qt::RoundJoin);
    wirePreview_->setPen(pen);
    wirePreview_->setZValue(60);
    wirePreview_->setAcceptedMouseButtons(Qt::NoButton);
    addItem(wirePreview_);
    updateWirePreview(at);
}

void SchematicScene::updateWirePreview(QPoint cursor)
{
    if (!wireActive_ || !wirePreview_)
        return;
    QVector<QPoint> pts = wirePoints_;
    if (cursor != pts.back())
        pts += orthogonalRoute(pts.back(), cursor, wireHorizontalFirst_);
    QPainterPath path;
    path.moveTo(pts.front());
    for (qsizetype i = 1; i < pts.size(); ++i)
        path.lineTo(pts[i]);
    path.addEllipse(QPointF(pts.front()), 2.5, 2.5);
    wirePreview_->setPath(path);
}

void SchematicScene::addWirePoint(QPoint at)
{
    if (!wireActive_)
        return;
    const QPoint last = wirePoints_.back();
    if (at == last) {
        // A second click on the same point ends the wire there.
        if (wirePoints_.size() >= 2)
            finishWire();
        return;
    }
    wirePoints_ += orthogonalRoute(last, at, wireHorizontalFirst_);
    const QPoint a = wirePoints_[wirePoints_.size() - 2];
    wireHorizontalFirst_ = a.y() != at.y();  // turn at the next click
    if (isConnectionPoint(at))
        finishWire();
    else
        updateWirePreview(at);
}

void SchematicScene::finishWire()
{
    if (!wireActive_)
        return;
    const QVector<QPoint> points = simplifyPolyline(wirePoints_);
    cancelWire();
    if (points.size() < 2)
        return;
    nlohmann::json state;
    state["type"] = "wire";
    state["id"] = newId();
    setWirePoints(state, points);
    state["label"] = "";
    document_->undoStack()->push(new AddWireCommand(document_, state));
}

void SchematicScene::cancelWire()
{
    wireActive_ = false;
    wirePoints_.clear();
    delete wirePreview_;
    wirePreview_ = nullptr;
    if (drag_ == Drag::Wire)
        drag_ = Drag::None;
}

}  // namespace tauline::ui
