#include "SchematicScene.h"

#include "CanvasStyle.h"
#include "Errors.h"
#include "GroundItem.h"
#include "InlineEditor.h"
#include "ItemClipboard.h"
#include "JunctionItem.h"
#include "MarkerItem.h"
#include "PartItem.h"
#include "PartLabelItem.h"
#include "ProblemMarkerItem.h"
#include "SchematicDocument.h"
#include "ValueParser.h"
#include "ValueSeriesSetting.h"
#include "ValueStep.h"
#include "WireGeometry.h"
#include "WireItem.h"
#include "commands/AddItemsCommand.h"
#include "commands/AddWireCommand.h"
#include "commands/MoveItemsCommand.h"
#include "commands/PasteCommand.h"
#include "commands/RemoveItemsCommand.h"
#include "commands/RotateMirrorCommand.h"

#include <QGraphicsPathItem>
#include <QGraphicsProxyWidget>
#include <QGraphicsSceneMouseEvent>
#include <QGraphicsSceneWheelEvent>
#include <QGraphicsView>
#include <QKeyEvent>
#include <QLineEdit>
#include <QPainter>
#include <QRegularExpression>
#include <QUndoStack>

#include <cmath>

namespace tauline::ui {

namespace {

constexpr double kDragThreshold = 4.0;
constexpr double kValueDragPixelsPerStep = 6.0;
constexpr int kWheelBurstMs = 700;

std::optional<tauline::PartKind> partKindFromName(const std::string& name)
{
    for (auto kind : {tauline::PartKind::Resistor, tauline::PartKind::Capacitor, tauline::PartKind::Inductor,
                      tauline::PartKind::Transconductance, tauline::PartKind::VoltageAmplifier}) {
        if (name == tauline::kindName(kind))
            return kind;
    }
    return std::nullopt;
}

bool isPlacementTool(SchematicScene::Tool tool)
{
    return tool != SchematicScene::Tool::Select && tool != SchematicScene::Tool::Wire;
}

QString stateType(const nlohmann::json& s)
{
    return QString::fromStdString(s.value("type", std::string()));
}

// Whether an existing item can take `state` in place (else it is rebuilt).
bool takesState(SchematicItem* item, const nlohmann::json& s)
{
    const QString type = stateType(s);
    if (auto* part = qgraphicsitem_cast<PartItem*>(item))
        return type == QLatin1String("part") && partKindFromName(s.value("kind", std::string())) == part->kind();
    if (auto* marker = qgraphicsitem_cast<MarkerItem*>(item)) {
        MarkerRole role;
        return type == QLatin1String("marker")
               && markerRoleFromName(QString::fromStdString(s.value("role", std::string())), &role)
               && role == marker->role();
    }
    if (qgraphicsitem_cast<GroundItem*>(item))
        return type == QLatin1String("ground");
    if (qgraphicsitem_cast<WireItem*>(item))
        return type == QLatin1String("wire");
    return false;
}

}  // namespace

SchematicScene::SchematicScene(SchematicDocument* document) : QGraphicsScene(document), document_(document)
{
    setSceneRect(-4000, -3000, 8000, 6000);
    setItemIndexMethod(QGraphicsScene::NoIndex);
    burstTimer_.setSingleShot(true);
    burstTimer_.setInterval(kWheelBurstMs);
    connect(&burstTimer_, &QTimer::timeout, this, &SchematicScene::endValueBurst);
}

SchematicScene::~SchematicScene()
{
    // Editors own scene items: they go before the scene deletes its items.
    qDeleteAll(findChildren<InlineEditor*>(Qt::FindDirectChildrenOnly));
    blockSignals(true);
}

// ---------------------------------------------------------------- items

SchematicItem* SchematicScene::item(ItemId id) const
{
    auto it = items_.find(id);
    return it == items_.end() ? nullptr : it->second;
}

QList<SchematicItem*> SchematicScene::schematicItems() const
{
    QList<SchematicItem*> out;
    for (const auto& [id, item] : items_)
        out.push_back(item);
    return out;
}

QList<SchematicItem*> SchematicScene::selectedSchematicItems() const
{
    QList<SchematicItem*> out;
    for (const auto& [id, item] : items_) {
        if (item->isSelected())
            out.push_back(item);
    }
    return out;
}

PartItem* SchematicScene::partNamed(const QString& name) const
{
    for (const auto& [id, item] : items_) {
        if (auto* part = qgraphicsitem_cast<PartItem*>(item); part && part->name() == name)
            return part;
    }
    return nullptr;
}

QList<PartItem*> SchematicScene::parts() const
{
    QList<PartItem*> out;
    for (const auto& [id, item] : items_) {
        if (auto* part = qgraphicsitem_cast<PartItem*>(item))
            out.push_back(part);
    }
    return out;
}

SchematicItem* SchematicScene::createItem(const nlohmann::json& s)
{
    const QString type = stateType(s);
    const ItemId id = s.value("id", ItemId(0));
    SchematicItem* item = nullptr;
    if (type == QLatin1String("part")) {
        const auto kind = partKindFromName(s.value("kind", std::string()));
        if (!kind)
            return nullptr;
        item = new PartItem(id, *kind);
    } else if (type == QLatin1String("ground")) {
        item = new GroundItem(id);
    } else if (type == QLatin1String("marker")) {
        MarkerRole role;
        if (!markerRoleFromName(QString::fromStdString(s.value("role", std::string())), &role))
            return nullptr;
        item = createMarkerItem(id, role);
    } else if (type == QLatin1String("wire")) {
        item = new WireItem(id);
    } else {
        return nullptr;
    }
    item->applyState(s);
    return item;
}

void SchematicScene::registerItem(SchematicItem* item)
{
    items_[item->itemId()] = item;
    nextId_ = std::max(nextId_, item->itemId() + 1);
    addItem(item);
}

void SchematicScene::unregisterItem(SchematicItem* item)
{
    if (pressedItem_ == item) {
        pressedItem_ = nullptr;
        drag_ = Drag::None;
    }
    items_.erase(item->itemId());
    removeItem(item);
    delete item;
}

void SchematicScene::applyItemStates(const ItemStates& target, const std::set<ItemId>& ids)
{
    for (ItemId id : ids) {
        SchematicItem* existing = item(id);
        auto it = target.find(id);
        if (it == target.end()) {
            if (existing)
                unregisterItem(existing);
            continue;
        }
        nlohmann::json state = it->second;
        state["id"] = id;
        if (existing && takesState(existing, state)) {
            existing->applyState(state);
            continue;
        }
        if (existing)
            unregisterItem(existing);
        if (SchematicItem* created = createItem(state))
            registerItem(created);
    }
}

void SchematicScene::clearDrawing()
{
    if (editor_)
        editor_->discard();
    cancelWire();
    endValueBurst();
    drag_ = Drag::None;
    pressedItem_ = nullptr;
    while (!items_.empty())
        unregisterItem(items_.begin()->second);
    for (QGraphicsItem* d : decorations_)
        delete d;
    decorations_.clear();
    nextId_ = 1;
}

DrawingSnapshot SchematicScene::snapshot() const
{
    DrawingSnapshot s;
    for (const auto& [id, item] : items_) {
        if (auto* part = qgraphicsitem_cast<PartItem*>(item)) {
            const QVector<QPoint> t = part->terminalPoints();
            s.parts.push_back({id, part->name(), part->kind(), part->value(), part->valueText(), {t[0], t[1]},
                               part->pos()});
        } else if (auto* ground = qgraphicsitem_cast<GroundItem*>(item)) {
            s.grounds.push_back({id, ground->terminalPoints().value(0)});
        } else if (auto* wire = qgraphicsitem_cast<WireItem*>(item)) {
            if (wire->points().size() >= 2)
                s.wires.push_back({id, wire->points(), wire->label()});
        } else if (auto* marker = qgraphicsitem_cast<MarkerItem*>(item)) {
            const QVector<QPoint> t = marker->terminalPoints();
            s.markers.push_back({id, marker->role(), marker->drive(), {t[0], t[1]}, marker->pos()});
        }
    }
    return s;
}

void SchematicScene::showDerived(const Connectivity& c, const QList<DrawingProblem>& problems)
{
    for (QGraphicsItem* d : decorations_)
        delete d;
    decorations_.clear();
    for (const QPoint& p : c.junctions) {
        auto* dot = new JunctionItem(p);
        addItem(dot);
        decorations_.push_back(dot);
    }
    for (const DrawingProblem& problem : problems) {
        auto* mark = new ProblemMarkerItem(problem);
        addItem(mark);
        decorations_.push_back(mark);
    }
    QRectF used;
    for (const auto& [id, item] : items_) {
        if (auto* marker = qgraphicsitem_cast<MarkerItem*>(item))
            marker->setMinusGrounded(!c.markerTerminalJoined.value(id)[1]);
        used |= item->sceneBoundingRect();
    }
    // Room to scroll around the drawing, growing with it (never shrinking
    // under the user's scroll bars).
    const QRectF wanted = used.adjusted(-2000, -2000, 2000, 2000);
    if (!sceneRect().contains(wanted))
        setSceneRect(sceneRect().united(wanted));
}

QString SchematicScene::nextPartName(tauline::PartKind kind, const QSet<QString>& alsoTaken) const
{
    const QString prefix = PartItem::namePrefix(kind);
    const QRegularExpression pattern(QStringLiteral("^%1(\\d+)$").arg(QRegularExpression::escape(prefix)));
    int highest = 0;
    auto consider = [&](const QString& name) {
        const auto match = pattern.match(name);
        if (match.hasMatch())
            highest = std::max(highest, match.captured(1).toInt());
    };
    for (const auto& [id, item] : items_) {
        if (auto* part = qgraphicsitem_cast<PartItem*>(item))
            consider(part->name());
    }
    for (const QString& name : alsoTaken)
        consider(name);
    return prefix + QString::number(highest + 1);
}

// ---------------------------------------------------------------- hit tests

SchematicItem* SchematicScene::itemAt(QPointF pos) const
{
    for (QGraphicsItem* it : items(pos, Qt::IntersectsItemShape, Qt::DescendingOrder)) {
        if (auto* label = qgraphicsitem_cast<PartLabelItem*>(it))
            return label->part();
        if (SchematicItem* s = asSchematicItem(it); s && item(s->itemId()) == s)
            return s;
    }
    return nullptr;
}

std::optional<QPoint> SchematicScene::wireStartNear(QPointF pos, bool* horizontal) const
{
    std::optional<QPoint> best;
    double bestDistance = style::kTerminalHit;
    for (const auto& [id, item] : items_) {
        const auto* wire = qgraphicsitem_cast<WireItem*>(item);
        const QVector<QPoint> points = item->terminalPoints();
        for (const QPoint& t : points) {
            const double distance = std::hypot(t.x() - pos.x(), t.y() - pos.y());
            if (distance > bestDistance)
                continue;
            bestDistance = distance;
            best = t;
            if (wire) {
                // Carry on the way the wire ends.
                const QVector<QPoint>& p = wire->points();
                const QPoint neighbour = t == p.front() ? p.value(1) : p.value(p.size() - 2);
                *horizontal = neighbour.y() == t.y();
            } else {
                const QPointF out = QPointF(t) - item->mapToScene(QPointF(0, 0));
                *horizontal = std::abs(out.x()) > std::abs(out.y());
            }
        }
    }
    return best;
}

bool SchematicScene::isConnectionPoint(QPoint p) const
{
    for (const auto& [id, item] : items_) {
        if (auto* wire = qgraphicsitem_cast<WireItem*>(item)) {
            if (pointOnPolyline(p, wire->points()))
                return true;
        } else if (item->terminalPoints().contains(p)) {
            return true;
        }
    }
    return false;
}

QSet<QPoint> SchematicScene::attachmentPoints() const
{
    QSet<QPoint> points;
    for (const auto& [id, item] : items_) {
        for (const QPoint& p : item->terminalPoints())
            points.insert(p);
    }
    return points;
}

// ---------------------------------------------------------------- tools

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

// ---------------------------------------------------------------- wires

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

// ---------------------------------------------------------------- moves

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

void SchematicScene::deleteSelection()
{
    ItemStates removed;
    for (SchematicItem* item : selectedSchematicItems())
        removed[item->itemId()] = item->state();
    if (!removed.empty())
        document_->undoStack()->push(new RemoveItemsCommand(document_, removed));
}

QByteArray SchematicScene::copySelection() const
{
    std::vector<nlohmann::json> states;
    for (SchematicItem* item : selectedSchematicItems())
        states.push_back(item->state());
    return itemsToClipboard(states);
}

bool SchematicScene::paste(const QByteArray& bytes)
{
    const std::vector<nlohmann::json> incoming = itemsFromClipboard(bytes);
    if (incoming.empty())
        return false;
    PasteContext context;
    for (const auto& [id, item] : items_)
        context.existing.push_back(item->state());
    for (PartItem* part : parts())
        context.takenNames.insert(part->name());
    context.newId = [this] { return newId(); };
    context.nextName = [this](const std::string& kind, const QSet<QString>& taken) {
        return nextPartName(partKindFromName(kind).value_or(tauline::PartKind::Resistor), taken);
    };
    document_->undoStack()->push(new PasteCommand(document_, placePastedItems(incoming, context)));
    return true;
}

// ---------------------------------------------------------------- editors

void SchematicScene::openEditor(const QRectF& at, const QString& text, std::function<QString(const QString&)> commit)
{
    closeEditor();
    editor_ = new InlineEditor(this, at, text, std::move(commit));
    InlineEditor* opened = editor_;
    connect(opened, &InlineEditor::closed, this, [this, opened] {
        if (editor_ == opened)
            editor_ = nullptr;
    });
}

void SchematicScene::editPartValue(PartItem* part)
{
    const QString name = part->name();
    const QString text = part->valueText().isEmpty() ? part->label()->valueString() : part->valueText();
    SchematicDocument* document = document_;
    openEditor(part->label()->valueSceneRect(), text,
               [document, name](const QString& typed) { return document->setPartValueText(name, typed); });
}

void SchematicScene::editPartName(PartItem* part)
{
    const QString name = part->name();
    SchematicDocument* document = document_;
    openEditor(part->label()->nameSceneRect(), name,
               [document, name](const QString& typed) { return document->renamePart(name, typed); });
}

void SchematicScene::editWireLabel(WireItem* wire)
{
    QRectF at = wire->labelRect();
    if (at.isNull() && wire->points().size() >= 2) {
        const QPointF mid = (QPointF(wire->points()[0]) + QPointF(wire->points()[1])) / 2;
        at = QRectF(mid - QPointF(20, 16), QSizeF(40, 12));
    }
    const ItemId id = wire->itemId();
    SchematicDocument* document = document_;
    openEditor(at, wire->label(),
               [document, id](const QString& typed) { return document->setNodeLabel(id, typed); });
}

QLineEdit* SchematicScene::activeEditor() const
{
    return editor_ ? editor_->lineEdit() : nullptr;
}

void SchematicScene::closeEditor()
{
    if (editor_)
        editor_->commitOrDiscard();
}

// ---------------------------------------------------------------- values

void SchematicScene::stepPartValue(PartItem* part, int steps, bool continuous)
{
    if (steps == 0)
        return;
    if (burstPart_ != part->name()) {
        endValueBurst();
        burstPart_ = part->name();
        document_->beginValueDrag(burstPart_);
    }
    const double next = steppedValue(part->value(), valueSeriesSetting(), steps, continuous);
    document_->dragValue(burstPart_, next);
    burstTimer_.start();
}

void SchematicScene::endValueBurst()
{
    burstTimer_.stop();
    wheelRemainder_ = 0;
    if (!burstPart_.isEmpty()) {
        burstPart_.clear();
        document_->endValueDrag();
    }
}

// ---------------------------------------------------------------- events

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

void SchematicScene::wheelEvent(QGraphicsSceneWheelEvent* e)
{
    if (e->modifiers() & Qt::ControlModifier) {
        e->ignore();
        return;
    }
    PartItem* part = qgraphicsitem_cast<PartItem*>(itemAt(e->scenePos()));
    if (!part || !part->isSelected()) {
        e->ignore();
        return;
    }
    wheelRemainder_ += e->delta();
    const int steps = wheelRemainder_ / 120;
    wheelRemainder_ -= steps * 120;
    const int remainder = wheelRemainder_;
    if (steps != 0)
        stepPartValue(part, steps, e->modifiers() & Qt::ShiftModifier);
    wheelRemainder_ = remainder;
    e->accept();
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

void SchematicScene::drawBackground(QPainter* p, const QRectF& rect)
{
    p->fillRect(rect, style::paper());
    const double scale = std::abs(p->worldTransform().m11());
    // Dots no closer than 8 pixels: every grid point, or every 5th, 25th...
    int step = style::kGrid;
    while (step * scale < 8.0 && step < 100000)
        step *= 5;
    const int major = 5 * step;
    const int left = int(std::floor(rect.left() / step)) * step;
    const int top = int(std::floor(rect.top() / step)) * step;
    QVector<QPointF> minors;
    QVector<QPointF> majors;
    for (int x = left; x <= rect.right(); x += step) {
        for (int y = top; y <= rect.bottom(); y += step) {
            if (x % major == 0 && y % major == 0)
                majors.push_back(QPointF(x, y));
            else
                minors.push_back(QPointF(x, y));
        }
    }
    p->save();
    p->setRenderHint(QPainter::Antialiasing, false);
    QPen pen(style::gridDot());
    pen.setWidthF(1.0 / std::max(scale, 0.01));
    p->setPen(pen);
    p->drawPoints(minors.constData(), int(minors.size()));
    pen.setColor(style::gridMajor());
    pen.setWidthF(std::max(1.0, 1.6 / std::max(scale, 0.01)));
    p->setPen(pen);
    p->drawPoints(majors.constData(), int(majors.size()));
    p->restore();
}

}  // namespace tauline::ui
