// The dot where three or more wire ends or terminals meet. Derived from the
// connectivity after every edit; never saved or selected.
#pragma once

#include "SchematicItem.h"

namespace tauline::ui {

class JunctionItem : public QGraphicsItem {
public:
    enum { Type = JunctionItemType };

    explicit JunctionItem(QPointF at);
    int type() const override { return Type; }

    QRectF boundingRect() const override;
    void paint(QPainter* painter, const QStyleOptionGraphicsItem* option, QWidget* widget) override;
};

}  // namespace tauline::ui
