// The factored response under the time-constant list: plain text, wrapped
// at the width it is given, in a scrolling pane.
#pragma once

#include <QString>
#include <QWidget>

namespace tauline::ui {

// A word-wrapped text that asks its layout for a new size only when its
// height changes. A QLabel re-measures its whole text several times over on
// every setText (size hint, minimum size hint, height for width), and the
// factored form changes with every value edit, a line per corner.
class FactoredFormText : public QWidget {
    Q_OBJECT
public:
    explicit FactoredFormText(QWidget* parent = nullptr);

    QString text() const { return text_; }
    void setText(const QString& text);
    void clear() { setText(QString()); }

    bool hasHeightForWidth() const override { return true; }
    int heightForWidth(int width) const override;
    QSize sizeHint() const override;
    QSize minimumSizeHint() const override;

protected:
    void paintEvent(QPaintEvent* event) override;
    void resizeEvent(QResizeEvent* event) override;

private:
    // The height of the text wrapped at `width`, margins included.
    int measure(int width) const;
    QRect textRect(int width) const;

    QString text_;
    int measuredWidth_ = -1;
    int measuredHeight_ = 0;
};

}  // namespace tauline::ui
