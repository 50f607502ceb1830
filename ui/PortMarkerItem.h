// The driving-point port: a test current enters at + and leaves at −; the
// response is the impedance seen there.
#pragma once

#include "MarkerItem.h"

namespace tauline::ui {

class PortMarkerItem : public MarkerItem {
public:
    explicit PortMarkerItem(ItemId id);

protected:
    void paintSymbol(QPainter* painter, const QColor& ink) const override;
    QColor roleColour() const override;
};

}  // namespace tauline::ui
