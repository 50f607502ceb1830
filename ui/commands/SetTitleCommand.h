// The network's title.
#pragma once

#include <QString>
#include <QUndoCommand>

namespace tauline::ui {

class SchematicDocument;

class SetTitleCommand : public QUndoCommand {
public:
    SetTitleCommand(SchematicDocument* document, const QString& before, const QString& after);
    void redo() override;
    void undo() override;

private:
    SchematicDocument* document_;
    QString before_;
    QString after_;
};

}  // namespace tauline::ui
