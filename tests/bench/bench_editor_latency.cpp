// Edit-to-redrawn latency of the editor (a benchmark, not a test): a
// 100-part network with 20 capacitors is loaded into the main window, one
// resistor value is changed over and over, and the time from the edit to the
// window repainted with the new analysis (plot, corner table, time
// constants, canvas) is measured. Reports the median; the target is one
// frame (16 ms). Called by the bench program's main when built with the UI.
#include "BodeChart.h"
#include "BodePlotView.h"
#include "CornerTable.h"
#include "MainWindow.h"
#include "SchematicDocument.h"
#include "SchematicView.h"
#include "TimeConstantTable.h"

#include <QtCharts/QChartView>

#include <QApplication>
#include <QElapsedTimer>
#include <QFile>
#include <QImage>
#include <QPixmap>
#include <QScreen>
#include <QEventLoop>
#include <QThread>
#include <QTimer>
#include <QStandardPaths>

#include <algorithm>
#include <cstdio>
#include <cstdlib>
#include <ctime>
#include <memory>
#include <optional>
#include <string>
#include <vector>

namespace {

// An invented 20-section sensor-array filter: each section a series
// resistor, a shunt capacitor, a shunt resistor and two resistors bridging
// to sections further on. 20 x 5 = 100 parts, 20 of them capacitors.
tauline::Network sensorArrayNetwork()
{
    tauline::Network n;
    n.title = "Twenty-channel sensor array filter (latency benchmark)";
    auto node = [](int i) { return i == 0 ? std::string("in") : "n" + std::to_string(i); };
    auto add = [&n](const std::string& name, tauline::PartKind kind, double value, std::string a,
                    std::string b) {
        tauline::Part p;
        p.name = name;
        p.kind = kind;
        p.value = value;
        p.nodes = {std::move(a), std::move(b)};
        n.parts.push_back(p);
    };
    const int sections = 20;
    for (int i = 1; i <= sections; ++i) {
        const std::string k = std::to_string(i);
        add("RS" + k, tauline::PartKind::Resistor, 1e3 * (1 + i % 7), node(i - 1), node(i));
        add("C" + k, tauline::PartKind::Capacitor, 1e-9 * (1 + i % 5), node(i), "gnd");
        add("RG" + k, tauline::PartKind::Resistor, 1e6 / (1 + i % 3), node(i), "gnd");
        add("RB" + k, tauline::PartKind::Resistor, 47e3 * (1 + i % 4), node(i),
            i + 2 <= sections ? node(i + 2) : "gnd");
        add("RX" + k, tauline::PartKind::Resistor, 220e3, node(i), i + 3 <= sections ? node(i + 3) : "gnd");
    }
    n.response.kind = tauline::ResponseKind::VoltageGain;
    n.response.input = {"in", "gnd"};
    n.response.output = {node(sections), "gnd"};
    return n;
}

struct Stats {
    double median = 0, p90 = 0, min = 0, max = 0;
};

Stats statsOf(std::vector<double> ms)
{
    std::sort(ms.begin(), ms.end());
    Stats s;
    if (ms.empty())
        return s;
    s.median = ms.size() % 2 ? ms[ms.size() / 2] : 0.5 * (ms[ms.size() / 2 - 1] + ms[ms.size() / 2]);
    s.p90 = ms[std::min(ms.size() - 1, static_cast<std::size_t>(0.9 * ms.size()))];
    s.min = ms.front();
    s.max = ms.back();
    return s;
}

// Runs the event loop until `done` holds (the bench has no QtTest).
template <typename Predicate>
bool waitFor(Predicate done, int timeoutMs)
{
    QElapsedTimer clock;
    clock.start();
    while (!done()) {
        if (clock.elapsed() > timeoutMs)
            return false;
        QCoreApplication::processEvents(QEventLoop::AllEvents, 5);
        QThread::msleep(1);
    }
    return true;
}

double threadCpuMs()
{
    timespec t{};
    clock_gettime(CLOCK_THREAD_CPUTIME_ID, &t);
    return t.tv_sec * 1e3 + t.tv_nsec / 1e6;
}

QString loadAverage()
{
    QFile file(QStringLiteral("/proc/loadavg"));
    if (!file.open(QIODevice::ReadOnly))
        return QStringLiteral("?");
    return QString::fromLatin1(file.readLine()).section(QLatin1Char(' '), 0, 2);
}

struct Timing {
    double wallMs = 0.0;
    double cpuMs = 0.0;  // the UI thread's own work: on a busy machine the
                         // wall time also holds the waits for a core
};

// What the event loop does next after the views took a new analysis, done
// at once: layouts settle, the graphics scenes (canvas, chart) pass their
// changed items on as viewport updates, and the window paints every region
// marked changed and flushes it to the screen. Widgets whose content did not
// change are not repainted, as in the running editor; screenMatchesFullRepaint
// checks that this leaves nothing stale on screen.
// TAULINE_BENCH_FULL_REPAINT=1 paints the whole window instead, as this
// bench did before (for comparing the two).
void flushToScreen(QWidget& window)
{
    static const bool whole = std::getenv("TAULINE_BENCH_FULL_REPAINT") != nullptr;
    for (int pass = 0; pass < 2; ++pass) {
        QCoreApplication::sendPostedEvents(nullptr, QEvent::LayoutRequest);
        QCoreApplication::sendPostedEvents(nullptr, QEvent::MetaCall);
    }
    if (whole)
        window.repaint();
    else
        QCoreApplication::sendPostedEvents(&window, QEvent::UpdateRequest);
}

// The window's pixels on screen (the platform's copy of the backing store)
// against the whole window painted afresh.
bool screenMatchesFullRepaint(QWidget& window)
{
    flushToScreen(window);
    QScreen* screen = window.screen();
    const QImage onScreen = screen->grabWindow(window.winId()).toImage().convertToFormat(QImage::Format_RGB32);
    const QImage fresh = window.grab().toImage().convertToFormat(QImage::Format_RGB32);
    return !onScreen.isNull() && onScreen == fresh;
}

// One edit, timed until the window has repainted with its analysis.
std::optional<Timing> timedEdit(tauline::ui::MainWindow& window, const QString& part, double value)
{
    // A plain event loop: QTest::qWaitFor sleeps between its polls, which
    // would be counted as latency.
    QEventLoop loop;
    QElapsedTimer clock;
    bool done = false;
    Timing elapsed;
    double cpuStart = 0.0;
    auto connection = QObject::connect(&window, &tauline::ui::MainWindow::viewsUpdated, &window, [&] {
        if (done || window.isAnalysisPending())
            return;
        flushToScreen(window);  // plot, tables and canvas, drawn now
        elapsed.wallMs = clock.nsecsElapsed() / 1e6;
        elapsed.cpuMs = threadCpuMs() - cpuStart;
        done = true;
        loop.quit();
    });
    QTimer::singleShot(10000, &loop, &QEventLoop::quit);
    clock.start();
    cpuStart = threadCpuMs();
    window.document()->setPartValue(part, value, QString());
    if (!done)
        loop.exec();
    QObject::disconnect(connection);
    if (!done)
        return std::nullopt;
    return elapsed;
}

// Where one edit's UI-thread time goes: the engine, then each view taking a
// new analysis on its own and the window laid out and repainted where it changed
// (median CPU ms over `rounds`, alternating two values of `part`).
void printBreakdown(tauline::ui::MainWindow& window, const QString& part, int rounds)
{
    tauline::Network networks[2] = {window.document()->network(), window.document()->network()};
    for (int k = 0; k < 2; ++k)
        for (auto& p : networks[k].parts)
            if (p.name == part.toStdString())
                p.value = k ? 3.3e3 : 4.7e3;
    std::vector<double> engine, plot, corners, constants, nothing;
    auto timed = [](std::vector<double>& into, auto&& work) {
        const double start = threadCpuMs();
        work();
        into.push_back(threadCpuMs() - start);
    };
    auto settleAndPaint = [&window] { flushToScreen(window); };
    for (int i = 0; i < rounds; ++i) {
        const tauline::Network& n = networks[i % 2];
        std::optional<tauline::Analysis> a;
        timed(engine, [&] { a = tauline::analyze(n); });
        timed(plot, [&] {
            window.plot()->setAnalysis(*a);
            settleAndPaint();
        });
        timed(corners, [&] {
            window.cornerTable()->setAnalysis(*a);
            settleAndPaint();
        });
        timed(constants, [&] {
            window.timeConstantTable()->setAnalysis(*a, n);
            settleAndPaint();
        });
        timed(nothing, settleAndPaint);
    }
    std::printf("  where the UI thread's time goes (CPU median over %d edits, ms; each view's\n"
                "  share includes laying out and repainting what it changed):\n",
                rounds);
    std::printf("    engine %.2f | plot %.2f | corner table %.2f | time constants %.2f |"
                " nothing changed %.2f\n",
                statsOf(engine).median, statsOf(plot).median, statsOf(corners).median,
                statsOf(constants).median, statsOf(nothing).median);
}

}  // namespace

