// A resistor or capacitor on the canvas: draws its symbol by kind and carries
// its name and value; the label beside it is a child that stays upright.
#pragma once

#include "SymbolItem.h"

namespace tauline::ui {

class PartLabelItem;

class PartItem : public SymbolItem {
public:
    enum { Type = PartItemType };

    PartItem(ItemId id, tauline::PartKind kind);
    int type() const override { return Type; }

    tauline::PartKind kind() const { return kind_; }
    QString name() const { return name_; }
    void setName(const QString& name);
    double value() const { return value_; }
    QString valueText() const { return valueText_; }
    void setValue(double value, const QString& text);

    // Marked from outside (the corner table), unlike the selection.
    bool isHighlighted() const { return highlighted_; }
    void setHighlighted(bool on);

    PartLabelItem* label() const { return label_; }

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* painter, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

    // {"type":"part","id","x","y","turns","mirror","name","kind","value","text"}
    nlohmann::json state() const override;
    void applyState(const nlohmann::json& state) override;

    static QString namePrefix(tauline::PartKind kind);   // "R", "C"
    static QString defaultValueText(tauline::PartKind kind);

protected:
    QVector<QPointF> localTerminals() const override;
    void orientationChanged() override;
    QVariant itemChange(GraphicsItemChange change, const QVariant& value) override;

private:
    tauline::PartKind kind_;
    QString name_;
    double value_ = 0.0;
    QString valueText_;
    bool highlighted_ = false;
    PartLabelItem* label_ = nullptr;
};

}  // namespace tauline::ui
