#include "SchematicScene.h"

#include "CanvasStyle.h"
#include "GroundItem.h"
#include "InlineEditor.h"
#include "JunctionItem.h"
#include "MarkerItem.h"
#include "PartItem.h"
#include "ProblemMarkerItem.h"
#include "SchematicDocument.h"
#include "SchematicSceneKinds.h"
#include "WireItem.h"

#include <QRegularExpression>

namespace tauline::ui {

namespace {

constexpr int kWheelBurstMs = 700;

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

bool SchematicScene::decorationsMatch(const Connectivity& c, const QList<DrawingProblem>& problems) const
{
    if (decorations_.size() != c.junctions.size() + problems.size())
        return false;
    for (qsizetype i = 0; i < c.junctions.size(); ++i) {
        const auto* dot = qgraphicsitem_cast<const JunctionItem*>(decorations_[i]);
        if (!dot || dot->pos() != QPointF(c.junctions[i]))
            return false;
    }
    for (qsizetype i = 0; i < problems.size(); ++i) {
        const auto* mark = qgraphicsitem_cast<const ProblemMarkerItem*>(decorations_[c.junctions.size() + i]);
        const DrawingProblem& p = problems[i];
        if (!mark || mark->problem().message != p.message || mark->problem().where != p.where
            || mark->problem().parts != p.parts || mark->problem().minor != p.minor)
            return false;
    }
    return true;
}

void SchematicScene::showDerived(const Connectivity& c, const QList<DrawingProblem>& problems)
{
    // A value edit leaves the dots and marks where they were: new items
    // would repaint the whole drawing (the view updates the rectangle
    // around everything that changed) on every step of a value drag.
    if (decorationsMatch(c, problems)) {
        for (QGraphicsItem* d : decorations_)
            d->show();  // hidden while a move was previewed
    } else {
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

}  // namespace tauline::ui
