// The window's menu paths driven through their real dialogs, as a user
// would: the unsaved-changes prompt in front of New and Open, the file
// dialogs of Open and of the PNG export, and the frequency range dialog.
// Each dialog is answered from a timer once it is the active modal window.
#include "BodeChart.h"
#include "BodePlotView.h"
#include "FrequencyRangeDialog.h"
#include "MainWindow.h"
#include "SchematicDocument.h"

#include <QAbstractButton>
#include <QAction>
#include <QApplication>
#include <QDialogButtonBox>
#include <QFile>
#include <QFileDialog>
#include <QFileInfo>
#include <QImage>
#include <QImageReader>
#include <QLabel>
#include <QLineEdit>
#include <QMessageBox>
#include <QPushButton>
#include <QStandardPaths>
#include <QTemporaryDir>
#include <QTest>
#include <QTimer>
#include <QtCharts/QCategoryAxis>

#include <catch2/catch.hpp>

#include <cmath>
#include <functional>
#include <memory>

using namespace tauline::ui;

namespace {

const char* const kSample = TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline";

// Calls `answer` with the next modal dialog of type T once it is up (polled
// from the event loop its exec() runs). `seen` counts the dialogs answered.
// Setting the returned flag stops a poll whose dialog never came; the poll
// itself gives up only after ten minutes, as a loaded machine can take
// seconds to bring a file dialog up.
template <typename T>
std::shared_ptr<bool> whenModal(std::function<void(T*)> answer, int* seen,
                                std::shared_ptr<bool> stop = std::make_shared<bool>(false),
                                int triesLeft = 60000)
{
    QTimer::singleShot(10, [answer, seen, stop, triesLeft] {
        if (*stop)
            return;
        auto* dialog = qobject_cast<T*>(QApplication::activeModalWidget());
        if (!dialog) {
            if (triesLeft > 0)
                whenModal<T>(answer, seen, stop, triesLeft - 1);
            return;
        }
        ++*seen;
        answer(dialog);
    });
    return stop;
}

std::shared_ptr<bool> answerPrompt(QMessageBox::StandardButton button, int* seen)
{
    return whenModal<QMessageBox>([button](QMessageBox* box) { box->button(button)->click(); }, seen);
}

QAction* action(MainWindow& window, const char* name)
{
    auto* found = window.findChild<QAction*>(QString::fromLatin1(name));
    REQUIRE(found);
    return found;
}

bool settle(MainWindow& window)
{
    return QTest::qWaitFor([&] { return !window.isAnalysisPending(); }, 20000);
}

// A copy of the sample the test may change and save.
QString copyOfSample(const QTemporaryDir& dir)
{
    const QString path = dir.filePath(QStringLiteral("filter.tauline"));
    REQUIRE(QFile::copy(QString::fromLatin1(kSample), path));
    QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    return path;
}

}  // namespace

