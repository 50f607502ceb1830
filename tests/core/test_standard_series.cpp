// The E12, E24 and E96 preferred number series.
// Source: IEC 60063:2015, "Preferred number series for resistors and
// capacitors", the E-series tables (E3...E24 with two significant figures,
// E48...E192 with three). Entries below are recited from memory of those
// tables; the structural facts (E12 is every second E24 value; E96 values are
// 10^(i/96) rounded to three figures; the historic E24 entries that differ
// from 10^(i/24) rounded to two figures) are stated in the standard's notes
// and checked here independently of the stored tables.
#include "StandardSeries.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <set>

using tauline::ValueSeries;

namespace {

long hundredths(double v)
{
    return std::lround(v * 100.0);
}

}  // namespace

TEST_CASE("Series tables have the standard's lengths and entries", "[series]")
{
    const auto e12 = tauline::seriesTable(ValueSeries::E12);
    const auto e24 = tauline::seriesTable(ValueSeries::E24);
    const auto e96 = tauline::seriesTable(ValueSeries::E96);
    REQUIRE(e12.size() == 12);
    REQUIRE(e24.size() == 24);
    REQUIRE(e96.size() == 96);

    // IEC 60063:2015, E24 (from memory of the table).
    const double expectedE24[] = {1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0,
                                  3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};
    for (size_t i = 0; i < 24; ++i)
        CHECK(e24[i] == expectedE24[i]);

    // E12 is every second E24 value (IEC 60063 builds each series from the
    // one with twice the entries).
    for (size_t i = 0; i < 12; ++i)
        CHECK(e12[i] == e24[2 * i]);

    // Known E96 entries (IEC 60063:2015, E96, from memory): the first, some
    // common ones and the last.
    CHECK(e96[0] == 1.00);
    CHECK(e96[1] == 1.02);
    CHECK(e96[24] == 1.78);
    CHECK(e96[48] == 3.16);
    CHECK(e96[67] == 4.99);
    CHECK(e96[95] == 9.76);

    // Every list ascends within one decade.
    for (auto table : {e12, e24, e96}) {
        CHECK(table.front() == 1.0);
        CHECK(table.back() < 10.0);
        for (size_t i = 1; i < table.size(); ++i)
            CHECK(table[i] > table[i - 1]);
    }
}

TEST_CASE("E96 is 10^(i/96) to three figures, E24 departs from its formula at eight places", "[series]")
{
    // IEC 60063:2015: the three-figure series follow the rounded geometric
    // progression; the two-figure E24 keeps its historic values.
    const auto e96 = tauline::seriesTable(ValueSeries::E96);
    for (size_t i = 0; i < 96; ++i) {
        INFO("E96 entry " << i);
        CHECK(hundredths(e96[i]) == std::lround(100.0 * std::pow(10.0, double(i) / 96.0)));
    }
    const auto e24 = tauline::seriesTable(ValueSeries::E24);
    std::set<double> departures;
    for (size_t i = 0; i < 24; ++i) {
        const double rounded = std::round(10.0 * std::pow(10.0, double(i) / 24.0)) / 10.0;
        if (hundredths(rounded) != hundredths(e24[i]))
            departures.insert(e24[i]);
    }
    CHECK(departures == std::set<double>{2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2});
}

TEST_CASE("E24 is not a subset of E96", "[series]")
{
    // Only six E24 values are also E96 values; 1.2, 4.7, 2.2... are not.
    const auto e24 = tauline::seriesTable(ValueSeries::E24);
    const auto e96 = tauline::seriesTable(ValueSeries::E96);
    std::set<long> in96;
    for (double v : e96)
        in96.insert(hundredths(v));
    std::set<double> shared;
    for (double v : e24)
        if (in96.count(hundredths(v)))
            shared.insert(v);
    CHECK(shared == std::set<double>{1.0, 1.1, 1.3, 1.5, 2.0, 7.5});
}

TEST_CASE("Nearest value and steps across decades", "[series]")
{
    CHECK(tauline::nearestInSeries(4800.0, ValueSeries::E24) == Approx(4700.0));
    CHECK(tauline::nearestInSeries(5000.0, ValueSeries::E24) == Approx(5100.0));
    CHECK(tauline::nearestInSeries(4800.0, ValueSeries::E96) == Approx(4750.0));
    CHECK(tauline::nearestInSeries(4820.0, ValueSeries::E96) == Approx(4870.0));
    CHECK(tauline::nearestInSeries(0.97e-9, ValueSeries::E12) == Approx(1.0e-9));

    CHECK(tauline::stepUp(4700.0, ValueSeries::E24) == Approx(5100.0));
    CHECK(tauline::stepDown(4700.0, ValueSeries::E24) == Approx(4300.0));
    CHECK(tauline::stepUp(9100.0, ValueSeries::E24) == Approx(10000.0));
    CHECK(tauline::stepDown(1000.0, ValueSeries::E24) == Approx(910.0));
    CHECK(tauline::stepUp(2.2e-9, ValueSeries::E12, 3) == Approx(3.9e-9));
    CHECK(tauline::stepUp(9.76e3, ValueSeries::E96) == Approx(10.0e3));
    // Off the series, the first step goes to the neighbour in that direction.
    CHECK(tauline::stepUp(4750.0, ValueSeries::E24) == Approx(5100.0));
    CHECK(tauline::stepDown(4750.0, ValueSeries::E24) == Approx(4700.0));
    // 24 steps of E24 are exactly one decade.
    CHECK(tauline::stepUp(330.0, ValueSeries::E24, 24) == Approx(3300.0));
    CHECK(tauline::stepDown(330.0, ValueSeries::E24, 48) == Approx(3.3));

    CHECK(tauline::seriesFromName("E96") == ValueSeries::E96);
    CHECK_FALSE(tauline::seriesFromName("E48").has_value());
}
