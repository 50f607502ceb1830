// The speed report: `tauline_bench` prints numbers for the README, it asserts
// nothing. Engine: analyze + a 1000-point sweep of a random 40-capacitor,
// 200-resistor network; the time-constant engine alone for 2…64 capacitors;
// peak memory. Editor: the edit-to-redrawn latency (when built with the UI).
#include "Analysis.h"
#include "ExactResponse.h"
#include "NodalModel.h"
#include "RandomNetwork.h"
#include "TimeConstantEngine.h"

#include <sys/resource.h>

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstring>
#include <functional>
#include <vector>

#ifdef TAULINE_WITH_UI
int runEditorLatencyBench();
#endif

namespace {

using Clock = std::chrono::steady_clock;

// Median wall time of `runs` calls, in milliseconds.
double medianMs(int runs, const std::function<void()>& work)
{
    std::vector<double> ms;
    for (int i = 0; i < runs; ++i) {
        const auto t0 = Clock::now();
        work();
        ms.push_back(std::chrono::duration<double, std::milli>(Clock::now() - t0).count());
    }
    std::nth_element(ms.begin(), ms.begin() + runs / 2, ms.end());
    return ms[runs / 2];
}

tauline::Network benchNetwork(int capacitors, int resistors, int nodes, unsigned seed)
{
    std::mt19937 rng(seed);
    tauline::testing::RandomNetworkShape shape;
    shape.nodes = nodes;
    shape.resistors = resistors;
    shape.capacitors = capacitors;
    shape.kind = tauline::ResponseKind::VoltageGain;
    return tauline::testing::randomNetwork(rng, shape);
}

void engineBench()
{
    const tauline::Network big = benchNetwork(40, 200, 60, 40200);
    const auto hz = tauline::logSpacedHz(1.0, 1e9, 1000);
    std::size_t points = 0;
    const double whole = medianMs(21, [&] {
        const tauline::Analysis a = tauline::analyze(big);
        points += tauline::sweep(a, hz).size();
    });
    std::printf("analyze + 1000-point sweep, 40 C / 200 R / 60 nodes: median %.2f ms (%zu points swept)\n", whole,
                points / 21);

    std::printf("time-constant engine (port matrices, every tau_i and tau_j^i, b_k):\n");
    std::printf("  %-12s %-8s %-12s\n", "capacitors", "nodes", "median ms");
    for (int n : {2, 4, 8, 16, 32, 64}) {
        const int nodes = std::max(6, n + n / 2);
        const tauline::Network net = benchNetwork(n, 3 * nodes, nodes, 1000u + static_cast<unsigned>(n));
        const tauline::NodalModel model = tauline::buildNodalModel(net);
        const tauline::ExactResponse exact = tauline::solveExact(model);
        std::size_t sink = 0;
        const double ms = medianMs(11, [&] {
            const tauline::TimeConstantEngine engine(model, exact);
            sink += engine.firstOrder().size() + engine.secondOrder().size();
            sink += engine.denominator().value_or(std::vector<double>{}).size();
        });
        std::printf("  %-12d %-8d %-12.3f (%zu values)\n", n, nodes, ms, sink / 11);
    }
}

}  // namespace

int main(int argc, char** argv)
{
    const bool editorOnly = argc > 1 && std::strcmp(argv[1], "--editor") == 0;
    const bool engineOnly = argc > 1 && std::strcmp(argv[1], "--engine") == 0;
    int status = 0;
    if (!editorOnly)
        engineBench();
#ifdef TAULINE_WITH_UI
    if (!engineOnly)
        status = runEditorLatencyBench();
#else
    (void)engineOnly;
#endif
    rusage usage{};
    getrusage(RUSAGE_SELF, &usage);
    std::printf("peak resident memory: %.1f MiB\n", usage.ru_maxrss / 1024.0);
    return status;
}
