// Mouse and keys on the canvas: what a press, drag, release or double
// click does with the tool in hand.
#include "SchematicScene.h"

#include "InlineEditor.h"
#include "MarkerItem.h"
#include "PartItem.h"
#include "PartLabelItem.h"
#include "SchematicDocument.h"
#include "SchematicSceneKinds.h"
#include "SymbolItem.h"
#include "ValueSeriesSetting.h"
#include "ValueStep.h"
#include "WireGeometry.h"
#include "WireItem.h"

#include <QGraphicsProxyWidget>
#include <QGraphicsSceneMouseEvent>
#include <QKeyEvent>
#include <cmath>

namespace tauline::ui {

namespace {

constexpr double kDragThreshold = 4.0;
constexpr double kValueDragPixelsPerStep = 6.0;

}  // namespace

void SchematicScene::mousePressEvent(QGraphicsSceneMouseEvent* e)
{
    endValueBurst();
    const QPointF pos = e->scenePos();
    if (editor_) {
        if (editor_->proxy()->sceneBoundingRect().contains(pos)) {
            QGraphicsScene::mousePressEvent(e);
            return;
        }
        editor_->commitOrDiscard();
    }
    const QPoint g = snapToGrid(pos);
    pressPos_ = pos;
    dragStarted_ = false;
    pressedItem_ = nullptr;
    drag_ = Drag::None;
    placedOnPress_ = false;

    if (e->button() == Qt::RightButton) {
        if (wireActive_)
            finishWire();
        else if (tool_ != Tool::Select)
            setTool(Tool::Select);
        e->accept();
        return;
    }
    if (e->button() != Qt::LeftButton) {
        e->ignore();  // the view pans with the middle button
        return;
    }
    if (isPlacementTool(tool_)) {
        placeAt(g);
        placedOnPress_ = true;
        e->accept();
        return;
    }
    if (wireActive_) {
        addWirePoint(g);
        e->accept();
        return;
    }
    bool horizontal = true;
    const std::optional<QPoint> start = wireStartNear(pos, &horizontal);
    if (tool_ == Tool::Wire) {
        if (start)
            startWire(*start, horizontal);
        else
            startWire(g, true);
        drag_ = Drag::Wire;
        e->accept();
        return;
    }

    // Select tool.
    for (QGraphicsItem* it : items(pos, Qt::IntersectsItemShape, Qt::DescendingOrder)) {
        auto* label = qgraphicsitem_cast<PartLabelItem*>(it);
        if (!label)
            continue;
        PartItem* part = label->part();
        if (!part->isSelected() && !(e->modifiers() & Qt::ControlModifier)) {
            clearSelection();
            part->setSelected(true);
        }
        if (label->valueRect().contains(label->mapFromScene(pos))) {
            drag_ = Drag::Value;
            valuePart_ = part->name();
            valueStart_ = part->value();
            valueSteps_ = 0;
        } else {
            drag_ = Drag::Move;
            pressedItem_ = part;
        }
        e->accept();
        return;
    }
    if (start) {
        startWire(*start, horizontal);
        drag_ = Drag::Wire;
        e->accept();
        return;
    }
    if (SchematicItem* hit = itemAt(pos)) {
        if (e->modifiers() & Qt::ControlModifier) {
            hit->setSelected(!hit->isSelected());
        } else {
            if (!hit->isSelected()) {
                clearSelection();
                hit->setSelected(true);
            }
            drag_ = Drag::Move;
            pressedItem_ = hit;
        }
        e->accept();
        return;
    }
    e->ignore();  // empty canvas: the view draws a rubber band
}

void SchematicScene::mouseMoveEvent(QGraphicsSceneMouseEvent* e)
{
    const QPointF pos = e->scenePos();
    lastCursor_ = snapToGrid(pos);
    if (ghost_)
        ghost_->setPos(lastCursor_);
    if (wireActive_)
        updateWirePreview(lastCursor_);
    if (drag_ == Drag::None || !(e->buttons() & Qt::LeftButton)) {
        QGraphicsScene::mouseMoveEvent(e);  // hover, rubber band
        return;
    }
    const QPointF d = pos - pressPos_;
    if (!dragStarted_ && d.manhattanLength() < kDragThreshold)
        return;
    switch (drag_) {
    case Drag::Move:
        if (!dragStarted_) {
            dragStarted_ = true;
            beginMove();
        }
        previewMove(snapToGrid(d));
        break;
    case Drag::Value: {
        PartItem* part = partNamed(valuePart_);
        if (!part)
            break;
        if (!dragStarted_) {
            dragStarted_ = true;
            document_->beginValueDrag(valuePart_);
        }
        const int steps = int(std::lround((pressPos_.y() - pos.y()) / kValueDragPixelsPerStep));
        if (steps != valueSteps_) {
            valueSteps_ = steps;
            const bool continuous = e->modifiers() & Qt::ShiftModifier;
            const double next = steps == 0 ? valueStart_
                                           : steppedValue(valueStart_, valueSeriesSetting(), steps, continuous);
            document_->dragValue(valuePart_, next);
        }
        break;
    }
    case Drag::Wire: dragStarted_ = true; break;
    case Drag::None: break;
    }
    e->accept();
}

void SchematicScene::mouseReleaseEvent(QGraphicsSceneMouseEvent* e)
{
    if (e->button() != Qt::LeftButton || drag_ == Drag::None) {
        QGraphicsScene::mouseReleaseEvent(e);
        return;
    }
    switch (drag_) {
    case Drag::Move:
        if (dragStarted_) {
            finishMove(moveDelta_);
        } else if (pressedItem_ && !(e->modifiers() & Qt::ControlModifier)) {
            SchematicItem* keep = pressedItem_;
            clearSelection();
            keep->setSelected(true);
        }
        break;
    case Drag::Value:
        if (dragStarted_)
            document_->endValueDrag();
        break;
    case Drag::Wire:
        if (wireActive_ && dragStarted_) {
            const QPoint g = snapToGrid(e->scenePos());
            if (g != wirePoints_.back())
                addWirePoint(g);
        }
        break;
    case Drag::None: break;
    }
    drag_ = Drag::None;
    pressedItem_ = nullptr;
    dragStarted_ = false;
    e->accept();
}

void SchematicScene::mouseDoubleClickEvent(QGraphicsSceneMouseEvent* e)
{
    const QPointF pos = e->scenePos();
    if (editor_ && editor_->proxy()->sceneBoundingRect().contains(pos)) {
        QGraphicsScene::mouseDoubleClickEvent(e);
        return;
    }
    e->accept();
    if (e->button() != Qt::LeftButton)
        return;
    if (wireActive_) {
        // The first click of the pair already added the point.
        finishWire();
        return;
    }
    if (placedOnPress_) {
        // Two quick clicks at two places are two placements, not a
        // double-click (and never an edit of what was just placed).
        const QPoint g = snapToGrid(pos);
        if (isPlacementTool(tool_) && g != lastPlaced_)
            placeAt(g);
        return;
    }
    if (tool_ != Tool::Select)
        return;
    for (QGraphicsItem* it : items(pos, Qt::IntersectsItemShape, Qt::DescendingOrder)) {
        if (auto* label = qgraphicsitem_cast<PartLabelItem*>(it)) {
            if (label->nameRect().contains(label->mapFromScene(pos)))
                editPartName(label->part());
            else
                editPartValue(label->part());
            return;
        }
    }
    SchematicItem* hit = itemAt(pos);
    if (auto* part = qgraphicsitem_cast<PartItem*>(hit)) {
        editPartValue(part);
    } else if (auto* wire = qgraphicsitem_cast<WireItem*>(hit)) {
        editWireLabel(wire);
    } else if (auto* marker = qgraphicsitem_cast<MarkerItem*>(hit); marker && marker->role() == MarkerRole::Input) {
        document_->setResponseKind(marker->drive() == DriveKind::Voltage ? tauline::ResponseKind::Transimpedance
                                                                         : tauline::ResponseKind::VoltageGain);
    }
}

void SchematicScene::keyPressEvent(QKeyEvent* e)
{
    if (editor_) {
        QGraphicsScene::keyPressEvent(e);
        return;
    }
    if (e->key() == Qt::Key_Escape) {
        escape();
        e->accept();
        return;
    }
    QGraphicsScene::keyPressEvent(e);
}

}  // namespace tauline::ui
