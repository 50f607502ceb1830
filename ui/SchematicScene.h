// The drawing: owns every placed item (by id), the tools the mouse works with
// (select and move, draw wires, place symbols), in-place editors, and the
// derived decorations (junction dots, problem marks). Every change the user
// makes goes through the document's undo stack as a command.
// One class, its definitions split by job: SchematicScene.cpp (the items
// and what is derived from them), SchematicSceneTools (tools, placing),
// ...Wires, ...Moves (move, rotate, mirror), ...Clipboard (delete, copy,
// paste), ...Editors (in-place editors), ...Values (value stepping),
// ...Mouse (mouse and keys), ...HitTests, ...Background (the grid).
#pragma once

#include "Connectivity.h"
#include "DrawingProblem.h"
#include "InlineEditor.h"
#include "ItemStates.h"

#include <QGraphicsScene>
#include <QPointer>
#include <QSet>
#include <QTimer>

#include <climits>
#include <map>
#include <optional>
#include <set>

class QGraphicsPathItem;
class QLineEdit;

namespace tauline::ui {

class InlineEditor;
class PartItem;
class SchematicDocument;
class SchematicItem;
class SymbolItem;
class WireItem;

class SchematicScene : public QGraphicsScene {
    Q_OBJECT
public:
    enum class Tool { Select, Wire, Resistor, Capacitor, Ground, Port, Input, Output };

    explicit SchematicScene(SchematicDocument* document);
    ~SchematicScene() override;

    SchematicDocument* document() const { return document_; }

    Tool tool() const { return tool_; }
    void setTool(Tool tool);

    // Items by id, in id (creation) order.
    SchematicItem* item(ItemId id) const;
    QList<SchematicItem*> schematicItems() const;
    QList<SchematicItem*> selectedSchematicItems() const;
    PartItem* partNamed(const QString& name) const;
    QList<PartItem*> parts() const;
    ItemId newId() { return nextId_++; }

    // Makes the listed ids match `target`: creates, updates or removes.
    void applyItemStates(const ItemStates& target, const std::set<ItemId>& ids);
    void clearDrawing();
    // A new item from a state (not added to the scene or the registry).
    static SchematicItem* createItem(const nlohmann::json& state);

    DrawingSnapshot snapshot() const;
    void showDerived(const Connectivity& connectivity, const QList<DrawingProblem>& problems);

    // The next free automatic name for a kind: R1, R2, C1...
    QString nextPartName(tauline::PartKind kind, const QSet<QString>& alsoTaken = {}) const;

    // Edits started from the keyboard or the menus.
    void rotateOrMirrorSelection(bool mirror);
    void deleteSelection();
    QByteArray copySelection() const;  // clipboard JSON, empty without a selection
    bool paste(const QByteArray& clipboardJson);

    // In-place editors.
    void editPartValue(PartItem* part);
    void editPartName(PartItem* part);
    void editWireLabel(WireItem* wire);
    QLineEdit* activeEditor() const;
    InlineEditor* inlineEditor() const { return editor_; }
    void closeEditor();

    bool isDrawingWire() const { return wireActive_; }
    void cancelWire();
    // Escape: cancel the wire, else leave a placement tool, else deselect.
    void escape();

    // The value of a selected part one wheel notch (or `steps` notches) on;
    // notches close together merge into one undo step.
    void stepPartValue(PartItem* part, int steps, bool continuous);
    void endValueBurst();

signals:
    void toolChanged(tauline::ui::SchematicScene::Tool tool);

protected:
    void mousePressEvent(QGraphicsSceneMouseEvent* event) override;
    void mouseMoveEvent(QGraphicsSceneMouseEvent* event) override;
    void mouseReleaseEvent(QGraphicsSceneMouseEvent* event) override;
    void mouseDoubleClickEvent(QGraphicsSceneMouseEvent* event) override;
    void wheelEvent(QGraphicsSceneWheelEvent* event) override;
    void keyPressEvent(QKeyEvent* event) override;
    void drawBackground(QPainter* painter, const QRectF& rect) override;

private:
    enum class Drag { None, Move, Value, Wire };

    void registerItem(SchematicItem* item);
    void unregisterItem(SchematicItem* item);

    // What is under a scene point.
    SchematicItem* itemAt(QPointF scenePos) const;
    std::optional<QPoint> wireStartNear(QPointF scenePos, bool* horizontal) const;
    bool isConnectionPoint(QPoint p) const;
    // Every terminal and wire end: corners there must not slide.
    QSet<QPoint> attachmentPoints() const;

    // Placement.
    void updateGhost();
    void placeAt(QPoint at);
    nlohmann::json ghostState(QPoint at) const;

    // Wires.
    void startWire(QPoint at, bool horizontalFirst);
    void addWirePoint(QPoint at);
    void finishWire();
    void updateWirePreview(QPoint cursor);

    // Moves.
    void beginMove();
    void previewMove(QPoint delta);
    void finishMove(QPoint delta);
    ItemStates movedStates(const GridMotion& motion, const QList<SchematicItem*>& moving,
                           ItemStates* before) const;

    void openEditor(const QRectF& at, const QString& text, std::function<QString(const QString&)> commit);
    // True when the dots and problem marks shown are the ones given, in order.
    bool decorationsMatch(const Connectivity& c, const QList<DrawingProblem>& problems) const;

    SchematicDocument* document_;
    Tool tool_ = Tool::Select;
    std::map<ItemId, SchematicItem*> items_;
    ItemId nextId_ = 1;
    QList<QGraphicsItem*> decorations_;

    SymbolItem* ghost_ = nullptr;
    int ghostTurns_ = 0;
    bool ghostMirror_ = false;
    QPoint lastCursor_;
    QPoint lastPlaced_{INT_MIN, INT_MIN};
    bool placedOnPress_ = false;

    Drag drag_ = Drag::None;
    QPointF pressPos_;
    bool dragStarted_ = false;
    SchematicItem* pressedItem_ = nullptr;
    ItemStates moveBefore_;
    QSet<ItemId> moveIds_;
    QVector<QPoint> moveTerminals_;
    QSet<QPoint> movePinned_;
    QPoint moveDelta_;

    QString valuePart_;
    double valueStart_ = 0.0;
    int valueSteps_ = 0;

    bool wireActive_ = false;
    QVector<QPoint> wirePoints_;
    bool wireHorizontalFirst_ = true;
    QGraphicsPathItem* wirePreview_ = nullptr;

    QPointer<InlineEditor> editor_;

    QTimer burstTimer_;
    QString burstPart_;
    int wheelRemainder_ = 0;
};

}  // namespace tauline::ui
