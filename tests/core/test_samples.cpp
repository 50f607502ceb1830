// Every sample network opens and analyses, and the engine agrees with one
// full nodal solve on it (the exact solver as the referee).
#include "Analysis.h"
#include "ExactResponse.h"
#include "NetworkFile.h"
#include "NodalModel.h"

#include <catch2/catch.hpp>
#include <filesystem>

using namespace tauline;

TEST_CASE("every sample analyses, and its factored form matches a direct solve", "[samples]")
{
    int samples = 0;
    for (const auto& entry : std::filesystem::directory_iterator(TAULINE_SAMPLES_DIR)) {
        if (entry.path().extension() != ".tauline")
            continue;
        ++samples;
        INFO(entry.path().string());
        const LoadedNetwork loaded = readNetworkFile(entry.path().string());
        const Analysis a = analyze(loaded.network);
        CHECK_FALSE(a.breakpoints.empty());
        const NodalModel model = buildNodalModel(loaded.network);
        const auto range = suggestedRangeHz(a);
        for (double hz : logSpacedHz(range.first, range.second, 25)) {
            const auto direct = directResponse(model, {0.0, 2 * M_PI * hz});
            CHECK(std::abs(a.atHz(hz) - direct) <= 1e-9 * std::abs(direct));
        }
    }
    CHECK(samples >= 3);
}
