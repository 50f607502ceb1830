#include "CanvasActions.h"

#include "SchematicDocument.h"
#include "SchematicItem.h"
#include "SymbolPainter.h"

#include <QAction>
#include <QActionGroup>
#include <QClipboard>
#include <QGuiApplication>
#include <QMimeData>
#include <QPainter>

namespace tauline::ui {

namespace {

QAction* makeAction(QObject* parent, const QString& text, const QList<QKeySequence>& keys, const QString& tip)
{
    auto* action = new QAction(text, parent);
    action->setShortcuts(keys);
    action->setShortcutContext(Qt::WidgetWithChildrenShortcut);
    action->setToolTip(tip);
    action->setStatusTip(tip);
    return action;
}

}  // namespace

CanvasActions::CanvasActions(SchematicDocument* document) : QObject(document), document_(document)
{
    SchematicScene* scene = document->scene();
    cut_ = makeAction(this, tr("Cu&t"), QKeySequence::keyBindings(QKeySequence::Cut),
                      tr("Cut the selection to the clipboard"));
    copy_ = makeAction(this, tr("&Copy"), QKeySequence::keyBindings(QKeySequence::Copy),
                       tr("Copy the selection to the clipboard"));
    paste_ = makeAction(this, tr("&Paste"), QKeySequence::keyBindings(QKeySequence::Paste),
                        tr("Paste parts and wires; clashing part names are renumbered"));
    QList<QKeySequence> deleteKeys = QKeySequence::keyBindings(QKeySequence::Delete);
    deleteKeys.push_back(QKeySequence(Qt::Key_Backspace));
    remove_ = makeAction(this, tr("&Delete"), deleteKeys, tr("Delete the selection"));
    selectAll_ = makeAction(this, tr("Select &All"), QKeySequence::keyBindings(QKeySequence::SelectAll),
                            tr("Select the whole drawing"));
    rotate_ = makeAction(this, tr("&Rotate"), {QKeySequence(Qt::CTRL | Qt::Key_R)},
                         tr("Turn the selection (or the symbol being placed) a quarter turn clockwise"));
    mirror_ = makeAction(this, tr("&Mirror"), {QKeySequence(Qt::CTRL | Qt::Key_M)},
                         tr("Mirror the selection (or the symbol being placed) left to right"));

    auto copyToClipboard = [this, scene] {
        const QByteArray bytes = scene->copySelection();
        if (bytes.isEmpty())
            return;
        auto* mime = new QMimeData;
        mime->setData(QString::fromLatin1(kItemsMimeType), bytes);
        mime->setText(QString::fromUtf8(bytes));
        QGuiApplication::clipboard()->setMimeData(mime);
        updateEnabled();
    };
    connect(cut_, &QAction::triggered, scene, [scene, copyToClipboard] {
        copyToClipboard();
        scene->deleteSelection();
    });
    connect(copy_, &QAction::triggered, scene, copyToClipboard);
    connect(paste_, &QAction::triggered, document, [scene] {
        const QMimeData* mime = QGuiApplication::clipboard()->mimeData();
        if (!mime)
            return;
        QByteArray bytes = mime->data(QString::fromLatin1(kItemsMimeType));
        if (bytes.isEmpty())
            bytes = mime->text().toUtf8();
        scene->paste(bytes);
    });
    connect(remove_, &QAction::triggered, scene, &SchematicScene::deleteSelection);
    connect(selectAll_, &QAction::triggered, scene, [scene] {
        for (SchematicItem* item : scene->schematicItems())
            item->setSelected(true);
    });
    connect(rotate_, &QAction::triggered, scene, [scene] { scene->rotateOrMirrorSelection(false); });
    connect(mirror_, &QAction::triggered, scene, [scene] { scene->rotateOrMirrorSelection(true); });

    tools_ = new QActionGroup(this);
    tools_->setExclusive(true);
    using Tool = SchematicScene::Tool;
    makeTool(Tool::Select, tr("Select"), QKeySequence(Qt::Key_S), symbolIcon(SymbolKind::Wire),
             tr("Select, move and edit (S; Esc also returns here)"));
    makeTool(Tool::Wire, tr("Wire"), QKeySequence(Qt::Key_W), symbolIcon(SymbolKind::Wire),
             tr("Draw wires: click to bend, end on a terminal or a wire, double-click to stop (W)"));
    makeTool(Tool::Resistor, tr("Resistor"), QKeySequence(Qt::Key_R), symbolIcon(SymbolKind::Resistor),
             tr("Place resistors (R)"));
    makeTool(Tool::Capacitor, tr("Capacitor"), QKeySequence(Qt::Key_C), symbolIcon(SymbolKind::Capacitor),
             tr("Place capacitors (C)"));
    makeTool(Tool::Ground, tr("Ground"), QKeySequence(Qt::Key_G), symbolIcon(SymbolKind::Ground),
             tr("Place a ground: the reference node (G)"));
    makeTool(Tool::Port, tr("Port"), QKeySequence(Qt::Key_P), symbolIcon(SymbolKind::Port),
             tr("Place a port: the response is the impedance seen there (P)"));
    makeTool(Tool::Input, tr("Input"), QKeySequence(Qt::Key_I), symbolIcon(SymbolKind::Input),
             tr("Place the input of a transfer response; double-click it to switch voltage/current drive (I)"));
    makeTool(Tool::Output, tr("Output"), QKeySequence(Qt::Key_O), symbolIcon(SymbolKind::Output),
             tr("Place the output of a transfer response (O)"));
    // The select tool's icon: an arrow of our own.
    {
        QPixmap pixmap(48, 48);
        pixmap.fill(Qt::transparent);
        QPainter p(&pixmap);
        p.setRenderHint(QPainter::Antialiasing);
        QPolygonF arrow({QPointF(14, 8), QPointF(14, 38), QPointF(21, 31), QPointF(27, 43), QPointF(32, 40),
                         QPointF(26, 29), QPointF(35, 28)});
        p.setPen(QPen(QColor(0x2b, 0x35, 0x38), 2.0, Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin));
        p.setBrush(QColor(0xf1, 0xe6, 0xcf));
        p.drawPolygon(arrow);
        p.end();
        toolActions_[Tool::Select]->setIcon(QIcon(pixmap));
    }
    toolActions_[Tool::Select]->setChecked(true);
    connect(scene, &SchematicScene::toolChanged, this, [this](SchematicScene::Tool t) {
        if (QAction* a = toolActions_.value(t))
            a->setChecked(true);
        updateEnabled();
    });

    connect(scene, &QGraphicsScene::selectionChanged, this, &CanvasActions::updateEnabled);
    connect(QGuiApplication::clipboard(), &QClipboard::dataChanged, this, &CanvasActions::updateEnabled);
    updateEnabled();
}

QAction* CanvasActions::makeTool(SchematicScene::Tool tool, const QString& text, const QKeySequence& key,
                                 const QIcon& icon, const QString& tip)
{
    QAction* action = makeAction(this, text, {key}, tip);
    action->setCheckable(true);
    action->setIcon(icon);
    tools_->addAction(action);
    toolActions_[tool] = action;
    SchematicScene* scene = document_->scene();
    connect(action, &QAction::triggered, scene, [scene, tool] {
        if (tool == SchematicScene::Tool::Select)
            scene->escape();
        if (scene->tool() != tool)
            scene->setTool(tool);
    });
    return action;
}

QAction* CanvasActions::tool(SchematicScene::Tool tool) const
{
    return toolActions_.value(tool);
}

QList<QAction*> CanvasActions::editActions() const
{
    return {cut_, copy_, paste_, remove_, selectAll_, rotate_, mirror_};
}

QList<QAction*> CanvasActions::toolActions() const
{
    using Tool = SchematicScene::Tool;
    return {toolActions_[Tool::Select], toolActions_[Tool::Wire],   toolActions_[Tool::Resistor],
            toolActions_[Tool::Capacitor], toolActions_[Tool::Ground], toolActions_[Tool::Port],
            toolActions_[Tool::Input],  toolActions_[Tool::Output]};
}

void CanvasActions::updateEnabled()
{
    SchematicScene* scene = document_->scene();
    const bool selection = !scene->selectedSchematicItems().isEmpty();
    const bool placing = scene->tool() != SchematicScene::Tool::Select && scene->tool() != SchematicScene::Tool::Wire;
    cut_->setEnabled(selection);
    copy_->setEnabled(selection);
    remove_->setEnabled(selection);
    rotate_->setEnabled(selection || placing);
    mirror_->setEnabled(selection || placing);
    const QMimeData* mime = QGuiApplication::clipboard()->mimeData();
    paste_->setEnabled(mime && (mime->hasFormat(QString::fromLatin1(kItemsMimeType))
                                || mime->text().contains(QLatin1String("tauline-items"))));
}

}  // namespace tauline::ui
