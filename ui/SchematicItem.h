// The base of everything the user places: an id that survives undo/redo and
// copy/paste, and a JSON state from which the item can be rebuilt exactly
// (undo commands and the clipboard store states, never pointers).
#pragma once

#include "DrawingSnapshot.h"

#include <QGraphicsItem>

#include <nlohmann/json.hpp>

namespace tauline::ui {

// QGraphicsItem::type() values, for qgraphicsitem_cast.
enum SchematicItemType {
    PartItemType = QGraphicsItem::UserType + 1,
    GroundItemType,
    MarkerItemType,
    WireItemType,
    PartLabelItemType,
    JunctionItemType,
    ProblemMarkerItemType,
};

class SchematicItem : public QGraphicsItem {
public:
    explicit SchematicItem(ItemId id);

    ItemId itemId() const { return id_; }

    // {"type": "part"|"ground"|"marker"|"wire", "id": n, ...}; see each item.
    virtual nlohmann::json state() const = 0;
    // Takes every field of a state of the same type (and role, for markers).
    virtual void applyState(const nlohmann::json& state) = 0;
    // Where wires attach, in scene coordinates (on the grid).
    virtual QVector<QPoint> terminalPoints() const { return {}; }

private:
    ItemId id_;
};

// Casts to the base (qgraphicsitem_cast needs one exact type).
SchematicItem* asSchematicItem(QGraphicsItem* item);

}  // namespace tauline::ui
