#pragma once

#include "Analysis.h"
#include "CornerSensitivity.h"
#include "Network.h"

#include <QObject>
#include <QString>
#include <QThreadPool>
#include <QTimer>

#include <atomic>
#include <memory>
#include <optional>

namespace tauline::ui {

// What one run of the engine gave for one state of the drawing.
struct AnalysisOutcome {
    quint64 generation = 0;
    tauline::Network network;
    std::optional<tauline::Analysis> analysis;  // empty when the engine refused
    QString error;                              // the engine's message, if it refused
};

// Runs tauline::analyze for the latest network the drawing describes. Small
// networks are analysed at once; larger ones on a worker thread so the
// canvas stays responsive. Every request bumps a generation counter and a
// result is delivered only if it belongs to the latest request: a result
// that arrives after a newer edit is dropped, never shown as current.
// Corner sensitivities (exact, one factorisation per corner; differences only
// at a double root) follow on the worker as a
// second signal for the same generation, once the edits pause, so they never
// compete with redrawing while a value is dragged.
class AnalysisRunner : public QObject {
    Q_OBJECT
public:
    explicit AnalysisRunner(QObject* parent = nullptr);
    ~AnalysisRunner() override;

    // Networks with at most this many reactive parts (and six times as many
    // parts in all) are analysed on the calling thread: measured, a 100-part
    // network with 20 capacitors takes about 2 ms, and handing it to a thread
    // costs more than that in scheduling on a busy machine. Larger networks
    // go to the worker. 0 sends everything to the worker.
    void setInlineLimit(int reactiveParts);
    void setSensitivitiesEnabled(bool enabled);
    // How long the edits must pause before sensitivities are worked out.
    void setSensitivityDelay(int milliseconds);

    quint64 request(const tauline::Network& network);
    // Forget the current network (no response to analyse): bumps the
    // generation so nothing in flight is shown, and reports why.
    quint64 clear(const QString& reason);

    quint64 generation() const { return generation_; }
    // True while the latest request has no result yet.
    bool isBusy() const { return busy_; }

    // Entry points for results, public so a test can hand in a stale one.
    void deliverOutcome(std::shared_ptr<const AnalysisOutcome> outcome);
    void deliverSensitivities(quint64 generation,
                              std::shared_ptr<const std::vector<tauline::CornerSensitivity>> s);

signals:
    void analysisReady(std::shared_ptr<const tauline::ui::AnalysisOutcome> outcome);
    void sensitivitiesReady(quint64 generation,
                            std::shared_ptr<const std::vector<tauline::CornerSensitivity>> s);
    void networkCleared(const QString& reason);
    void busyChanged(bool busy);

private:
    // One piece of work for the worker thread.
    struct Job {
        quint64 generation = 0;
        std::shared_ptr<const AnalysisOutcome> analysed;  // set: work out sensitivities
        tauline::Network network;                          // else: analyse this
    };

    bool runsInline(const tauline::Network& network) const;
    void submit(Job job);
    void startSensitivities();
    void workerFinished();
    void updateBusy();

    quint64 generation_ = 0;
    quint64 deliveredGeneration_ = 0;
    std::shared_ptr<std::atomic<quint64>> latest_;
    int inlineLimit_ = 24;
    bool sensitivities_ = true;
    bool busy_ = false;
    bool workerRunning_ = false;
    // The newest job that arrived while the worker was busy; older ones in
    // between are never started.
    std::optional<Job> pending_;
    std::shared_ptr<const AnalysisOutcome> awaitingSensitivities_;
    QTimer sensitivityDelay_;
    QThreadPool pool_;
};

}  // namespace tauline::ui
