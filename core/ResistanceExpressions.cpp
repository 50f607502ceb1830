#include "ResistanceExpressions.h"

#include "ResistanceExpressionReduction.h"

#include <map>

namespace tauline {

namespace {

using Type = ReductionBranch::Type;

struct NodeNumbers {
    std::map<std::string, int> index;
    int of(const std::string& name) { return index.emplace(name, static_cast<int>(index.size())).first->second; }
};

ReductionBranch ideal(Type type, int a, int b)
{
    ReductionBranch out;
    out.type = type;
    out.a = a;
    out.b = b;
    return out;
}

}  // namespace

std::string tauExpressionText(const std::string& element, const ResistanceExpression& e)
{
    switch (e.kind()) {
    case ResistanceExpression::Kind::Short: return "0";
    case ResistanceExpression::Kind::Open: return "\u221E";
    case ResistanceExpression::Kind::Series:
    case ResistanceExpression::Kind::Parallel: return element + " \u00B7 (" + e.text() + ")";
    default: return element + " \u00B7 " + e.text();
    }
}

std::string TimeConstantExpression::tauText() const
{
    return seen ? tauExpressionText(element, *seen) : "no series\u2013parallel form";
}

std::string TimeConstantExpression::nullTauText() const
{
    if (!nullDefined)
        return "undefined";
    return nulled ? tauExpressionText(element, *nulled) : "no series\u2013parallel form";
}

std::vector<TimeConstantExpression> timeConstantExpressions(const Network& network, const Analysis& analysis)
{
    NodeNumbers nodes;
    std::vector<ReductionBranch> resistors;
    std::map<std::string, const Part*> capacitors;
    for (const Part& part : network.parts) {
        const int a = nodes.of(part.nodes[0]);
        const int b = nodes.of(part.nodes[1]);
        if (part.kind == PartKind::Resistor) {
            ReductionBranch r;
            r.a = a;
            r.b = b;
            r.resistance = ResistanceExpression::part(part.name, part.value);
            resistors.push_back(std::move(r));
        } else if (part.kind == PartKind::Capacitor) {
            capacitors[part.name] = &part;
        }
    }
    const ResponseSpec& response = network.response;
    const int in0 = nodes.of(response.input[0]);
    const int in1 = nodes.of(response.input[1]);
    const bool impedance = response.kind == ResponseKind::Impedance;
    const int out0 = impedance ? in0 : nodes.of(response.output[0]);
    const int out1 = impedance ? in1 : nodes.of(response.output[1]);

    // Input zeroed: a voltage source becomes a short, a current source an
    // open circuit (nothing to add).
    std::vector<ReductionBranch> opened = resistors;
    if (response.kind == ResponseKind::VoltageGain)
        opened.push_back(ideal(Type::Short, in0, in1));
    // Response nulled: the output a nullator, the input a norator. For an
    // impedance both sit on the port, which makes it a short.
    std::vector<ReductionBranch> nulledBranches = resistors;
    nulledBranches.push_back(ideal(Type::Nullator, out0, out1));
    nulledBranches.push_back(ideal(Type::Norator, in0, in1));
    const bool nullDefined =
        impedance || (analysis.dc.kind == LimitKind::Finite && analysis.dc.value != 0.0);

    std::vector<TimeConstantExpression> out;
    for (const auto& tc : analysis.timeConstants) {
        TimeConstantExpression e;
        e.element = tc.element;
        e.nullDefined = nullDefined;
        const auto found = capacitors.find(tc.element);
        if (found != capacitors.end()) {
            const Part& c = *found->second;
            e.farads = c.value;
            const int a = nodes.index.at(c.nodes[0]);
            const int b = nodes.index.at(c.nodes[1]);
            const int count = static_cast<int>(nodes.index.size());
            e.seen = reduceTwoTerminal(count, opened, a, b);
            // Where the engine finds no finite null resistance (a transfer
            // whose null injection has no unique solution, say), the
            // expression follows it rather than contradict the table.
            if (nullDefined)
                e.nulled = tc.rNull ? reduceTwoTerminal(count, nulledBranches, a, b) : ResistanceExpression::open();
        }
        out.push_back(std::move(e));
    }
    return out;
}

}  // namespace tauline
