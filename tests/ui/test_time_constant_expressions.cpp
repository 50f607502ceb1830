// The time-constant list with each time constant in part names, the
// factored form beneath it, and Copy putting all of it on the clipboard.
#include "Analysis.h"
#include "TimeConstantTable.h"

#include <catch2/catch.hpp>

#include <QAction>
#include <QApplication>
#include <QClipboard>
#include <QLabel>
#include <QTest>

using tauline::ui::TimeConstantTable;

namespace {

tauline::Part part(const char* name, tauline::PartKind kind, double value, const char* a, const char* b)
{
    tauline::Part p;
    p.name = name;
    p.kind = kind;
    p.value = value;
    p.nodes = {a, b};
    return p;
}

// A lead network: R1 ∥ C1 from in to out, R2 from out to gnd.
tauline::Network leadNetwork()
{
    using tauline::PartKind;
    tauline::Network n;
    n.parts = {part("R1", PartKind::Resistor, 47e3, "in", "out"), part("C1", PartKind::Capacitor, 1e-9, "in", "out"),
               part("R2", PartKind::Resistor, 4.7e3, "out", "gnd")};
    n.response.kind = tauline::ResponseKind::VoltageGain;
    n.response.input = {"in", "gnd"};
    n.response.output = {"out", "gnd"};
    return n;
}

}  // namespace

TEST_CASE("the time-constant list writes each time constant in part names", "[table][expression]")
{
    // Single-element forms, derived by hand from the definitions in R. D.
    // Middlebrook, "Null double injection and the extra element theorem",
    // IEEE Trans. Education 32(3), 1989: τd = C1·(R1 ∥ R2), τn = C1·R1.
    const tauline::Network net = leadNetwork();
    const tauline::Analysis a = tauline::analyze(net);
    TimeConstantTable table;
    table.setAnalysis(a, net);
    REQUIRE(table.topLevelItemCount() == 1);
    CHECK(table.topLevelItem(0)->text(TimeConstantTable::ExpressionColumn) == QStringLiteral("C1 · (R1 ∥ R2)"));
    CHECK(table.topLevelItem(0)->text(TimeConstantTable::NullExpressionColumn) == QStringLiteral("C1 · R1"));
    CHECK(table.factoredLabel()->text().startsWith(QStringLiteral("H(s) = ")));
    CHECK(table.factoredLabel()->text().contains(QStringLiteral("ωp1 = 1/(C1 · (R1 ∥ R2))")));

    // Without the network the expression columns are left empty, not stale.
    table.setAnalysis(a);
    CHECK(table.topLevelItem(0)->text(TimeConstantTable::ExpressionColumn).isEmpty());
    CHECK(table.factoredLabel()->text().isEmpty());
}

TEST_CASE("Copy puts the list and the factored form on the clipboard as plain text", "[table][expression]")
{
    const tauline::Network net = leadNetwork();
    const tauline::Analysis a = tauline::analyze(net);
    TimeConstantTable table;
    table.setAnalysis(a, net);
    const QString text = table.plainText();
    CHECK(text.contains(QStringLiteral("C1\t")));
    CHECK(text.contains(QStringLiteral("\tC1 · (R1 ∥ R2)\tC1 · R1")));
    CHECK(text.contains(QStringLiteral("H(s) = ")));

    // The standard Copy shortcut and the context menu's action are one.
    QAction* copy = nullptr;
    for (QAction* action : table.actions())
        if (action->shortcut() == QKeySequence(QKeySequence::Copy))
            copy = action;
    REQUIRE(copy);
    QApplication::clipboard()->clear();
    copy->trigger();
    CHECK(QApplication::clipboard()->text() == text);
}
