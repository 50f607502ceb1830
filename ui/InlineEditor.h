// A one-line editor opened in place on the canvas (a part's value or name, a
// node's name). Enter commits through a callback that returns an error
// message or nothing; an error is shown under the field and the field stays
// open, the old value untouched. Escape closes without a change; leaving the
// field commits only text that is valid.
#pragma once

#include <QGraphicsProxyWidget>
#include <QObject>
#include <QPointer>
#include <QRectF>

#include <functional>

class QGraphicsProxyWidget;
class QGraphicsScene;
class QGraphicsSimpleTextItem;
class QLineEdit;

namespace tauline::ui {

class InlineEditor : public QObject {
    Q_OBJECT
public:
    using Commit = std::function<QString(const QString& text)>;

    InlineEditor(QGraphicsScene* scene, const QRectF& sceneRect, const QString& text, Commit commit);
    ~InlineEditor() override;

    QLineEdit* lineEdit() const { return edit_; }
    QGraphicsProxyWidget* proxy() const { return proxy_; }
    QString errorText() const;

    // Commits when the text is valid, then closes either way.
    void commitOrDiscard();
    void discard();

signals:
    void closed();

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    void tryCommit();
    void close();

    QGraphicsScene* scene_;
    QPointer<QGraphicsProxyWidget> proxy_;
    QLineEdit* edit_ = nullptr;
    QGraphicsSimpleTextItem* error_ = nullptr;
    Commit commit_;
    bool closed_ = false;
};

}  // namespace tauline::ui
