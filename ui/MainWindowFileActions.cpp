// New, open, save and the recent files: the document's life on disk, with
// the unsaved-changes prompt in front of anything that would lose edits.
#include "MainWindow.h"

#include "Errors.h"
#include "NetworkFile.h"
#include "SchematicDocument.h"

#include <QAction>
#include <QDir>
#include <QFile>
#include <QFileDialog>
#include <QFileInfo>
#include <QMenu>
#include <QMessageBox>
#include <QSettings>

#include <algorithm>

namespace tauline::ui {

namespace {

const char* const kRecentKey = "recentFiles";
constexpr int kMaxRecent = 8;
const char* const kStartupSample = ":/samples/start.tauline";

}  // namespace

bool MainWindow::maybeSave()
{
    if (!document_->isModified())
        return true;
    const auto answer = QMessageBox::warning(
        this, tr("Unsaved Changes"),
        tr("The network has changes that are not saved. Save them first?"),
        QMessageBox::Save | QMessageBox::Discard | QMessageBox::Cancel, QMessageBox::Save);
    if (answer == QMessageBox::Save)
        return save();
    return answer == QMessageBox::Discard;
}

void MainWindow::newFile()
{
    if (!maybeSave())
        return;
    document_->loadNetwork(tauline::Network{}, nullptr);
    updateTitle();
    updateCaution();
}

bool MainWindow::openFile(const QString& path, QString* error)
{
    QString message;
    if (!document_->openFile(path, &message)) {
        setStatus(message, true);
        if (error)
            *error = message;
        return false;
    }
    addRecentFile(QFileInfo(path).absoluteFilePath());
    updateTitle();
    updateCaution();
    loadNotes_ = document_->loadWarnings();
    viewFromFile_ = !isVisible() && document_->hasViewState();
    return true;
}

void MainWindow::openStartupSample()
{
    QFile file(QString::fromLatin1(kStartupSample));
    if (!file.open(QIODevice::ReadOnly))
        return;
    const std::string text = file.readAll().toStdString();
    try {
        const tauline::LoadedNetwork loaded = tauline::parseNetworkText(text, "start-up sample");
        document_->loadNetwork(loaded.network, loaded.drawing);
    } catch (const tauline::InputError& error) {
        setStatus(QString::fromStdString(error.what()), true);
    }
    updateTitle();
    updateCaution();
}

void MainWindow::openWithDialog()
{
    if (!maybeSave())
        return;
    const QString path = QFileDialog::getOpenFileName(
        this, tr("Open Network"), QFileInfo(document_->filePath()).absolutePath(),
        tr("Tauline networks (*.tauline);;All files (*)"));
    if (!path.isEmpty())
        openFile(path);
}

bool MainWindow::save()
{
    if (document_->filePath().isEmpty())
        return saveAs();
    QString error;
    if (!document_->saveFile(document_->filePath(), &error)) {
        setStatus(error, true);
        return false;
    }
    setStatus(tr("Saved %1").arg(QDir::toNativeSeparators(document_->filePath())), false);
    return true;
}

bool MainWindow::saveAs()
{
    QString suggestion = document_->filePath();
    if (suggestion.isEmpty())
        suggestion = (document_->title().isEmpty() ? tr("network") : document_->title())
                     + QStringLiteral(".tauline");
    QString path = QFileDialog::getSaveFileName(this, tr("Save Network"), suggestion,
                                                tr("Tauline networks (*.tauline)"));
    if (path.isEmpty())
        return false;
    if (QFileInfo(path).suffix().isEmpty())
        path += QStringLiteral(".tauline");
    QString error;
    if (!document_->saveFile(path, &error)) {
        setStatus(error, true);
        return false;
    }
    addRecentFile(QFileInfo(path).absoluteFilePath());
    updateTitle();
    setStatus(tr("Saved %1").arg(QDir::toNativeSeparators(path)), false);
    return true;
}

void MainWindow::addRecentFile(const QString& path)
{
    QSettings settings;
    QStringList files = settings.value(kRecentKey).toStringList();
    files.removeAll(path);
    files.prepend(path);
    while (files.size() > kMaxRecent)
        files.removeLast();
    settings.setValue(kRecentKey, files);
}

void MainWindow::rebuildRecentMenu()
{
    recentMenu_->clear();
    QStringList files = QSettings().value(kRecentKey).toStringList();
    files.erase(std::remove_if(files.begin(), files.end(),
                               [](const QString& f) { return !QFileInfo::exists(f); }),
                files.end());
    for (int i = 0; i < files.size(); ++i) {
        const QString path = files[i];
        QAction* action = recentMenu_->addAction(
            QStringLiteral("&%1  %2").arg(i + 1).arg(QFileInfo(path).fileName()));
        action->setToolTip(path);
        connect(action, &QAction::triggered, this, [this, path] {
            if (maybeSave())
                openFile(path);
        });
    }
    if (files.isEmpty())
        recentMenu_->addAction(tr("No recent files"))->setEnabled(false);
    else {
        recentMenu_->addSeparator();
        recentMenu_->addAction(tr("Clear List"), this, [] { QSettings().remove(kRecentKey); });
    }
}

}  // namespace tauline::ui
