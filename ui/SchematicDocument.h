// ui/: Qt6 Widgets and Charts over core. The schematic document is the single
// owner of the drawing; everything else (plot, tables, inspector) reads the
// network it derives and edits it only through its undo commands.
#pragma once

#include "DrawingProblem.h"
#include "DrawingSnapshot.h"
#include "Network.h"

#include <QHash>
#include <QObject>
#include <QPointF>
#include <QStringList>

#include <nlohmann/json.hpp>

#include <array>
#include <optional>

class QAction;
class QUndoStack;
class QGraphicsScene;

namespace tauline::ui {

class CanvasActions;
class SchematicScene;

class SchematicDocument : public QObject {
    Q_OBJECT
public:
    explicit SchematicDocument(QObject* parent = nullptr);
    ~SchematicDocument() override;

    SchematicScene* scene() const;
    QUndoStack* undoStack() const;

    // The network the drawing describes right now (connectivity derived from
    // wires and terminals), and whether it is complete enough to analyse.
    tauline::Network network() const;
    bool hasResponse() const;
    QList<DrawingProblem> problems() const;

    // Files: the version-1 fields plus the drawing under "drawing".
    bool openFile(const QString& path, QString* error);
    bool saveFile(const QString& path, QString* error);  // temp file + rename
    // Replaces the document (no file path; an empty network gives an empty
    // drawing). Without a usable drawing the parts are placed automatically.
    void loadNetwork(const tauline::Network& network, const nlohmann::json& drawing);
    QString filePath() const;
    bool isModified() const;
    QString title() const;
    void setTitle(const QString& title);

    // Edits from outside the canvas, each one undo step.
    void setPartValue(const QString& part, double value, const QString& text);
    // A drag of a value (wheel or mouse): the changes between begin and end
    // merge into one undo step.
    void beginValueDrag(const QString& part);
    void dragValue(const QString& part, double value);
    void endValueDrag();

    QString selectedPart() const;
    void highlightParts(const QStringList& parts);  // from the corner table

    // ---- Beyond the first contract -------------------------------------

    // The canvas's actions, for menus and toolbars: edit actions (cut, copy,
    // paste, delete, select all, rotate, mirror; undo/redo are the window's,
    // from undoStack()) and tool actions (select, wire, resistor, capacitor,
    // ground, port, input, output; checkable, exclusive).
    CanvasActions* actions() const;
    QList<QAction*> editActions() const;
    QList<QAction*> toolActions() const;

    // Typed text for a value (SI or RKM, as in files): one undo step, or the
    // error to show (naming the part), the old value kept.
    QString setPartValueText(const QString& part, const QString& text);
    // A new part name: one undo step, or the error (empty, taken).
    QString renamePart(const QString& from, const QString& to);
    // A node name given on a wire (empty clears it): one undo step or an error.
    QString setNodeLabel(ItemId wire, const QString& label);

    // The response kind the markers give (Impedance for a port). Setting a
    // transfer kind sets the input's drive (voltage or current); switching
    // between a port and input/output markers trades the markers. No-op
    // without markers.
    std::optional<tauline::ResponseKind> responseKind() const;
    void setResponseKind(tauline::ResponseKind kind);

    // A part as drawn, including parts the network leaves out (shorted).
    std::optional<tauline::Part> part(const QString& name) const;
    QStringList partNames() const;

    // Notes from the last open: parts the reader left out, a drawing that no
    // longer matched its netlist and was placed afresh.
    QStringList loadWarnings() const;

    // The view's centre and zoom, saved with the drawing (not an edit).
    bool hasViewState() const;
    QPointF viewCentre() const;
    double viewZoom() const;
    void setViewState(QPointF centre, double zoom);

    // Called by the undo commands after they change items.
    void refresh();
    void applyTitle(const QString& title);

signals:
    void networkChanged();                  // any edit that can change the analysis
    void selectedPartChanged(const QString& part);  // empty when none
    void modifiedChanged(bool modified);
    void filePathChanged(const QString& path);
    void titleChanged(const QString& title);
    void problemsChanged();
    // A new drawing replaced the old one (open, new): views fit or restore.
    void drawingLoaded();

private:
    void setFilePath(const QString& path);
    void updateSelectedPart();
    bool placeDrawing(const nlohmann::json& drawing, const tauline::Network* network, QString* why);
    void load(const tauline::Network& network, const nlohmann::json& drawing, bool checkDrawing);

    SchematicScene* scene_;
    QUndoStack* undoStack_;
    CanvasActions* actions_;
    QString filePath_;
    QString title_;
    tauline::Network network_;
    bool hasResponse_ = false;
    QList<DrawingProblem> problems_;
    QString selectedPart_;
    QStringList loadWarnings_;
    QHash<QString, std::array<QString, 2>> partNodes_;
    bool forceNetworkChanged_ = false;
    QString dragPart_;
    quint64 dragSerial_ = 0;
    quint64 lastSerial_ = 0;
    quint64 dragStartSerial_ = 0;
    double dragStartValue_ = 0.0;
    QString dragStartText_;
    bool hasViewState_ = false;
    QPointF viewCentre_;
    double viewZoom_ = 1.0;
};

}  // namespace tauline::ui
