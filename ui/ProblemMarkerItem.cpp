#include "ProblemMarkerItem.h"

#include "CanvasStyle.h"

#include <QFontMetricsF>
#include <QPainter>

namespace tauline::ui {

ProblemMarkerItem::ProblemMarkerItem(const DrawingProblem& problem) : problem_(problem)
{
    // Serious problems sit just above and right of the spot, so the badge
    // does not hide the symbol it is about.
    setPos(problem.minor ? problem.where : problem.where + QPointF(10, -12));
    setZValue(20);
    setToolTip(problem.message);
    setAcceptedMouseButtons(Qt::NoButton);
    if (!problem.minor) {
        QFont font = style::labelFont();
        font.setItalic(true);
        const QFontMetricsF metrics(font);
        textRect_ = QRectF(10, -metrics.height() / 2 - 1, metrics.horizontalAdvance(problem.message) + 8,
                           metrics.height() + 2);
    }
}

QRectF ProblemMarkerItem::boundingRect() const
{
    return QRectF(-8, -8, 16, 16).united(textRect_).adjusted(-1, -1, 1, 1);
}

void ProblemMarkerItem::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*)
{
    p->setRenderHint(QPainter::Antialiasing);
    if (problem_.minor) {
        p->setPen(QPen(style::hint(), 1.6));
        p->setBrush(Qt::NoBrush);
        p->drawEllipse(QPointF(0, 0), 4.5, 4.5);
        return;
    }
    p->setPen(Qt::NoPen);
    p->setBrush(style::problem());
    p->drawEllipse(QPointF(0, 0), 7, 7);
    p->setPen(QPen(Qt::white, 1.8, Qt::SolidLine, Qt::RoundCap));
    p->drawLine(QPointF(0, -3.8), QPointF(0, 1.2));
    p->drawPoint(QPointF(0, 3.8));
    QColor back = style::paper();
    back.setAlpha(225);
    p->setPen(Qt::NoPen);
    p->setBrush(back);
    p->drawRoundedRect(textRect_, 3, 3);
    QFont font = style::labelFont();
    font.setItalic(true);
    p->setFont(font);
    p->setPen(style::problem());
    p->drawText(textRect_, Qt::AlignCenter, problem_.message);
}

}  // namespace tauline::ui