TEST_CASE("New and Open ask about unsaved changes through their prompt", "[main-window][dialogs]")
{
    QStandardPaths::setTestModeEnabled(true);
    QApplication::setAttribute(Qt::AA_DontUseNativeDialogs);
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = copyOfSample(dir);
    MainWindow window;
    REQUIRE(window.openFile(path));
    window.show();
    window.document()->setPartValue(QStringLiteral("R1"), 3.3e3, QStringLiteral("3k3"));
    REQUIRE(window.document()->isModified());
    int prompts = 0;
    int fileDialogs = 0;

    SECTION("New, cancelled: the drawing and its changes stay")
    {
        answerPrompt(QMessageBox::Cancel, &prompts);
        action(window, "newAction")->trigger();
        CHECK(prompts == 1);
        CHECK(window.document()->filePath() == path);
        CHECK(window.document()->isModified());
        CHECK(window.document()->part(QStringLiteral("R1"))->value == 3.3e3);
    }
    SECTION("New, changes discarded: an empty untitled network")
    {
        answerPrompt(QMessageBox::Discard, &prompts);
        action(window, "newAction")->trigger();
        CHECK(prompts == 1);
        CHECK(window.document()->filePath().isEmpty());
        CHECK(window.document()->network().parts.empty());
        CHECK(!window.document()->isModified());
        // Nothing was written: the file still holds the old value.
        MainWindow reader;
        REQUIRE(reader.openFile(path));
        CHECK(reader.document()->part(QStringLiteral("R1"))->value == 2.2e3);
    }
    SECTION("Open, cancelled at the prompt: no file dialog, nothing replaced")
    {
        answerPrompt(QMessageBox::Cancel, &prompts);
        const auto stop = whenModal<QFileDialog>([](QFileDialog* dialog) { dialog->reject(); }, &fileDialogs);
        action(window, "openAction")->trigger();
        *stop = true;
        CHECK(prompts == 1);
        CHECK(fileDialogs == 0);
        CHECK(window.document()->filePath() == path);
        CHECK(window.document()->part(QStringLiteral("R1"))->value == 3.3e3);
    }
    // Choosing the file inside the dialog is left out: the dialog takes a
    // typed name only once its folder listing has loaded, which a loaded
    // machine delays unpredictably; openFile() is tested on its own.
    SECTION("Open, changes saved first: the old file holds them before the file dialog")
    {
        answerPrompt(QMessageBox::Save, &prompts);
        whenModal<QFileDialog>([](QFileDialog* dialog) { dialog->reject(); }, &fileDialogs);
        action(window, "openAction")->trigger();
        CHECK(prompts == 1);
        CHECK(fileDialogs == 1);
        CHECK(window.document()->filePath() == path);
        CHECK(!window.document()->isModified());
        MainWindow reader;
        REQUIRE(reader.openFile(path));
        CHECK(reader.document()->part(QStringLiteral("R1"))->value == 3.3e3);
    }
    SECTION("Open, file dialog cancelled: the changed drawing stays")
    {
        answerPrompt(QMessageBox::Discard, &prompts);
        whenModal<QFileDialog>([](QFileDialog* dialog) { dialog->reject(); }, &fileDialogs);
        action(window, "openAction")->trigger();
        CHECK(fileDialogs == 1);
        CHECK(window.document()->filePath() == path);
        CHECK(window.document()->part(QStringLiteral("R1"))->value == 3.3e3);
    }
}

TEST_CASE("Export Plot as PNG writes the picture the user named", "[main-window][dialogs][export]")
{
    QStandardPaths::setTestModeEnabled(true);
    QApplication::setAttribute(Qt::AA_DontUseNativeDialogs);
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    window.show();
    REQUIRE(settle(window));
    REQUIRE(window.plot()->chart()->analysis().has_value());

    int fileDialogs = 0;
    QString suggested;
    // Typed without the suffix: the export adds ".png".
    const QString typed = dir.filePath(QStringLiteral("review-plot"));
    whenModal<QFileDialog>(
        [&suggested, typed](QFileDialog* dialog) {
            suggested = dialog->selectedFiles().value(0);
            // The name typed into the dialog's own field, as a user does;
            // selectFile() would first switch folders, which a loaded
            // machine finishes too late. done() skips accept()'s check
            // against a folder listing that may not have loaded either.
            auto* field = dialog->findChild<QLineEdit*>(QStringLiteral("fileNameEdit"));
            REQUIRE(field);
            field->setText(typed);
            static_cast<QDialog*>(dialog)->done(QDialog::Accepted);  // public there
        },
        &fileDialogs);
    action(window, "exportPngAction")->trigger();
    REQUIRE(fileDialogs == 1);
    CHECK(QFileInfo(suggested).fileName() == QStringLiteral("strain-gauge-input-filter.png"));

    const QString written = typed + QStringLiteral(".png");
    REQUIRE(QFileInfo::exists(written));
    QFile file(written);
    REQUIRE(file.open(QIODevice::ReadOnly));
    // The PNG signature (ISO/IEC 15948:2004, section 5.2).
    CHECK(file.read(8) == QByteArray("\x89PNG\r\n\x1a\n", 8));
    file.close();
    QImageReader reader(written);
    CHECK(reader.format() == "png");
    const QImage image = reader.read();
    REQUIRE(!image.isNull());
    CHECK(image.width() >= 300);
    CHECK(image.height() >= 200);
    // Both curves are drawn: pixels in the exact curve's and the sketch's colours.
    auto hasColour = [&image](const QColor& wanted) {
        for (int y = 0; y < image.height(); ++y)
            for (int x = 0; x < image.width(); ++x) {
                const QColor c = image.pixelColor(x, y);
                if (std::abs(c.red() - wanted.red()) + std::abs(c.green() - wanted.green())
                        + std::abs(c.blue() - wanted.blue())
                    < 12)
                    return true;
            }
        return false;
    };
    CHECK(hasColour(BodeChart::exactColor()));
    CHECK(hasColour(BodeChart::sketchColor()));
    CHECK(window.statusText().contains(QStringLiteral("review-plot.png")));
}

