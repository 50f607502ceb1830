#include "SetTitleCommand.h"

#include "SchematicDocument.h"

namespace tauline::ui {

SetTitleCommand::SetTitleCommand(SchematicDocument* document, const QString& before, const QString& after)
    : QUndoCommand(QObject::tr("Change title")), document_(document), before_(before), after_(after)
{
}

void SetTitleCommand::redo()
{
    document_->applyTitle(after_);
}

void SetTitleCommand::undo()
{
    document_->applyTitle(before_);
}

}  // namespace tauline::ui
