// Stepping a selected part's value with the wheel through the chosen
// series; notches close together are one undo step.
#include "SchematicScene.h"

#include "PartItem.h"
#include "SchematicDocument.h"
#include "ValueSeriesSetting.h"
#include "ValueStep.h"

#include <QGraphicsSceneWheelEvent>

namespace tauline::ui {

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

}  // namespace tauline::ui
