#include "AnalysisRunner.h"

#include "Errors.h"

#include <QMetaObject>

#include <algorithm>
#include <exception>

namespace tauline::ui {

namespace {

std::shared_ptr<AnalysisOutcome> analyseNow(quint64 generation, const tauline::Network& network)
{
    auto outcome = std::make_shared<AnalysisOutcome>();
    outcome->generation = generation;
    outcome->network = network;
    try {
        outcome->analysis = tauline::analyze(network);
    } catch (const tauline::InputError& error) {
        outcome->error = QString::fromStdString(error.what());
    } catch (const std::exception& error) {
        // Anything else is the engine's fault, not the user's; still never a
        // crash of the editor.
        outcome->error = QObject::tr("The analysis failed: %1").arg(QString::fromUtf8(error.what()));
    }
    return outcome;
}

}  // namespace

AnalysisRunner::AnalysisRunner(QObject* parent)
    : QObject(parent), latest_(std::make_shared<std::atomic<quint64>>(0))
{
    pool_.setMaxThreadCount(1);
    sensitivityDelay_.setSingleShot(true);
    sensitivityDelay_.setInterval(150);
    connect(&sensitivityDelay_, &QTimer::timeout, this, &AnalysisRunner::startSensitivities);
}

AnalysisRunner::~AnalysisRunner()
{
    // Make the worker give up early, then wait: it posts to this object.
    latest_->store(~quint64{0});
    pending_.reset();
    pool_.waitForDone();
}

void AnalysisRunner::setInlineLimit(int reactiveParts)
{
    inlineLimit_ = std::max(0, reactiveParts);
}

void AnalysisRunner::setSensitivitiesEnabled(bool enabled)
{
    sensitivities_ = enabled;
}

void AnalysisRunner::setSensitivityDelay(int milliseconds)
{
    sensitivityDelay_.setInterval(std::max(0, milliseconds));
}

bool AnalysisRunner::runsInline(const tauline::Network& network) const
{
    if (inlineLimit_ <= 0)
        return false;
    const auto reactive = std::count_if(network.parts.begin(), network.parts.end(),
                                        [](const Part& p) { return isReactive(p.kind); });
    return reactive <= inlineLimit_
           && network.parts.size() <= static_cast<std::size_t>(6 * inlineLimit_);
}

quint64 AnalysisRunner::request(const tauline::Network& network)
{
    const quint64 generation = ++generation_;
    latest_->store(generation);
    sensitivityDelay_.stop();
    awaitingSensitivities_.reset();
    updateBusy();
    if (runsInline(network))
        deliverOutcome(analyseNow(generation, network));
    else
        submit(Job{generation, nullptr, network});
    return generation;
}

quint64 AnalysisRunner::clear(const QString& reason)
{
    const quint64 generation = ++generation_;
    latest_->store(generation);
    pending_.reset();
    sensitivityDelay_.stop();
    awaitingSensitivities_.reset();
    deliveredGeneration_ = generation;
    updateBusy();
    emit networkCleared(reason);
    return generation;
}

void AnalysisRunner::submit(Job job)
{
    if (workerRunning_) {
        pending_ = std::move(job);
        return;
    }
    workerRunning_ = true;
    auto latest = latest_;
    pool_.start([this, latest, job = std::move(job)] {
        auto current = [latest, generation = job.generation] { return latest->load() == generation; };
        if (!current()) {
            // Overtaken while queued: nothing to do.
        } else if (!job.analysed) {
            auto outcome = analyseNow(job.generation, job.network);
            QMetaObject::invokeMethod(this, [this, outcome] { deliverOutcome(outcome); },
                                      Qt::QueuedConnection);
        } else {
            auto s = std::make_shared<std::vector<CornerSensitivity>>(cornerSensitivities(
                job.analysed->network, *job.analysed->analysis, 1e-4, current));
            if (current())
                QMetaObject::invokeMethod(
                    this, [this, generation = job.generation, s] { deliverSensitivities(generation, s); },
                    Qt::QueuedConnection);
        }
        QMetaObject::invokeMethod(this, [this] { workerFinished(); }, Qt::QueuedConnection);
    });
}

void AnalysisRunner::startSensitivities()
{
    auto outcome = std::move(awaitingSensitivities_);
    awaitingSensitivities_.reset();
    if (outcome && outcome->generation == generation_)
        submit(Job{outcome->generation, outcome, {}});
}

void AnalysisRunner::workerFinished()
{
    workerRunning_ = false;
    if (!pending_)
        return;
    Job next = std::move(*pending_);
    pending_.reset();
    if (next.generation == generation_)
        submit(std::move(next));
}

void AnalysisRunner::deliverOutcome(std::shared_ptr<const AnalysisOutcome> outcome)
{
    if (!outcome || outcome->generation != generation_)
        return;  // a newer edit exists: this result is stale
    deliveredGeneration_ = outcome->generation;
    updateBusy();
    if (sensitivities_ && outcome->analysis && !outcome->analysis->breakpoints.empty()) {
        awaitingSensitivities_ = outcome;
        sensitivityDelay_.start();
    }
    emit analysisReady(std::move(outcome));
}

void AnalysisRunner::deliverSensitivities(
    quint64 generation, std::shared_ptr<const std::vector<tauline::CornerSensitivity>> s)
{
    if (generation != generation_ || !s)
        return;
    emit sensitivitiesReady(generation, std::move(s));
}

void AnalysisRunner::updateBusy()
{
    const bool busy = deliveredGeneration_ != generation_;
    if (busy == busy_)
        return;
    busy_ = busy;
    emit busyChanged(busy);
}

}  // namespace tauline::ui
