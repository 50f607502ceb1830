// The input (a voltage or current drive: voltage gain or transimpedance) or
// the output (the voltage read) of a transfer response.
#pragma once

#include "MarkerItem.h"

namespace tauline::ui {

class TransferMarkerItem : public MarkerItem {
public:
    TransferMarkerItem(ItemId id, MarkerRole role);

protected:
    void paintSymbol(QPainter* painter, const QColor& ink) const override;
    QColor roleColour() const override;
};

}  // namespace tauline::ui
