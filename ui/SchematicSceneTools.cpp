// The tool in hand, the ghost symbol that follows the mouse, placing it,
// and Escape backing out of whatever is under way.
#include "SchematicScene.h"

#include "InlineEditor.h"
#include "MarkerItem.h"
#include "PartItem.h"
#include "SchematicDocument.h"
#include "SchematicSceneKinds.h"
#include "SymbolItem.h"
#include "ValueParser.h"
#include "commands/AddItemsCommand.h"

#include <QGraphicsView>
#include <QUndoStack>

namespace tauline::ui {

void SchematicScene::setTool(Tool tool)
{
    cancelWire();
    if (ghost_) {
        delete ghost_;
        ghost_ = nullptr;
    }
    const bool changed = tool != tool_;
    if (changed) {
        // A turn chosen for one kind of symbol does not carry over to the next.
        ghostTurns_ = 0;
        ghostMirror_ = false;
    }
    tool_ = tool;
    if (isPlacementTool(tool)) {
        ghost_ = static_cast<SymbolItem*>(createItem(ghostState(lastCursor_)));
        ghost_->setFlag(QGraphicsItem::ItemIsSelectable, false);
        ghost_->setOpacity(0.45);
        ghost_->setZValue(100);
        ghost_->setAcceptedMouseButtons(Qt::NoButton);
        addItem(ghost_);
    }
    for (QGraphicsView* view : views())
        view->viewport()->setCursor(tool == Tool::Select ? Qt::ArrowCursor : Qt::CrossCursor);
    if (changed)
        emit toolChanged(tool);
}

nlohmann::json SchematicScene::ghostState(QPoint at) const
{
    nlohmann::json s;
    s["id"] = 0;
    s["x"] = at.x();
    s["y"] = at.y();
    s["turns"] = ghostTurns_;
    s["mirror"] = ghostMirror_;
    switch (tool_) {
    case Tool::Resistor:
    case Tool::Capacitor: {
        const auto kind = tool_ == Tool::Resistor ? tauline::PartKind::Resistor : tauline::PartKind::Capacitor;
        const QString text = PartItem::defaultValueText(kind);
        s["type"] = "part";
        s["kind"] = tauline::kindName(kind);
        s["name"] = nextPartName(kind).toStdString();
        s["value"] = tauline::parseValue(text.toStdString(), kind);
        s["text"] = text.toStdString();
        break;
    }
    case Tool::Ground: s["type"] = "ground"; break;
    case Tool::Port:
    case Tool::Input:
    case Tool::Output:
        s["type"] = "marker";
        s["role"] = markerRoleName(tool_ == Tool::Port    ? MarkerRole::Port
                                   : tool_ == Tool::Input ? MarkerRole::Input
                                                          : MarkerRole::Output);
        s["drive"] = "voltage";
        break;
    default: break;
    }
    return s;
}

void SchematicScene::updateGhost()
{
    if (ghost_)
        ghost_->applyState(ghostState(lastCursor_));
}

void SchematicScene::placeAt(QPoint at)
{
    lastPlaced_ = at;
    nlohmann::json state = ghostState(at);
    const ItemId id = newId();
    state["id"] = id;
    const QString what = stateType(state) == QLatin1String("part") ? QString::fromStdString(state["name"])
                         : stateType(state) == QLatin1String("ground") ? tr("ground")
                                                                        : tr("marker");
    document_->undoStack()->push(new AddItemsCommand(document_, {{id, state}}, tr("Place %1").arg(what)));
    if (tool_ == Tool::Port || tool_ == Tool::Input || tool_ == Tool::Output)
        setTool(Tool::Select);
    else
        updateGhost();
}

void SchematicScene::escape()
{
    if (editor_)
        editor_->discard();
    else if (wireActive_)
        cancelWire();
    else if (tool_ != Tool::Select)
        setTool(Tool::Select);
    else
        clearSelection();
}

}  // namespace tauline::ui
