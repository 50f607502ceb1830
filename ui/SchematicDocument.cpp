#include "SchematicDocument.h"

#include "AutoPlacement.h"
#include "CanvasActions.h"
#include "Connectivity.h"
#include "DerivedNetwork.h"
#include "DrawingJson.h"
#include "DrawingProblems.h"
#include "Errors.h"
#include "MarkerItem.h"
#include "NetworkComparison.h"
#include "NetworkFile.h"
#include "PartItem.h"
#include "SchematicScene.h"
#include "ValueParser.h"
#include "ValueStep.h"
#include "WireItem.h"
#include "commands/LabelNodeCommand.h"
#include "commands/RenameCommand.h"
#include "commands/SetResponseCommand.h"
#include "commands/SetTitleCommand.h"
#include "commands/SetValueCommand.h"

#include <QFile>
#include <QFileInfo>
#include <QSaveFile>
#include <QUndoStack>

#include <cmath>

namespace tauline::ui {

SchematicDocument::SchematicDocument(QObject* parent) : QObject(parent)
{
    undoStack_ = new QUndoStack(this);
    scene_ = new SchematicScene(this);
    actions_ = new CanvasActions(this);
    connect(undoStack_, &QUndoStack::cleanChanged, this, [this](bool clean) { emit modifiedChanged(!clean); });
    connect(scene_, &QGraphicsScene::selectionChanged, this, &SchematicDocument::updateSelectedPart);
    refresh();
}

SchematicDocument::~SchematicDocument()
{
    delete actions_;
    disconnect(scene_, nullptr, this, nullptr);
    undoStack_->clear();
    delete scene_;
}

SchematicScene* SchematicDocument::scene() const
{
    return scene_;
}

QUndoStack* SchematicDocument::undoStack() const
{
    return undoStack_;
}

CanvasActions* SchematicDocument::actions() const
{
    return actions_;
}

QList<QAction*> SchematicDocument::editActions() const
{
    return actions_->editActions();
}

QList<QAction*> SchematicDocument::toolActions() const
{
    return actions_->toolActions();
}

tauline::Network SchematicDocument::network() const
{
    return network_;
}

bool SchematicDocument::hasResponse() const
{
    return hasResponse_;
}

QList<DrawingProblem> SchematicDocument::problems() const
{
    return problems_;
}

// ---------------------------------------------------------------- deriving

void SchematicDocument::refresh()
{
    DrawingSnapshot snapshot = scene_->snapshot();
    snapshot.title = title_;
    const Connectivity connectivity = deriveConnectivity(snapshot);
    DerivedNetwork derived = deriveNetwork(snapshot, connectivity);
    const QList<DrawingProblem> problems = findDrawingProblems(snapshot, connectivity, derived);
    scene_->showDerived(connectivity, problems);

    partNodes_.clear();
    for (const DrawnPart& p : snapshot.parts) {
        const auto nodes = connectivity.partNodes.value(p.id);
        partNodes_.insert(p.name, {connectivity.nodeName(nodes[0]), connectivity.nodeName(nodes[1])});
    }

    const bool changed = forceNetworkChanged_ || hasResponse_ != derived.hasResponse
                         || !sameAnalysis(network_, derived.network);
    forceNetworkChanged_ = false;
    network_ = std::move(derived.network);
    hasResponse_ = derived.hasResponse;

    bool problemsChanged = problems.size() != problems_.size();
    for (qsizetype i = 0; !problemsChanged && i < problems.size(); ++i)
        problemsChanged = problems[i].message != problems_[i].message || problems[i].where != problems_[i].where;
    problems_ = problems;

    updateSelectedPart();
    if (problemsChanged)
        emit this->problemsChanged();
    if (changed)
        emit networkChanged();
}

void SchematicDocument::updateSelectedPart()
{
    QString name;
    int count = 0;
    for (SchematicItem* item : scene_->selectedSchematicItems()) {
        if (auto* part = qgraphicsitem_cast<PartItem*>(item)) {
            name = part->name();
            ++count;
        }
    }
    if (count != 1)
        name.clear();
    if (name != selectedPart_) {
        selectedPart_ = name;
        emit selectedPartChanged(name);
    }
}

QString SchematicDocument::selectedPart() const
{
    return selectedPart_;
}

void SchematicDocument::highlightParts(const QStringList& parts)
{
    for (PartItem* part : scene_->parts())
        part->setHighlighted(parts.contains(part->name()));
}

std::optional<tauline::Part> SchematicDocument::part(const QString& name) const
{
    PartItem* item = scene_->partNamed(name);
    if (!item)
        return std::nullopt;
    tauline::Part p;
    p.name = name.toStdString();
    p.kind = item->kind();
    p.value = item->value();
    p.valueText = item->valueText().toStdString();
    const auto nodes = partNodes_.value(name);
    p.nodes = {nodes[0].toStdString(), nodes[1].toStdString()};
    return p;
}

QStringList SchematicDocument::partNames() const
{
    QStringList names;
    for (PartItem* part : scene_->parts())
        names.push_back(part->name());
    return names;
}

// ---------------------------------------------------------------- edits

void SchematicDocument::setPartValue(const QString& part, double value, const QString& text)
{
    PartItem* item = scene_->partNamed(part);
    if (!item || !(value > 0.0) || !std::isfinite(value))
        return;
    QString t = text.trimmed();
    double v = value;
    if (t.isEmpty()) {
        const ValueWithText canonical = canonicalValue(value, item->kind());
        t = canonical.text;
        v = canonical.value;
    }
    if (v == item->value() && t == item->valueText())
        return;
    nlohmann::json before = item->state();
    nlohmann::json after = before;
    after["value"] = v;
    after["text"] = t.toStdString();
    undoStack_->push(new SetValueCommand(this, {{item->itemId(), before}}, {{item->itemId(), after}}, part, 0));
}

QString SchematicDocument::setPartValueText(const QString& part, const QString& text)
{
    PartItem* item = scene_->partNamed(part);
    if (!item)
        return tr("There is no part named %1").arg(part);
    const QString typed = text.trimmed();
    try {
        const double value = tauline::parseValue(typed.toStdString(), item->kind());
        setPartValue(part, value, typed);
        return {};
    } catch (const tauline::InputError& error) {
        return QStringLiteral("%1: %2").arg(part, QString::fromStdString(error.what()));
    }
}

void SchematicDocument::beginValueDrag(const QString& part)
{
    dragPart_ = part;
    dragSerial_ = ++lastSerial_;
}

void SchematicDocument::dragValue(const QString& part, double value)
{
    PartItem* item = scene_->partNamed(part);
    if (!item || !(value > 0.0) || !std::isfinite(value))
        return;
    const quint64 serial = part == dragPart_ ? dragSerial_ : 0;
    if (serial != 0 && dragStartSerial_ != serial) {
        dragStartSerial_ = serial;
        dragStartValue_ = item->value();
        dragStartText_ = item->valueText();
    }
    ValueWithText next = canonicalValue(value, item->kind());
    // Back where the drag began: the text as it was, so the drag cancels out.
    if (serial != 0 && next.value == dragStartValue_)
        next.text = dragStartText_;
    if (next.value == item->value() && next.text == item->valueText())
        return;
    nlohmann::json before = item->state();
    nlohmann::json after = before;
    after["value"] = next.value;
    after["text"] = next.text.toStdString();
    undoStack_->push(new SetValueCommand(this, {{item->itemId(), before}}, {{item->itemId(), after}}, part, serial));
}

void SchematicDocument::endValueDrag()
{
    dragPart_.clear();
    dragSerial_ = 0;
}

QString SchematicDocument::renamePart(const QString& from, const QString& to)
{
    PartItem* item = scene_->partNamed(from);
    if (!item)
        return tr("There is no part named %1").arg(from);
    const QString name = to.trimmed();
    if (name.isEmpty())
        return tr("A part needs a name");
    if (name == from)
        return {};
    if (scene_->partNamed(name))
        return tr("%1 is the name of another part").arg(name);
    nlohmann::json before = item->state();
    nlohmann::json after = before;
    after["name"] = name.toStdString();
    undoStack_->push(new RenameCommand(this, {{item->itemId(), before}}, {{item->itemId(), after}},
                                       tr("Rename %1 to %2").arg(from, name)));
    return {};
}

QString SchematicDocument::setNodeLabel(ItemId wireId, const QString& label)
{
    auto* wire = qgraphicsitem_cast<WireItem*>(scene_->item(wireId));
    if (!wire)
        return tr("That wire no longer exists");
    const QString name = label.trimmed();
    if (name.contains(QLatin1Char('"')))
        return tr("A node name cannot contain a double quote");
    if (name == wire->label())
        return {};
    nlohmann::json before = wire->state();
    nlohmann::json after = before;
    after["label"] = name.toStdString();
    undoStack_->push(new LabelNodeCommand(this, {{wireId, before}}, {{wireId, after}}));
    return {};
}

std::optional<tauline::ResponseKind> SchematicDocument::responseKind() const
{
    std::optional<tauline::ResponseKind> kind;
    for (SchematicItem* item : scene_->schematicItems()) {
        auto* marker = qgraphicsitem_cast<MarkerItem*>(item);
        if (!marker)
            continue;
        if (marker->role() == MarkerRole::Port)
            return tauline::ResponseKind::Impedance;
        if (marker->role() == MarkerRole::Input)
            kind = marker->drive() == DriveKind::Current ? tauline::ResponseKind::Transimpedance
                                                         : tauline::ResponseKind::VoltageGain;
        else if (!kind)
            kind = tauline::ResponseKind::VoltageGain;
    }
    return kind;
}

void SchematicDocument::setResponseKind(tauline::ResponseKind kind)
{
    QList<MarkerItem*> ports, inputs, outputs;
    for (SchematicItem* item : scene_->schematicItems()) {
        if (auto* marker = qgraphicsitem_cast<MarkerItem*>(item)) {
            if (marker->role() == MarkerRole::Port)
                ports.push_back(marker);
            else if (marker->role() == MarkerRole::Input)
                inputs.push_back(marker);
            else
                outputs.push_back(marker);
        }
    }
    ItemStates before, after;
    if (kind == tauline::ResponseKind::Impedance) {
        if (!ports.isEmpty() || inputs.isEmpty())
            return;
        // The input becomes the port, in its place; the output goes.
        nlohmann::json s = inputs.front()->state();
        before[inputs.front()->itemId()] = s;
        s["role"] = "port";
        s["drive"] = "voltage";
        after[inputs.front()->itemId()] = s;
        for (MarkerItem* output : outputs)
            before[output->itemId()] = output->state();
    } else {
        const char* drive = kind == tauline::ResponseKind::Transimpedance ? "current" : "voltage";
        if (!inputs.isEmpty()) {
            for (MarkerItem* input : inputs) {
                nlohmann::json s = input->state();
                if (s["drive"] == drive)
                    continue;
                before[input->itemId()] = s;
                s["drive"] = drive;
                after[input->itemId()] = s;
            }
        } else if (!ports.isEmpty()) {
            // The port becomes the input; an output waits beside it.
            nlohmann::json s = ports.front()->state();
            before[ports.front()->itemId()] = s;
            s["role"] = "input";
            s["drive"] = drive;
            after[ports.front()->itemId()] = s;
            if (outputs.isEmpty()) {
                nlohmann::json out = s;
                const ItemId id = scene_->newId();
                out["id"] = id;
                out["role"] = "output";
                out["drive"] = "voltage";
                out["x"] = s.value("x", 0) + 80;
                after[id] = out;
            }
        }
    }
    if (!before.empty() || !after.empty())
        undoStack_->push(new SetResponseCommand(this, before, after));
}

void SchematicDocument::setTitle(const QString& title)
{
    if (title != title_)
        undoStack_->push(new SetTitleCommand(this, title_, title));
}

void SchematicDocument::applyTitle(const QString& title)
{
    title_ = title;
    network_.title = title.toStdString();
    emit titleChanged(title);
}

QString SchematicDocument::title() const
{
    return title_;
}

// ---------------------------------------------------------------- files

QString SchematicDocument::filePath() const
{
    return filePath_;
}

void SchematicDocument::setFilePath(const QString& path)
{
    if (path != filePath_) {
        filePath_ = path;
        emit filePathChanged(path);
    }
}

bool SchematicDocument::isModified() const
{
    return !undoStack_->isClean();
}

QStringList SchematicDocument::loadWarnings() const
{
    return loadWarnings_;
}

bool SchematicDocument::hasViewState() const
{
    return hasViewState_;
}

QPointF SchematicDocument::viewCentre() const
{
    return viewCentre_;
}

double SchematicDocument::viewZoom() const
{
    return viewZoom_;
}

void SchematicDocument::setViewState(QPointF centre, double zoom)
{
    hasViewState_ = true;
    viewCentre_ = centre;
    viewZoom_ = zoom;
}

bool SchematicDocument::placeDrawing(const nlohmann::json& drawing, const tauline::Network* network, QString* why)
{
    std::vector<nlohmann::json> states;
    if (!itemsFromDrawing(drawing, network, &states, why))
        return false;
    ItemStates target;
    std::set<ItemId> ids;
    for (nlohmann::json& s : states) {
        const ItemId id = scene_->newId();
        s["id"] = id;
        target[id] = s;
        ids.insert(id);
    }
    scene_->applyItemStates(target, ids);
    if (const auto view = viewFromDrawing(drawing)) {
        hasViewState_ = true;
        viewCentre_ = view->centre;
        viewZoom_ = view->zoom;
    }
    return true;
}

void SchematicDocument::load(const tauline::Network& network, const nlohmann::json& drawingIn, bool checkDrawing)
{
    scene_->clearDrawing();
    undoStack_->clear();
    loadWarnings_.clear();
    hasViewState_ = false;
    title_ = QString::fromStdString(network.title);
    nlohmann::json drawing = drawingIn;
    if (drawing.is_object() && drawing.contains("drawing") && !drawing.contains("format"))
        drawing = drawing["drawing"];

    bool placed = false;
    if (drawing.is_object()) {
        QString why;
        placed = placeDrawing(drawing, checkDrawing ? &network : nullptr, &why);
        if (!placed) {
            loadWarnings_.push_back(tr("The drawing could not be read (%1); the parts were placed afresh").arg(why));
        } else if (checkDrawing) {
            DrawingSnapshot snapshot = scene_->snapshot();
            const Connectivity connectivity = deriveConnectivity(snapshot);
            const DerivedNetwork derived = deriveNetwork(snapshot, connectivity);
            if (!sameConnectivity(network, derived.network, true)) {
                loadWarnings_.push_back(tr("The drawing no longer matched the file's parts and nodes; the parts "
                                           "were placed afresh"));
                scene_->clearDrawing();
                hasViewState_ = false;
                placed = false;
            }
        }
    }
    if (!placed) {
        const AutoPlacementResult automatic = placeAutomatically(network);
        loadWarnings_ += automatic.warnings;
        QString why;
        placeDrawing(automatic.drawing, &network, &why);
    }
    undoStack_->clear();
    undoStack_->setClean();
    setFilePath(QString());
    forceNetworkChanged_ = true;
    refresh();
    emit titleChanged(title_);
    emit modifiedChanged(false);
    emit drawingLoaded();
}

void SchematicDocument::loadNetwork(const tauline::Network& network, const nlohmann::json& drawing)
{
    load(network, drawing, true);
}

bool SchematicDocument::openFile(const QString& path, QString* error)
{
    QString message;
    try {
        const tauline::LoadedNetwork loaded = tauline::readNetworkFile(QFile::encodeName(path).toStdString());
        load(loaded.network, loaded.drawing, true);
        for (const std::string& warning : loaded.warnings)
            loadWarnings_.push_back(QString::fromStdString(warning));
        setFilePath(path);
        return true;
    } catch (const tauline::InputError& e) {
        message = QString::fromStdString(e.what());
    } catch (const std::exception& e) {
        message = tr("%1: %2").arg(path, QString::fromUtf8(e.what()));
    }
    // A drawing saved before it had a response is not a network file the
    // reader accepts, yet it is ours to reopen as it was.
    QFile file(path);
    if (file.open(QIODevice::ReadOnly)) {
        const nlohmann::json root = nlohmann::json::parse(file.readAll().toStdString(), nullptr, false);
        if (root.is_object() && root.contains("drawing") && root["drawing"].is_object()
            && root["drawing"].value("format", std::string()) == kDrawingFormat
            && !drawingIsAnalysable(root["drawing"])) {
            tauline::Network network;
            if (root.contains("title") && root["title"].is_string())
                network.title = root["title"].get<std::string>();
            load(network, root["drawing"], false);
            setFilePath(path);
            return true;
        }
    }
    if (error)
        *error = message;
    return false;
}

bool SchematicDocument::saveFile(const QString& path, QString* error)
{
    std::vector<nlohmann::json> states;
    for (SchematicItem* item : scene_->schematicItems())
        states.push_back(item->state());
    std::optional<DrawingView> view;
    if (hasViewState_)
        view = DrawingView{viewCentre_, viewZoom_};
    const nlohmann::json drawing = drawingFromItems(states, hasResponse_, view);
    std::string text;
    try {
        tauline::Network network = network_;
        network.title = title_.toStdString();
        text = tauline::writeNetworkText(network, drawing);
        if (!hasResponse_) {
            // No response yet: leave the field out rather than write one that
            // names no nodes; the drawing says it is not analysable.
            nlohmann::ordered_json j = nlohmann::ordered_json::parse(text);
            j.erase("response");
            text = j.dump(2) + "\n";
        }
    } catch (const std::exception& e) {
        if (error)
            *error = tr("Cannot save %1: %2").arg(path, QString::fromUtf8(e.what()));
        return false;
    }
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly)) {
        if (error)
            *error = tr("Cannot save %1: %2").arg(path, file.errorString());
        return false;
    }
    file.write(text.data(), qint64(text.size()));
    if (!file.commit()) {
        if (error)
            *error = tr("Cannot save %1: %2 (the old file is unchanged)").arg(path, file.errorString());
        return false;
    }
    undoStack_->setClean();
    setFilePath(path);
    return true;
}

}  // namespace tauline::ui
