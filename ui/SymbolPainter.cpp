#include "SymbolPainter.h"

#include "CanvasStyle.h"

#include <QPainter>
#include <QPainterPath>
#include <QPixmap>

namespace tauline::ui {

namespace {

QPen inkPen(const QColor& ink, double width = style::kInkWidth)
{
    QPen pen(ink, width);
    pen.setCapStyle(Qt::RoundCap);
    pen.setJoinStyle(Qt::RoundJoin);
    return pen;
}

void paintVerticalLeads(QPainter* p, double gap)
{
    p->drawLine(QPointF(0, -20), QPointF(0, -gap));
    p->drawLine(QPointF(0, gap), QPointF(0, 20));
}

void paintSigns(QPainter* p, const QColor& ink)
{
    // + beside the upper lead, − beside the lower one.
    p->setPen(inkPen(ink, 1.1));
    p->drawLine(QPointF(5, -17), QPointF(9, -17));
    p->drawLine(QPointF(7, -19), QPointF(7, -15));
    p->drawLine(QPointF(5, 17), QPointF(9, 17));
}

}  // namespace

void paintResistor(QPainter* p, const QColor& ink, const QColor& fill)
{
    p->setPen(inkPen(ink));
    p->drawLine(QPointF(-20, 0), QPointF(-13, 0));
    p->drawLine(QPointF(13, 0), QPointF(20, 0));
    p->setBrush(fill);
    p->drawRoundedRect(QRectF(-13, -5, 26, 10), 1.5, 1.5);
    p->setBrush(Qt::NoBrush);
}

void paintCapacitor(QPainter* p, const QColor& ink)
{
    p->setPen(inkPen(ink));
    p->drawLine(QPointF(-20, 0), QPointF(-3, 0));
    p->drawLine(QPointF(3, 0), QPointF(20, 0));
    QPen plate = inkPen(ink, 2.6);
    plate.setCapStyle(Qt::FlatCap);
    p->setPen(plate);
    p->drawLine(QPointF(-3, -9), QPointF(-3, 9));
    p->drawLine(QPointF(3, -9), QPointF(3, 9));
}

void paintGround(QPainter* p, const QColor& ink)
{
    p->setPen(inkPen(ink));
    p->drawLine(QPointF(0, 0), QPointF(0, 8));
    p->setPen(inkPen(ink, 2.0));
    p->drawLine(QPointF(-10, 8), QPointF(10, 8));
    p->drawLine(QPointF(-6, 12), QPointF(6, 12));
    p->drawLine(QPointF(-2, 16), QPointF(2, 16));
}

void paintPortMarker(QPainter* p, const QColor& ink)
{
    p->setPen(inkPen(ink));
    paintVerticalLeads(p, 9);
    QColor fill = ink;
    fill.setAlpha(30);
    p->setBrush(fill);
    QPainterPath diamond;
    diamond.moveTo(0, -9);
    diamond.lineTo(9, 0);
    diamond.lineTo(0, 9);
    diamond.lineTo(-9, 0);
    diamond.closeSubpath();
    p->drawPath(diamond);
    p->setBrush(Qt::NoBrush);
    // A test current enters at +: an arrow inside pointing up.
    p->setPen(inkPen(ink, 1.2));
    p->drawLine(QPointF(0, 5), QPointF(0, -4));
    p->drawLine(QPointF(0, -4), QPointF(-2.5, -1));
    p->drawLine(QPointF(0, -4), QPointF(2.5, -1));
    paintSigns(p, ink);
}

void paintInputMarker(QPainter* p, const QColor& ink, DriveKind drive)
{
    p->setPen(inkPen(ink));
    paintVerticalLeads(p, 10);
    QColor fill = ink;
    fill.setAlpha(30);
    p->setBrush(fill);
    p->drawEllipse(QPointF(0, 0), 10, 10);
    p->setBrush(Qt::NoBrush);
    p->setPen(inkPen(ink, 1.2));
    if (drive == DriveKind::Voltage) {
        p->drawLine(QPointF(-3, -4.5), QPointF(3, -4.5));
        p->drawLine(QPointF(0, -7.5), QPointF(0, -1.5));
        p->drawLine(QPointF(-3, 4.5), QPointF(3, 4.5));
    } else {
        p->drawLine(QPointF(0, 6), QPointF(0, -6));
        p->drawLine(QPointF(0, -6), QPointF(-3, -2.5));
        p->drawLine(QPointF(0, -6), QPointF(3, -2.5));
    }
    paintSigns(p, ink);
}

void paintOutputMarker(QPainter* p, const QColor& ink)
{
    p->setPen(inkPen(ink));
    paintVerticalLeads(p, 10);
    QColor fill = ink;
    fill.setAlpha(30);
    p->setBrush(fill);
    p->drawRoundedRect(QRectF(-8, -10, 16, 20), 4, 4);
    p->setBrush(Qt::NoBrush);
    // A needle over a scale: something being read.
    p->setPen(inkPen(ink, 1.1));
    QPainterPath scale;
    scale.moveTo(-5, 1);
    scale.quadTo(0, -6, 5, 1);
    p->drawPath(scale);
    p->drawLine(QPointF(0, 5), QPointF(3, -3));
    paintSigns(p, ink);
}

void paintImpliedGround(QPainter* p, QPointF at, const QColor& ink)
{
    p->setPen(inkPen(ink, 1.1));
    p->drawLine(at + QPointF(-5, 0), at + QPointF(5, 0));
    p->drawLine(at + QPointF(-3, 2.5), at + QPointF(3, 2.5));
    p->drawLine(at + QPointF(-1, 5), at + QPointF(1, 5));
}

QIcon symbolIcon(SymbolKind kind)
{
    QPixmap pixmap(48, 48);
    pixmap.fill(Qt::transparent);
    QPainter p(&pixmap);
    p.setRenderHint(QPainter::Antialiasing);
    p.translate(24, 24);
    p.scale(1.05, 1.05);
    const QColor ink = style::ink();
    switch (kind) {
    case SymbolKind::Resistor: paintResistor(&p, ink, style::resistorFill()); break;
    case SymbolKind::Capacitor: paintCapacitor(&p, ink); break;
    case SymbolKind::Ground:
        p.translate(0, -8);
        paintGround(&p, ink);
        break;
    case SymbolKind::Port: paintPortMarker(&p, style::portMarker()); break;
    case SymbolKind::Input: paintInputMarker(&p, style::inputMarker(), DriveKind::Voltage); break;
    case SymbolKind::Output: paintOutputMarker(&p, style::outputMarker()); break;
    case SymbolKind::Wire: {
        QPen pen(style::wire(), 2.2);
        pen.setCapStyle(Qt::RoundCap);
        p.setPen(pen);
        p.drawPolyline(QPolygonF({QPointF(-18, 12), QPointF(-2, 12), QPointF(-2, -12), QPointF(18, -12)}));
        p.setBrush(style::wire());
        p.drawEllipse(QPointF(-18, 12), 2.5, 2.5);
        p.drawEllipse(QPointF(18, -12), 2.5, 2.5);
        break;
    }
    }
    p.end();
    return QIcon(pixmap);
}

}  // namespace tauline::ui
