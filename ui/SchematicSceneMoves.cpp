// Moving, rotating and mirroring the selection; wires attached to what
// moves follow it.
#include "SchematicScene.h"

#include "SchematicDocument.h"
#include "SchematicItem.h"
#include "SymbolItem.h"
#include "WireGeometry.h"
#include "WireItem.h"
#include "commands/MoveItemsCommand.h"
#include "commands/RotateMirrorCommand.h"

#include <QUndoStack>

namespace tauline::ui {

namespace {

// Wires not being moved whose ends sit on the moving terminals follow them.
ItemStates followingWires(const std::map<ItemId, SchematicItem*>& all, const QSet<ItemId>& moving,
                          const QVector<QPoint>& terminals)
{
    ItemStates out;
    for (const auto& [id, item] : all) {
        auto* wire = qgraphicsitem_cast<WireItem*>(item);
        if (!wire || moving.contains(id) || wire->points().size() < 2)
            continue;
        if (terminals.contains(wire->points().front()) || terminals.contains(wire->points().back()))
            out[id] = wire->state();
    }
    return out;
}

ItemStates motionResult(const ItemStates& before, const QSet<ItemId>& moving, const QVector<QPoint>& terminals,
                        const GridMotion& motion, const QSet<QPoint>& pinned)
{
    QHash<QPoint, QPoint> moved;
    for (const QPoint& t : terminals)
        moved.insert(t, motion.map(t));
    ItemStates after;
    for (const auto& [id, state] : before) {
        if (moving.contains(id)) {
            after[id] = movedState(state, motion);
        } else {
            nlohmann::json s = state;
            setWirePoints(s, followMovedEnds(wirePoints(state), moved, pinned));
            after[id] = s;
        }
    }
    return after;
}

}  // namespace

ItemStates SchematicScene::movedStates(const GridMotion& motion, const QList<SchematicItem*>& moving,
                                       ItemStates* before) const
{
    QSet<ItemId> ids;
    QVector<QPoint> terminals;
    for (SchematicItem* item : moving) {
        ids.insert(item->itemId());
        (*before)[item->itemId()] = item->state();
        if (!qgraphicsitem_cast<WireItem*>(item))
            terminals += item->terminalPoints();
    }
    const ItemStates wires = followingWires(items_, ids, terminals);
    before->insert(wires.begin(), wires.end());
    return motionResult(*before, ids, terminals, motion, attachmentPoints());
}

void SchematicScene::beginMove()
{
    moveBefore_.clear();
    moveDelta_ = QPoint();
    moveIds_.clear();
    moveTerminals_.clear();
    for (SchematicItem* item : selectedSchematicItems()) {
        moveIds_.insert(item->itemId());
        if (!qgraphicsitem_cast<WireItem*>(item))
            moveTerminals_ += item->terminalPoints();
    }
    movedStates(GridMotion{}, selectedSchematicItems(), &moveBefore_);
    movePinned_ = attachmentPoints();
    for (QGraphicsItem* d : decorations_)
        d->hide();
}

void SchematicScene::previewMove(QPoint delta)
{
    if (delta == moveDelta_)
        return;
    moveDelta_ = delta;
    GridMotion motion;
    motion.delta = delta;
    const ItemStates after = motionResult(moveBefore_, moveIds_, moveTerminals_, motion, movePinned_);
    std::set<ItemId> ids;
    for (const auto& [id, state] : after)
        ids.insert(id);
    applyItemStates(after, ids);
}

void SchematicScene::finishMove(QPoint delta)
{
    std::set<ItemId> ids;
    for (const auto& [id, state] : moveBefore_)
        ids.insert(id);
    if (delta.isNull()) {
        applyItemStates(moveBefore_, ids);
        document_->refresh();
        return;
    }
    ItemStates after;
    for (ItemId id : ids)
        after[id] = item(id)->state();
    document_->undoStack()->push(new MoveItemsCommand(document_, moveBefore_, after));
    moveBefore_.clear();
}

void SchematicScene::rotateOrMirrorSelection(bool mirror)
{
    if (ghost_) {
        if (mirror)
            ghostMirror_ = !ghostMirror_;
        else
            ghostTurns_ = (ghostTurns_ + 1) % 4;
        updateGhost();
        return;
    }
    const QList<SchematicItem*> selected = selectedSchematicItems();
    if (selected.isEmpty())
        return;
    QPoint centre;
    if (selected.size() == 1 && !qgraphicsitem_cast<WireItem*>(selected.front())) {
        centre = selected.front()->pos().toPoint();
    } else {
        QRect box;
        for (SchematicItem* item : selected) {
            const QVector<QPoint> anchors = qgraphicsitem_cast<WireItem*>(item)
                                                ? qgraphicsitem_cast<WireItem*>(item)->points()
                                                : QVector<QPoint>{item->pos().toPoint()};
            for (const QPoint& p : anchors)
                box = box.isNull() ? QRect(p, QSize(1, 1)) : box.united(QRect(p, QSize(1, 1)));
        }
        centre = snapToGrid(QRectF(box).center());
    }
    GridMotion motion;
    motion.centre = centre;
    motion.mirror = mirror;
    motion.quarterTurns = mirror ? 0 : 1;
    ItemStates before;
    const ItemStates after = movedStates(motion, selected, &before);
    document_->undoStack()->push(new RotateMirrorCommand(document_, before, after, mirror));
}

}  // namespace tauline::ui
