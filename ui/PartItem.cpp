#include "PartItem.h"

#include "CanvasStyle.h"
#include "PartLabelItem.h"
#include "SymbolPainter.h"
#include "ValueParser.h"

#include <QPainter>

namespace tauline::ui {

PartItem::PartItem(ItemId id, tauline::PartKind kind) : SymbolItem(id), kind_(kind)
{
    label_ = new PartLabelItem(this);
    setZValue(2);
}

void PartItem::setName(const QString& name)
{
    name_ = name;
    label_->refresh();
}

void PartItem::setValue(double value, const QString& text)
{
    value_ = value;
    valueText_ = text;
    label_->refresh();
}

void PartItem::setHighlighted(bool on)
{
    if (highlighted_ == on)
        return;
    highlighted_ = on;
    update();
    label_->update();
}

QRectF PartItem::boundingRect() const
{
    return QRectF(-23, -13, 46, 26);
}

QPainterPath PartItem::shape() const
{
    QPainterPath path;
    path.addRect(QRectF(-20, -9, 40, 18));
    return path;
}

void PartItem::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*)
{
    p->setRenderHint(QPainter::Antialiasing);
    if (highlighted_ || isSelected()) {
        QColor glow = highlighted_ ? style::highlight() : style::selection();
        glow.setAlpha(highlighted_ ? 90 : 40);
        p->setPen(Qt::NoPen);
        p->setBrush(glow);
        p->drawRoundedRect(QRectF(-21, -11, 42, 22), 5, 5);
    }
    const QColor ink = isSelected() ? style::selection() : style::ink();
    if (kind_ == tauline::PartKind::Capacitor)
        paintCapacitor(p, ink);
    else
        paintResistor(p, ink, style::resistorFill());
}

nlohmann::json PartItem::state() const
{
    nlohmann::json s;
    s["type"] = "part";
    writeBaseState(s);
    s["name"] = name_.toStdString();
    s["kind"] = tauline::kindName(kind_);
    s["value"] = value_;
    s["text"] = valueText_.toStdString();
    return s;
}

void PartItem::applyState(const nlohmann::json& s)
{
    readBaseState(s);
    name_ = QString::fromStdString(s.value("name", std::string()));
    value_ = s.value("value", 0.0);
    valueText_ = QString::fromStdString(s.value("text", std::string()));
    label_->refresh();
}

QString PartItem::namePrefix(tauline::PartKind kind)
{
    switch (kind) {
    case tauline::PartKind::Resistor: return QStringLiteral("R");
    case tauline::PartKind::Capacitor: return QStringLiteral("C");
    case tauline::PartKind::Inductor: return QStringLiteral("L");
    case tauline::PartKind::Transconductance: return QStringLiteral("G");
    case tauline::PartKind::VoltageAmplifier: return QStringLiteral("E");
    }
    return QStringLiteral("X");
}

QString PartItem::defaultValueText(tauline::PartKind kind)
{
    return kind == tauline::PartKind::Capacitor ? QStringLiteral("10n") : QStringLiteral("10k");
}

QVector<QPointF> PartItem::localTerminals() const
{
    return {QPointF(-20, 0), QPointF(20, 0)};
}

void PartItem::orientationChanged()
{
    label_->refresh();
}

QVariant PartItem::itemChange(GraphicsItemChange change, const QVariant& value)
{
    if (change == ItemSelectedHasChanged)
        label_->update();
    return SymbolItem::itemChange(change, value);
}

}  // namespace tauline::ui
