// The reference node: every ground symbol's pin is the node "gnd".
#pragma once

#include "SymbolItem.h"

namespace tauline::ui {

class GroundItem : public SymbolItem {
public:
    enum { Type = GroundItemType };

    explicit GroundItem(ItemId id);
    int type() const override { return Type; }

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* painter, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

    // {"type":"ground","id","x","y","turns","mirror"}
    nlohmann::json state() const override;
    void applyState(const nlohmann::json& state) override;

protected:
    QVector<QPointF> localTerminals() const override { return {QPointF(0, 0)}; }
};

}  // namespace tauline::ui
