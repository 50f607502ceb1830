// The corner table and the time-constant list against the engine's result
// for the same network read from a file.
#include "CornerSensitivity.h"
#include "CornerTable.h"
#include "NetworkFile.h"
#include "QuantityText.h"
#include "TimeConstantTable.h"

#include <catch2/catch.hpp>

using namespace tauline::ui;

namespace {

const char* const kSample = TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline";

tauline::Network networkOf(const char* text)
{
    return tauline::parseNetworkText(text, "test network").network;
}

}  // namespace

TEST_CASE("The corner table lists the engine's corners for a network read from a file", "[plot][table]")
{
    const tauline::Network network = tauline::readNetworkFile(kSample).network;
    const tauline::Analysis a = tauline::analyze(network);
    REQUIRE(a.breakpoints.size() >= 3);
    CornerTable table;
    table.setAnalysis(a);
    REQUIRE(table.rowCount() == static_cast<int>(a.breakpoints.size()));
    for (int row = 0; row < table.rowCount(); ++row) {
        const auto& corner = a.breakpoints[row];
        CHECK(table.item(row, CornerTable::FrequencyColumn)->data(CornerTable::HzRole).toDouble() == corner.hz);
        CHECK(table.item(row, CornerTable::FrequencyColumn)->text() == frequencyText(corner.hz));
        CHECK(table.item(row, CornerTable::EstimateColumn)->data(CornerTable::HzRole).toDouble()
              == corner.estimateHz);
        CHECK(table.item(row, CornerTable::ErrorColumn)->text() == percentText(corner.estimateError));
        CHECK(table.item(row, CornerTable::TypeColumn)->text().startsWith(
            corner.type == tauline::RootType::Pole ? QStringLiteral("pole") : QStringLiteral("zero")));
        CHECK(table.item(row, CornerTable::SeparationColumn)->text().contains(QStringLiteral("⚠"))
              == corner.poorlySeparated);
    }

    // The parts column follows the sensitivities worked out for this network.
    const auto sensitivities = tauline::cornerSensitivities(network, a);
    table.setSensitivities(sensitivities);
    for (int row = 0; row < table.rowCount(); ++row) {
        QStringList expected;
        for (const auto& part : tauline::dominantParts(sensitivities[row]))
            expected << QString::fromStdString(part.part);
        CHECK(!expected.isEmpty());
        CHECK(table.partsForCorner(row) == expected);
        CHECK(table.item(row, CornerTable::PartsColumn)->data(CornerTable::PartsRole).toStringList() == expected);
    }
}

TEST_CASE("Selecting a corner reports its index and the parts that set it", "[plot][table]")
{
    // 10 kΩ across 2.2 nF: one pole, set by both parts equally.
    const tauline::Network network = networkOf(R"({
      "format": "tauline-network", "version": 1,
      "parts": [
        {"name": "R1", "kind": "resistor",  "value": "10k", "nodes": ["p", "gnd"]},
        {"name": "C1", "kind": "capacitor", "value": "2n2", "nodes": ["p", "gnd"]}],
      "response": {"kind": "impedance", "port": ["p", "gnd"]}})");
    const tauline::Analysis a = tauline::analyze(network);
    CornerTable table;
    table.setAnalysis(a);
    table.setSensitivities(tauline::cornerSensitivities(network, a));
    int selected = -2;
    QStringList parts;
    QObject::connect(&table, &CornerTable::cornerSelected, [&](int index, const QStringList& p) {
        selected = index;
        parts = p;
    });
    table.selectCorner(0);
    CHECK(selected == 0);
    parts.sort();
    CHECK(parts == QStringList({"C1", "R1"}));
    // A new analysis with fewer corners drops the selection and says so.
    table.setAnalysis(tauline::Analysis{});
    CHECK(selected == -1);
}

