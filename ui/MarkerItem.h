// A response marker: two terminals (+ and −) standing for a driving-point
// port, or the input or output of a transfer response. A − terminal that
// touches nothing means ground, and shows a small ground sign.
#pragma once

#include "SymbolItem.h"

namespace tauline::ui {

class MarkerItem : public SymbolItem {
public:
    enum { Type = MarkerItemType };

    MarkerItem(ItemId id, MarkerRole role);
    int type() const override { return Type; }

    MarkerRole role() const { return role_; }
    DriveKind drive() const { return drive_; }
    void setDrive(DriveKind drive);
    // Set after each connectivity update.
    void setMinusGrounded(bool grounded);

    QRectF boundingRect() const override;
    QPainterPath shape() const override;
    void paint(QPainter* painter, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

    // {"type":"marker","id","x","y","turns","mirror","role","drive"}
    nlohmann::json state() const override;
    void applyState(const nlohmann::json& state) override;

    QString tag() const;  // "PORT", "IN", "OUT"

protected:
    QVector<QPointF> localTerminals() const override { return {QPointF(0, -20), QPointF(0, 20)}; }
    virtual void paintSymbol(QPainter* painter, const QColor& ink) const = 0;
    virtual QColor roleColour() const = 0;

private:
    MarkerRole role_;
    DriveKind drive_ = DriveKind::Voltage;
    bool minusGrounded_ = false;
};

// Creates the class that draws `role`.
MarkerItem* createMarkerItem(ItemId id, MarkerRole role);

}  // namespace tauline::ui
