#include "FactoredFormText.h"

#include <QPainter>
#include <QResizeEvent>

namespace tauline::ui {

namespace {
constexpr int kFlags = Qt::AlignLeft | Qt::AlignTop | Qt::TextWordWrap;
constexpr int kMargin = 4;
}  // namespace

FactoredFormText::FactoredFormText(QWidget* parent) : QWidget(parent)
{
    // A scroll area reads height-for-width from the policy, not the virtual.
    QSizePolicy policy(QSizePolicy::Preferred, QSizePolicy::Preferred);
    policy.setHeightForWidth(true);
    setSizePolicy(policy);
    setBackgroundRole(QPalette::Window);
}

QRect FactoredFormText::textRect(int width) const
{
    return QRect(kMargin, kMargin / 2, std::max(1, width - 2 * kMargin), 1 << 20);
}

int FactoredFormText::measure(int width) const
{
    if (text_.isEmpty())
        return 0;
    return fontMetrics().boundingRect(textRect(width), kFlags, text_).height() + kMargin;
}

void FactoredFormText::setText(const QString& text)
{
    if (text == text_)
        return;
    text_ = text;
    const int before = measuredHeight_;
    measuredWidth_ = width();
    measuredHeight_ = measure(measuredWidth_);
    // Only a new height needs the pane laid out again; new numbers on as
    // many lines only need painting. A scroll area lays its widget out on
    // the widget's resize, not on updateGeometry: resizing to the new
    // height makes it fit the widget to its viewport again.
    if (measuredHeight_ != before) {
        updateGeometry();
        resize(width(), measuredHeight_);
    }
    update();
}

int FactoredFormText::heightForWidth(int width) const
{
    return width == measuredWidth_ ? measuredHeight_ : measure(width);
}

QSize FactoredFormText::sizeHint() const
{
    return QSize(200, heightForWidth(width() > 0 ? width() : 200));
}

QSize FactoredFormText::minimumSizeHint() const
{
    return QSize(0, 0);
}

void FactoredFormText::resizeEvent(QResizeEvent* event)
{
    QWidget::resizeEvent(event);
    if (event->size().width() != measuredWidth_) {
        const int before = measuredHeight_;
        measuredWidth_ = event->size().width();
        measuredHeight_ = measure(measuredWidth_);
        if (measuredHeight_ != before)
            updateGeometry();
    }
}

void FactoredFormText::paintEvent(QPaintEvent*)
{
    if (text_.isEmpty())
        return;
    QPainter painter(this);
    painter.setPen(palette().color(QPalette::WindowText));
    painter.drawText(textRect(width()), kFlags, text_);
}

}  // namespace tauline::ui
