#include "SymbolItem.h"

#include "WireGeometry.h"

#include <QPainter>

namespace tauline::ui {

SymbolItem::SymbolItem(ItemId id) : SchematicItem(id) {}

void SymbolItem::setOrientation(int quarterTurns, bool mirrored)
{
    turns_ = ((quarterTurns % 4) + 4) % 4;
    mirrored_ = mirrored;
    QTransform t;
    t.rotate(90.0 * turns_);
    if (mirrored_)
        t.scale(-1, 1);
    setTransform(t);
    orientationChanged();
}

QVector<QPoint> SymbolItem::terminalPoints() const
{
    QVector<QPoint> out;
    for (const QPointF& p : localTerminals())
        out.push_back(snapToGrid(mapToScene(p)));
    return out;
}

void SymbolItem::writeBaseState(nlohmann::json& s) const
{
    s["id"] = itemId();
    s["x"] = qRound(pos().x());
    s["y"] = qRound(pos().y());
    s["turns"] = turns_;
    s["mirror"] = mirrored_;
}

void SymbolItem::readBaseState(const nlohmann::json& s)
{
    const QPoint at = snapToGrid(QPointF(s.value("x", 0.0), s.value("y", 0.0)));
    setPos(at);
    setOrientation(s.value("turns", 0), s.value("mirror", false));
}

void SymbolItem::paintUprightText(QPainter* p, QPointF at, const QString& text) const
{
    p->save();
    p->translate(at);
    p->setTransform(transform().inverted() * p->transform());
    const QFontMetricsF metrics(p->font());
    const double w = metrics.horizontalAdvance(text) + 2;
    const double h = metrics.height();
    const QPointF away = transform().map(at);
    QRectF box;
    if (std::abs(away.x()) >= std::abs(away.y()))
        box = QRectF(away.x() < 0 ? -w : 0, -h / 2, w, h);
    else
        box = QRectF(-w / 2, away.y() < 0 ? -h : 0, w, h);
    p->drawText(box, Qt::AlignCenter, text);
    p->restore();
}

}  // namespace tauline::ui
