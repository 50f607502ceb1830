#include "InlineEditor.h"

#include "CanvasStyle.h"

#include <QEvent>
#include <QGraphicsProxyWidget>
#include <QGraphicsScene>
#include <QGraphicsSimpleTextItem>
#include <QKeyEvent>
#include <QLineEdit>

namespace tauline::ui {

InlineEditor::InlineEditor(QGraphicsScene* scene, const QRectF& at, const QString& text, Commit commit)
    : QObject(scene), scene_(scene), commit_(std::move(commit))
{
    edit_ = new QLineEdit(text);
    QFont font = style::labelFont();
    font.setPixelSize(11);
    edit_->setFont(font);
    edit_->setFixedWidth(std::max(90, int(at.width()) + 40));
    edit_->setStyleSheet(QStringLiteral("QLineEdit { border: 1px solid #2e5e7e; padding: 0 2px; "
                                        "background: #ffffff; }"));
    edit_->selectAll();
    edit_->installEventFilter(this);
    proxy_ = scene->addWidget(edit_);
    proxy_->setZValue(1000);
    proxy_->setPos(at.left() - 3, at.center().y() - edit_->sizeHint().height() / 2.0);
    connect(edit_, &QLineEdit::returnPressed, this, &InlineEditor::tryCommit);
    connect(edit_, &QLineEdit::textEdited, this, [this] {
        if (error_)
            error_->hide();
    });
    proxy_->setFocus();
    edit_->setFocus();
}

InlineEditor::~InlineEditor()
{
    delete error_;
    delete proxy_;  // deletes the line edit
}

QString InlineEditor::errorText() const
{
    return error_ && error_->isVisible() ? error_->text() : QString();
}

void InlineEditor::tryCommit()
{
    if (closed_)
        return;
    const QString error = commit_(edit_->text());
    if (error.isEmpty()) {
        close();
        return;
    }
    if (!error_) {
        error_ = new QGraphicsSimpleTextItem;
        error_->setBrush(style::problem());
        error_->setFont(style::labelFont());
        error_->setZValue(1000);
        scene_->addItem(error_);
    }
    error_->setText(error);
    error_->setPos(proxy_->pos() + QPointF(0, proxy_->size().height() + 2));
    error_->show();
}

void InlineEditor::commitOrDiscard()
{
    if (closed_)
        return;
    const QString error = commit_(edit_->text());
    Q_UNUSED(error);  // invalid text is dropped: the old value stays
    close();
}

void InlineEditor::discard()
{
    close();
}

void InlineEditor::close()
{
    if (closed_)
        return;
    closed_ = true;
    proxy_->hide();
    if (error_)
        error_->hide();
    emit closed();
    deleteLater();
}

bool InlineEditor::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == edit_ && !closed_) {
        if (event->type() == QEvent::ShortcutOverride) {
            // Keys typed here are text, not canvas shortcuts.
            event->accept();
            return false;
        }
        if (event->type() == QEvent::KeyPress && static_cast<QKeyEvent*>(event)->key() == Qt::Key_Escape) {
            discard();
            return true;
        }
        if (event->type() == QEvent::FocusOut) {
            const auto reason = static_cast<QFocusEvent*>(event)->reason();
            if (reason != Qt::PopupFocusReason && reason != Qt::ActiveWindowFocusReason)
                commitOrDiscard();
        }
    }
    return QObject::eventFilter(watched, event);
}

}  // namespace tauline::ui