int runEditorLatencyBench()
{
    std::unique_ptr<QApplication> ownApp;
    if (!QApplication::instance()) {
        if (!std::getenv("QT_QPA_PLATFORM"))
            setenv("QT_QPA_PLATFORM", "offscreen", 1);
        static int argc = 1;
        static char name[] = "tauline_bench";
        static char* argv[] = {name, nullptr};
        ownApp = std::make_unique<QApplication>(argc, argv);
    }
    QStandardPaths::setTestModeEnabled(true);

    tauline::ui::MainWindow window;
    window.resize(1280, 800);
    window.document()->loadNetwork(sensorArrayNetwork(), nullptr);
    window.show();
    auto idle = [&] {
        return waitFor([&] {
            return !window.isAnalysisPending()
                   && window.shownSensitivityGeneration() == window.shownGeneration();
        }, 30000);
    };
    if (!idle() || window.cornerTable()->rowCount() == 0) {
        std::fprintf(stderr, "editor latency: the benchmark network did not analyse\n");
        return 1;
    }
    const int parts = static_cast<int>(window.document()->network().parts.size());

    // Isolated edits: the window idle (sensitivities done) before each one.
    const QString part = QStringLiteral("RS7");
    std::vector<double> isolated;
    std::vector<double> isolatedCpu;
    for (int i = 0; i < 45; ++i) {
        const auto ms = timedEdit(window, part, i % 2 ? 3.3e3 : 4.7e3);
        if (!ms || !idle()) {
            std::fprintf(stderr, "editor latency: an edit was never redrawn\n");
            return 1;
        }
        if (i >= 5) {  // warm-up
            isolated.push_back(ms->wallMs);
            isolatedCpu.push_back(ms->cpuMs);
        }
    }
    // Edits back to back, as while dragging a value: the previous edit's
    // sensitivity work is still running and has to give way.
    std::vector<double> dragging;
    std::vector<double> draggingCpu;
    for (int i = 0; i < 40; ++i) {
        const auto ms = timedEdit(window, part, 1e3 * (2.0 + 0.1 * i));
        if (!ms) {
            std::fprintf(stderr, "editor latency: an edit was never redrawn\n");
            return 1;
        }
        dragging.push_back(ms->wallMs);
        draggingCpu.push_back(ms->cpuMs);
    }
    idle();
    // Painting only what changed must leave the same pixels as painting it all.
    const bool screenCurrent = screenMatchesFullRepaint(window);

    // TAULINE_BENCH_SHOT=file.png: the window as measured, to look at.
    if (const char* shot = std::getenv("TAULINE_BENCH_SHOT"))
        window.grab().save(QString::fromLocal8Bit(shot));

    const Stats a = statsOf(isolated);
    const Stats b = statsOf(dragging);
    std::printf("editor latency, %d parts / 20 capacitors, edit to window repainted "
                "(load average %s):\n",
                parts, qPrintable(loadAverage()));
    std::printf("  single edits    median %6.2f ms  (p90 %.2f, min %.2f, max %.2f; %zu edits);"
                " UI-thread CPU median %.2f ms\n",
                a.median, a.p90, a.min, a.max, isolated.size(), statsOf(isolatedCpu).median);
    std::printf("  while dragging  median %6.2f ms  (p90 %.2f, min %.2f, max %.2f; %zu edits);"
                " UI-thread CPU median %.2f ms\n",
                b.median, b.p90, b.min, b.max, dragging.size(), statsOf(draggingCpu).median);
    std::printf("  target: under 16 ms (one frame at 60 Hz); the screen after the last edit %s\n",
                screenCurrent ? "matches the whole window painted afresh"
                              : "DIFFERS from the whole window painted afresh (stale pixels)");
    printBreakdown(window, part, 20);
    return 0;
}
