// The window's side of files: the unsaved-changes prompt, recent files and
// the window arrangement kept in the settings.
#include "MainWindow.h"
#include "SchematicDocument.h"

#include <QAbstractButton>
#include <QApplication>
#include <QDockWidget>
#include <QFileInfo>
#include <QMessageBox>
#include <QSettings>
#include <QStandardPaths>
#include <QTest>
#include <QTimer>

#include <catch2/catch.hpp>

using namespace tauline::ui;

namespace {

const char* const kSample = TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline";

// Answers the next message box with the given button, once it is up.
void answerNextPrompt(QMessageBox::StandardButton button, QString* seenText)
{
    QTimer::singleShot(0, [button, seenText] {
        auto* box = qobject_cast<QMessageBox*>(QApplication::activeModalWidget());
        if (!box) {
            answerNextPrompt(button, seenText);
            return;
        }
        if (seenText)
            *seenText = box->text();
        box->button(button)->click();
    });
}

}  // namespace

TEST_CASE("Closing with unsaved changes asks first", "[main-window][files]")
{
    QStandardPaths::setTestModeEnabled(true);
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    window.show();

    SECTION("an unchanged network closes without a question")
    {
        CHECK(window.close());
    }
    SECTION("cancel keeps the window and the changes")
    {
        window.document()->setPartValue(QStringLiteral("R1"), 3.3e3, QStringLiteral("3k3"));
        REQUIRE(window.document()->isModified());
        QString asked;
        answerNextPrompt(QMessageBox::Cancel, &asked);
        CHECK(!window.close());
        CHECK(asked.contains(QStringLiteral("not saved")));
        CHECK(window.isVisible());
        CHECK(window.document()->isModified());
    }
    SECTION("discard closes and leaves the file as it was")
    {
        window.document()->setPartValue(QStringLiteral("R1"), 3.3e3, QStringLiteral("3k3"));
        answerNextPrompt(QMessageBox::Discard, nullptr);
        CHECK(window.close());
        MainWindow again;
        REQUIRE(again.openFile(QString::fromLatin1(kSample)));
        CHECK(again.document()->part(QStringLiteral("R1"))->value == 2.2e3);
    }
}

TEST_CASE("Opened files are remembered as recent files", "[main-window][files]")
{
    QStandardPaths::setTestModeEnabled(true);
    QSettings().remove(QStringLiteral("recentFiles"));
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    const QStringList recent = QSettings().value(QStringLiteral("recentFiles")).toStringList();
    REQUIRE(!recent.isEmpty());
    CHECK(recent.front() == QFileInfo(QString::fromLatin1(kSample)).absoluteFilePath());

    QString error;
    CHECK(!window.openFile(QStringLiteral("/no/such/network.tauline"), &error));
    CHECK(!error.isEmpty());
    CHECK(window.statusText().contains(QStringLiteral("network.tauline")));
    CHECK(QSettings().value(QStringLiteral("recentFiles")).toStringList() == recent);
}

TEST_CASE("The window's arrangement is kept between sessions", "[main-window][files]")
{
    QStandardPaths::setTestModeEnabled(true);
    QSettings().remove(QStringLiteral("mainWindow"));
    {
        MainWindow window;
        window.show();
        window.resize(1100, 700);
        window.findChild<QDockWidget*>(QStringLiteral("timeConstantDock"))->hide();
        QTest::qWait(20);
        REQUIRE(window.close());
    }
    MainWindow window;
    window.show();
    QTest::qWait(20);
    CHECK(window.size() == QSize(1100, 700));
    CHECK(!window.findChild<QDockWidget*>(QStringLiteral("timeConstantDock"))->isVisible());
    CHECK(window.findChild<QDockWidget*>(QStringLiteral("cornerDock"))->isVisible());
    QSettings().remove(QStringLiteral("mainWindow"));
}