TEST_CASE("Frequency Range… sets the plot's range through its dialog", "[main-window][dialogs][plot]")
{
    QStandardPaths::setTestModeEnabled(true);
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    window.show();
    REQUIRE(settle(window));
    BodeChart* chart = window.plot()->chart();
    const std::pair<double, double> followed = chart->rangeHz();
    REQUIRE(!chart->userRange());
    int dialogs = 0;

    auto fill = [](FrequencyRangeDialog* dialog, const QString& from, const QString& to) {
        const QList<QLineEdit*> fields = dialog->findChildren<QLineEdit*>();
        CHECK(fields.size() == 2);
        if (fields.size() != 2)
            return;
        fields[0]->setText(from);
        fields[1]->setText(to);
    };
    auto press = [](QDialog* dialog, QDialogButtonBox::StandardButton which) {
        dialog->findChild<QDialogButtonBox*>()->button(which)->click();
    };

    SECTION("a range typed with SI prefixes is applied to the axis")
    {
        whenModal<FrequencyRangeDialog>(
            [&](FrequencyRangeDialog* dialog) {
                fill(dialog, QStringLiteral("100"), QStringLiteral("2.2 MHz"));
                press(dialog, QDialogButtonBox::Ok);
            },
            &dialogs);
        action(window, "frequencyRangeAction")->trigger();
        REQUIRE(dialogs == 1);
        REQUIRE(chart->userRange());
        CHECK(chart->rangeHz().first == Approx(100.0));
        CHECK(chart->rangeHz().second == Approx(2.2e6));
        auto* axis = qobject_cast<QCategoryAxis*>(chart->axes(Qt::Horizontal).value(0));
        REQUIRE(axis);
        CHECK(axis->min() == Approx(2.0));
        CHECK(axis->max() == Approx(std::log10(2.2e6)));

        // "Fit Range to Corners" gives the corners back their range.
        action(window, "fitRangeAction")->trigger();
        CHECK(!chart->userRange());
        CHECK(chart->rangeHz().first == Approx(followed.first));
        CHECK(chart->rangeHz().second == Approx(followed.second));
    }
    SECTION("a reversed range is refused in the dialog, and Cancel leaves the plot alone")
    {
        QString shownError;
        bool stillOpen = false;
        whenModal<FrequencyRangeDialog>(
            [&](FrequencyRangeDialog* dialog) {
                fill(dialog, QStringLiteral("10k"), QStringLiteral("1k"));
                press(dialog, QDialogButtonBox::Ok);
                stillOpen = dialog->isVisible();
                for (QLabel* label : dialog->findChildren<QLabel*>())
                    if (label->isVisible() && label->text().contains(QStringLiteral("below")))
                        shownError = label->text();
                press(dialog, QDialogButtonBox::Cancel);
            },
            &dialogs);
        action(window, "frequencyRangeAction")->trigger();
        REQUIRE(dialogs == 1);
        CHECK(stillOpen);
        CHECK(!shownError.isEmpty());
        CHECK(!chart->userRange());
        CHECK(chart->rangeHz() == followed);
    }
    SECTION("Follow the Corners undoes a range set before")
    {
        window.plot()->setUserRange(std::make_pair(1e3, 1e4));
        REQUIRE(chart->rangeHz().first == Approx(1e3));
        whenModal<FrequencyRangeDialog>(
            [&](FrequencyRangeDialog* dialog) {
                for (QPushButton* button : dialog->findChildren<QPushButton*>())
                    if (button->text().contains(QStringLiteral("Follow")))
                        button->click();
            },
            &dialogs);
        action(window, "frequencyRangeAction")->trigger();
        REQUIRE(dialogs == 1);
        CHECK(!chart->userRange());
        CHECK(chart->rangeHz().first == Approx(followed.first));
        CHECK(chart->rangeHz().second == Approx(followed.second));
    }
}
