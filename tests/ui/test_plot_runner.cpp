// The analysis runner: results of an older request are dropped once a newer
// one exists, whether they come back from the worker or are handed in late.
#include "AnalysisRunner.h"
#include "NetworkFile.h"

#include <QSignalSpy>
#include <QTest>

#include <catch2/catch.hpp>

using namespace tauline::ui;

namespace {

tauline::Network ladder(int sections, const std::string& r)
{
    tauline::Network n;
    n.title = "ladder";
    std::string previous = "in";
    for (int i = 1; i <= sections; ++i) {
        const std::string node = "n" + std::to_string(i);
        n.parts.push_back({"R" + std::to_string(i), tauline::PartKind::Resistor,
                           r == "1k" ? 1e3 : 2e3, r, {previous, node}, {}});
        n.parts.push_back({"C" + std::to_string(i), tauline::PartKind::Capacitor, 1e-9, "1n",
                           {node, "gnd"}, {}});
        previous = node;
    }
    n.response.kind = tauline::ResponseKind::VoltageGain;
    n.response.input = {"in", "gnd"};
    n.response.output = {previous, "gnd"};
    return n;
}

}  // namespace

TEST_CASE("Only the latest request's result is shown", "[plot][runner]")
{
    AnalysisRunner runner;
    runner.setInlineLimit(0);  // everything on the worker
    std::vector<std::shared_ptr<const AnalysisOutcome>> shown;
    QObject::connect(&runner, &AnalysisRunner::analysisReady,
                     [&](std::shared_ptr<const AnalysisOutcome> o) { shown.push_back(o); });
    std::vector<quint64> sensitivityGenerations;
    QObject::connect(&runner, &AnalysisRunner::sensitivitiesReady,
                     [&](quint64 g, auto) { sensitivityGenerations.push_back(g); });

    const quint64 first = runner.request(ladder(12, "1k"));
    const quint64 second = runner.request(ladder(6, "2k"));
    REQUIRE(second > first);
    CHECK(runner.isBusy());
    REQUIRE(QTest::qWaitFor([&] { return !shown.empty() && !sensitivityGenerations.empty(); }, 20000));
    QTest::qWait(50);  // anything still queued would arrive now

    REQUIRE(shown.size() == 1);
    CHECK(shown.front()->generation == second);
    REQUIRE(shown.front()->analysis);
    CHECK(shown.front()->network.parts.size() == 12);  // the 6-section ladder
    CHECK(shown.front()->analysis->order == 6);
    CHECK(sensitivityGenerations == std::vector<quint64>{second});
    CHECK(!runner.isBusy());
}

TEST_CASE("A result handed in after a newer request is dropped", "[plot][runner]")
{
    AnalysisRunner runner;
    runner.setSensitivitiesEnabled(false);
    QSignalSpy ready(&runner, &AnalysisRunner::analysisReady);
    const quint64 old = runner.request(ladder(2, "1k"));  // small: answered at once
    REQUIRE(ready.count() == 1);
    runner.request(ladder(3, "1k"));
    REQUIRE(ready.count() == 2);

    auto stale = std::make_shared<AnalysisOutcome>();
    stale->generation = old;
    stale->analysis = tauline::analyze(ladder(2, "1k"));
    runner.deliverOutcome(stale);
    CHECK(ready.count() == 2);

    QSignalSpy sensitivities(&runner, &AnalysisRunner::sensitivitiesReady);
    runner.deliverSensitivities(old, std::make_shared<std::vector<tauline::CornerSensitivity>>());
    CHECK(sensitivities.count() == 0);

    // Clearing (no response to analyse) makes even the latest request stale.
    auto latest = std::make_shared<AnalysisOutcome>();
    latest->generation = runner.generation();
    runner.clear(QStringLiteral("no response"));
    runner.deliverOutcome(latest);
    CHECK(ready.count() == 2);
}

TEST_CASE("An engine error is delivered as a message, not thrown", "[plot][runner]")
{
    AnalysisRunner runner;
    QSignalSpy ready(&runner, &AnalysisRunner::analysisReady);
    tauline::Network broken = ladder(1, "1k");
    broken.response.output = {"nowhere", "gnd"};
    runner.request(broken);
    REQUIRE(ready.count() == 1);
    const auto outcome = ready.front().front().value<std::shared_ptr<const AnalysisOutcome>>();
    CHECK(!outcome->analysis);
    CHECK(!outcome->error.isEmpty());
}
