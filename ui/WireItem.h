// A wire: an orthogonal polyline of grid points in scene coordinates (the item
// itself stays at the origin), optionally carrying a node name.
#pragma once

#include "SchematicItem.h"

#include <QPainterPath>

namespace tauline::ui {

class WireItem : public SchematicItem {
public:
    enum { Type = WireItemType };

    explicit WireItem(ItemId id);
    int type() const override { return Type; }

    const QVector<QPoint>& points() const { return points_; }
    void setPoints(const QVector<QPoint>& points);
    QString label() const { return label_; }
    void setLabel(const QString& label);
    // Where the label is drawn (scene), for the in-place editor.
    QRectF labelRect() const;

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* painter, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

    // {"type":"wire","id","points":[[x,y],...],"label"}
    nlohmann::json state() const override;
    void applyState(const nlohmann::json& state) override;
    QVector<QPoint> terminalPoints() const override;  // its two ends

private:
    void rebuild();

    QVector<QPoint> points_;
    QString label_;
    QPainterPath path_;
    QPainterPath shape_;
    QRectF labelRect_;
};

}  // namespace tauline::ui
