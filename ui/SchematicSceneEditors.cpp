// In-place editors for a part's value and name and a wire's node label.
#include "SchematicScene.h"

#include "InlineEditor.h"
#include "PartItem.h"
#include "PartLabelItem.h"
#include "SchematicDocument.h"
#include "WireItem.h"

#include <QLineEdit>

namespace tauline::ui {

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

}  // namespace tauline::ui
