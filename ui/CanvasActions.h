// The canvas's actions, made once per document so that menus, toolbars and
// the view share them (and their enabled states). Single-letter tool keys and
// the edit keys act where the canvas has focus, so typing elsewhere is safe.
#pragma once

#include "SchematicScene.h"

#include <QMap>
#include <QObject>

class QAction;
class QActionGroup;

namespace tauline::ui {

class SchematicDocument;

class CanvasActions : public QObject {
    Q_OBJECT
public:
    explicit CanvasActions(SchematicDocument* document);

    QAction* cut() const { return cut_; }
    QAction* copy() const { return copy_; }
    QAction* paste() const { return paste_; }
    QAction* remove() const { return remove_; }
    QAction* selectAll() const { return selectAll_; }
    QAction* rotate() const { return rotate_; }
    QAction* mirror() const { return mirror_; }
    QAction* tool(SchematicScene::Tool tool) const;

    QList<QAction*> editActions() const;
    QList<QAction*> toolActions() const;

private:
    void updateEnabled();
    QAction* makeTool(SchematicScene::Tool tool, const QString& text, const QKeySequence& key, const QIcon& icon,
                      const QString& tip);

    SchematicDocument* document_;
    QAction* cut_;
    QAction* copy_;
    QAction* paste_;
    QAction* remove_;
    QAction* selectAll_;
    QAction* rotate_;
    QAction* mirror_;
    QActionGroup* tools_;
    QMap<SchematicScene::Tool, QAction*> toolActions_;
};

// The MIME type of drawing items on the clipboard (JSON).
inline constexpr const char* kItemsMimeType = "application/x-tauline-items+json";

}  // namespace tauline::ui
