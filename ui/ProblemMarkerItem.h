// A drawing problem shown where it is: a small ring for an open end, a badge
// with the message beside it for anything that changes the analysis. Derived
// after every edit; hovering shows the message as a tool tip as well.
#pragma once

#include "DrawingProblem.h"
#include "SchematicItem.h"

namespace tauline::ui {

class ProblemMarkerItem : public QGraphicsItem {
public:
    enum { Type = ProblemMarkerItemType };

    explicit ProblemMarkerItem(const DrawingProblem& problem);
    int type() const override { return Type; }

    const DrawingProblem& problem() const { return problem_; }

    QRectF boundingRect() const override;
    void paint(QPainter* painter, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

private:
    DrawingProblem problem_;
    QRectF textRect_;
};

}  // namespace tauline::ui
