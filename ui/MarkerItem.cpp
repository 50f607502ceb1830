#include "MarkerItem.h"

#include "CanvasStyle.h"
#include "PortMarkerItem.h"
#include "SymbolPainter.h"
#include "TransferMarkerItem.h"

#include <QPainter>

namespace tauline::ui {

MarkerItem::MarkerItem(ItemId id, MarkerRole role) : SymbolItem(id), role_(role)
{
    setZValue(3);
}

void MarkerItem::setDrive(DriveKind drive)
{
    drive_ = drive;
    update();
}

void MarkerItem::setMinusGrounded(bool grounded)
{
    if (minusGrounded_ != grounded) {
        minusGrounded_ = grounded;
        update();
    }
}

QString MarkerItem::tag() const
{
    switch (role_) {
    case MarkerRole::Port: return QStringLiteral("PORT");
    case MarkerRole::Input: return drive_ == DriveKind::Current ? QStringLiteral("IN (I)") : QStringLiteral("IN");
    case MarkerRole::Output: return QStringLiteral("OUT");
    }
    return {};
}

QRectF MarkerItem::boundingRect() const
{
    // Generous: the upright tag may sit on any side once rotated.
    return QRectF(-56, -56, 112, 112);
}

QPainterPath MarkerItem::shape() const
{
    QPainterPath path;
    path.addRect(QRectF(-11, -20, 22, 40));
    return path;
}

void MarkerItem::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*)
{
    p->setRenderHint(QPainter::Antialiasing);
    const QColor colour = roleColour();
    if (isSelected()) {
        QColor glow = style::selection();
        glow.setAlpha(40);
        p->setPen(Qt::NoPen);
        p->setBrush(glow);
        p->drawRoundedRect(QRectF(-13, -21, 26, 42), 5, 5);
    }
    paintSymbol(p, isSelected() ? style::selection() : colour);
    if (minusGrounded_)
        paintImpliedGround(p, QPointF(0, 20), colour);
    p->setFont(style::markerFont());
    p->setPen(colour);
    // The input and port read from the left, the output to the right: the
    // usual flow, and clear of the parts' labels beside them.
    paintUprightText(p, QPointF(role_ == MarkerRole::Output ? 14 : -14, 0), tag());
}

nlohmann::json MarkerItem::state() const
{
    nlohmann::json s;
    s["type"] = "marker";
    writeBaseState(s);
    s["role"] = markerRoleName(role_);
    s["drive"] = driveKindName(drive_);
    return s;
}

void MarkerItem::applyState(const nlohmann::json& s)
{
    readBaseState(s);
    DriveKind drive = DriveKind::Voltage;
    driveKindFromName(QString::fromStdString(s.value("drive", std::string("voltage"))), &drive);
    setDrive(drive);
}

MarkerItem* createMarkerItem(ItemId id, MarkerRole role)
{
    if (role == MarkerRole::Port)
        return new PortMarkerItem(id);
    return new TransferMarkerItem(id, role);
}

}  // namespace tauline::ui
