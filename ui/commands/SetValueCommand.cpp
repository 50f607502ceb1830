#include "SetValueCommand.h"

namespace tauline::ui {

namespace {
constexpr int kSetValueCommandId = 0x7a1e;
}

SetValueCommand::SetValueCommand(SchematicDocument* document, ItemStates before, ItemStates after,
                                 const QString& part, quint64 serial)
    : DrawingEditCommand(document, QObject::tr("Change %1").arg(part), std::move(before), std::move(after)),
      serial_(serial)
{
}

int SetValueCommand::id() const
{
    return serial_ != 0 ? kSetValueCommandId : -1;
}

bool SetValueCommand::mergeWith(const QUndoCommand* other)
{
    const auto* next = dynamic_cast<const SetValueCommand*>(other);
    if (!next || next->serial_ != serial_ || serial_ == 0)
        return false;
    for (const auto& [id, state] : next->after()) {
        if (!after().count(id))
            return false;
    }
    replaceAfter(next->after());
    setObsolete(after() == before());
    return true;
}

}  // namespace tauline::ui
