// A placed symbol: a position on the grid, a quarter-turn rotation and a
// mirror, applied as the item's transform (mirror first, then rotation) so its
// terminals stay on grid points.
#pragma once

#include "SchematicItem.h"

namespace tauline::ui {

class SymbolItem : public SchematicItem {
public:
    explicit SymbolItem(ItemId id);

    int quarterTurns() const { return turns_; }  // clockwise, 0..3
    bool isMirrored() const { return mirrored_; }
    void setOrientation(int quarterTurns, bool mirrored);

    QVector<QPoint> terminalPoints() const override;

protected:
    virtual QVector<QPointF> localTerminals() const = 0;
    // The shared fields: x, y, turns, mirror.
    void writeBaseState(nlohmann::json& state) const;
    void readBaseState(const nlohmann::json& state);
    virtual void orientationChanged() {}
    // Draws text upright (whatever the orientation) next to the local point
    // `at`, on the side of `at` that faces away from the symbol's origin.
    void paintUprightText(QPainter* painter, QPointF at, const QString& text) const;

private:
    int turns_ = 0;
    bool mirrored_ = false;
};

}  // namespace tauline::ui
