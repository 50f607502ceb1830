// The name and value beside a part, upright whatever the part's rotation.
// The scene turns a double-click on it into an in-place editor and a drag on
// the value into stepping through the chosen series.
#pragma once

#include "SchematicItem.h"

namespace tauline::ui {

class PartItem;

class PartLabelItem : public QGraphicsItem {
public:
    enum { Type = PartLabelItemType };

    explicit PartLabelItem(PartItem* part);
    int type() const override { return Type; }

    PartItem* part() const;
    // Re-reads the part's name, value and orientation.
    void refresh();

    QString valueString() const;       // "4.7 kΩ"
    QRectF nameRect() const { return nameRect_; }    // local
    QRectF valueRect() const { return valueRect_; }  // local
    QRectF valueSceneRect() const { return mapRectToScene(valueRect_); }
    QRectF nameSceneRect() const { return mapRectToScene(nameRect_); }

    QRectF boundingRect() const override;
    void paint(QPainter* painter, const QStyleOptionGraphicsItem* option, QWidget* widget) override;

protected:
    void hoverMoveEvent(QGraphicsSceneHoverEvent* event) override;

private:
    QRectF nameRect_;
    QRectF valueRect_;
    QString valueString_;
};

}  // namespace tauline::ui