TEST_CASE("The time-constant list shows each part's time constant and resistance", "[plot][table]")
{
    const tauline::Analysis a = tauline::analyze(tauline::readNetworkFile(kSample).network);
    TimeConstantTable table;
    table.setAnalysis(a);
    REQUIRE(table.topLevelItemCount() == static_cast<int>(a.timeConstants.size()));
    for (int i = 0; i < table.topLevelItemCount(); ++i) {
        const auto* row = table.topLevelItem(i);
        const auto& tc = a.timeConstants[i];
        CHECK(row->text(TimeConstantTable::PartColumn) == QString::fromStdString(tc.element));
        CHECK(row->text(TimeConstantTable::TauColumn) == secondsText(tc.tau));
        CHECK(row->text(TimeConstantTable::ResistanceColumn) == ohmsText(tc.r));
        CHECK(row->text(TimeConstantTable::NullTauColumn) == secondsText(tc.tauNull));
        // Second-order constants: one per other reactive part.
        CHECK(row->childCount() == static_cast<int>(a.timeConstants.size()) - 1);
    }
}

TEST_CASE("Infinite time constants show as ∞ and undefined null ones as —", "[plot][table]")
{
    SECTION("a capacitor behind a resistor, seen from an open port, sees no finite resistance")
    {
        const tauline::Analysis a = tauline::analyze(networkOf(R"({
          "format": "tauline-network", "version": 1,
          "parts": [
            {"name": "R1", "kind": "resistor",  "value": "1k",   "nodes": ["p", "a"]},
            {"name": "C1", "kind": "capacitor", "value": "100n", "nodes": ["a", "gnd"]}],
          "response": {"kind": "impedance", "port": ["p", "gnd"]}})"));
        TimeConstantTable table;
        table.setAnalysis(a);
        REQUIRE(table.topLevelItemCount() == 1);
        CHECK(table.topLevelItem(0)->text(TimeConstantTable::TauColumn) == kInfiniteText);
        CHECK(table.topLevelItem(0)->text(TimeConstantTable::ResistanceColumn) == kInfiniteText);
        // Port shorted: C1 sees R1, tau = 1 kΩ * 100 nF = 100 µs.
        CHECK(table.topLevelItem(0)->text(TimeConstantTable::NullTauColumn) == QStringLiteral("100 µs"));
    }
    SECTION("a high-pass divider has no dc value to null against")
    {
        const tauline::Analysis a = tauline::analyze(networkOf(R"({
          "format": "tauline-network", "version": 1,
          "parts": [
            {"name": "C1", "kind": "capacitor", "value": "1u",  "nodes": ["in", "out"]},
            {"name": "R1", "kind": "resistor",  "value": "10k", "nodes": ["out", "gnd"]}],
          "response": {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]}})"));
        TimeConstantTable table;
        table.setAnalysis(a);
        REQUIRE(table.topLevelItemCount() == 1);
        CHECK(table.topLevelItem(0)->text(TimeConstantTable::TauColumn) == QStringLiteral("10 ms"));
        CHECK(table.topLevelItem(0)->text(TimeConstantTable::NullTauColumn) == kUndefinedText);
    }
}

TEST_CASE("Close corners show their pair's f0 and Q in the corner table", "[plot][table][lowq]")
{
    // Two equal RC sections in cascade: 1 + 3x + x² with x = sRC, so the pair
    // has f0 = 1/(2πRC) and Q = 1/3 (exact roots of the quadratic; the
    // low-Q reading of Erickson & Maksimović, Fundamentals of Power
    // Electronics, 3rd ed., ch. 8).
    const tauline::Network network = networkOf(R"({
      "format": "tauline-network", "version": 1,
      "parts": [
        {"name": "R1", "kind": "resistor", "value": "10k", "nodes": ["in", "a"]},
        {"name": "C1", "kind": "capacitor", "value": "10n", "nodes": ["a", "gnd"]},
        {"name": "R2", "kind": "resistor", "value": "10k", "nodes": ["a", "out"]},
        {"name": "C2", "kind": "capacitor", "value": "10n", "nodes": ["out", "gnd"]}
      ],
      "response": {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]}
    })");
    const tauline::Analysis a = tauline::analyze(network);
    REQUIRE(a.breakpoints.size() == 2);
    CornerTable table;
    table.setAnalysis(a);
    const double f0 = 1.0 / (2.0 * 3.14159265358979323846 * 10e3 * 10e-9);
    const QString expected = QStringLiteral("pair: f0 %1, Q 0.33").arg(frequencyText(f0));
    for (int row = 0; row < 2; ++row)
        CHECK(table.item(row, CornerTable::SeparationColumn)->text().contains(expected));
}
