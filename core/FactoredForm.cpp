#include "FactoredForm.h"

#include "ValueParser.h"

#include <cmath>
#include <cstdio>
#include <limits>
#include <numbers>

namespace tauline {

namespace {

constexpr double kSameRoot = 1e-9;

std::string number(double value, int digits = 4)
{
    char buffer[64];
    std::snprintf(buffer, sizeof buffer, "%.*g", digits, value);
    return buffer;
}

std::string power(int m)
{
    static const char* const superscripts[] = {"", "", "\u00B2", "\u00B3", "\u2074", "\u2075",
                                               "\u2076", "\u2077", "\u2078", "\u2079"};
    return m >= 0 && m < 10 ? superscripts[m] : "^" + std::to_string(m);
}

std::string factorText(const FactoredTerm& t)
{
    const char* sign = t.rightHalfPlane ? " \u2212 " : " + ";
    if (!t.quadratic)
        return std::string("(1") + sign + "s/" + t.label + ")";
    const std::string q = "Q" + t.label.substr(2);  // "ωp1" (ω is two bytes) → "Qp1"
    if (!std::isfinite(t.q))
        return "(1 + (s/" + t.label + ")\u00B2)";
    return std::string("(1") + sign + "s/(" + q + "\u00B7" + t.label + ") + (s/" + t.label + ")\u00B2)";
}

std::string product(const std::vector<FactoredTerm>& terms)
{
    std::string out;
    for (const auto& t : terms)
        out += (out.empty() ? "" : "\u00B7") + factorText(t);
    return out;
}

}  // namespace

FactoredForm factoredForm(const Analysis& analysis, const std::vector<TimeConstantExpression>& expressions)
{
    FactoredForm form;
    form.kind = analysis.kind;
    form.constant = analysis.gainConstant;
    form.originPower = analysis.originPower;

    std::vector<bool> poleUsed(analysis.timeConstants.size(), false);
    std::vector<bool> zeroUsed(analysis.timeConstants.size(), false);
    auto nameOf = [&](RootType type, double omega) -> std::string {
        auto& used = type == RootType::Pole ? poleUsed : zeroUsed;
        for (size_t k = 0; k < analysis.timeConstants.size() && k < expressions.size(); ++k) {
            const auto& tc = analysis.timeConstants[k];
            const auto& tau = type == RootType::Pole ? tc.tau : tc.tauNull;
            const auto& resistance = type == RootType::Pole ? expressions[k].seen : expressions[k].nulled;
            if (used[k] || !tau || !(*tau > 0.0) || !resistance)
                continue;
            if (std::abs(omega * *tau - 1.0) <= kSameRoot) {
                used[k] = true;
                const std::string tauText = type == RootType::Pole ? expressions[k].tauText()
                                                                   : expressions[k].nullTauText();
                return "1/(" + tauText + ")";
            }
        }
        return "";
    };

    for (size_t k = 0; k < analysis.breakpoints.size(); ++k) {
        const Breakpoint& bp = analysis.breakpoints[k];
        FactoredTerm t;
        t.type = bp.type;
        t.breakpoint = static_cast<int>(k);
        t.omega = std::abs(bp.root);
        t.quadratic = bp.q.has_value();
        t.rightHalfPlane = bp.root.real() > 0.0;
        if (t.quadratic)
            t.q = *bp.q;
        auto& list = bp.type == RootType::Pole ? form.poles : form.zeros;
        t.label = std::string("\u03C9") + (bp.type == RootType::Pole ? "p" : "z") + std::to_string(list.size() + 1);
        if (!t.quadratic && !t.rightHalfPlane)
            t.expression = nameOf(bp.type, t.omega);
        list.push_back(t);
    }
    return form;
}

std::string FactoredForm::formula() const
{
    std::string lead;
    const bool ohms = kind != ResponseKind::VoltageGain;
    const double magnitude = std::abs(constant);
    const std::string sign = constant < 0.0 ? "\u2212" : "";
    if (originPower == 0) {
        lead = ohms ? sign + formatQuantity(magnitude, "\u03A9") : sign + number(magnitude);
    } else if (!ohms) {
        lead = sign + (originPower > 0 ? "(s/\u03C9o)" + power(originPower) : "(\u03C9o/s)" + power(-originPower));
    } else if (originPower == 1) {
        lead = sign + "s\u00B7" + formatQuantity(magnitude, "H");  // K·s: an inductance's impedance
    } else if (originPower == -1) {
        lead = sign + "1/(s\u00B7" + formatQuantity(1.0 / magnitude, "F") + ")";  // K/s = 1/(s·C)
    } else {
        lead = sign + number(magnitude) + "\u00B7s" + power(originPower);
    }
    const std::string top = product(zeros);
    const std::string bottom = product(poles);
    std::string out = "H(s) = " + lead;
    if (!top.empty())
        out += " \u00B7 " + top;
    if (!bottom.empty())
        out += " / " + (poles.size() > 1 ? "[" + bottom + "]" : bottom);
    return out;
}

std::vector<std::string> FactoredForm::definitions() const
{
    std::vector<std::string> out;
    if (originPower != 0 && kind == ResponseKind::VoltageGain)
        out.push_back("\u03C9o = " + formatQuantity(std::pow(std::abs(constant), -1.0 / originPower), "rad/s"));
    auto describe = [&](const FactoredTerm& t) {
        std::string line = t.label + " = ";
        if (!t.expression.empty())
            line += t.expression + " = ";
        line += formatQuantity(t.omega, "rad/s") + " (" + formatQuantity(t.omega / (2.0 * std::numbers::pi), "Hz") + ")";
        if (t.quadratic)
            line += ", Q" + t.label.substr(2) + " = " + (std::isfinite(t.q) ? number(t.q, 3) : "\u221E");
        if (t.rightHalfPlane)
            line += ", right half-plane";
        out.push_back(line);
    };
    for (const auto& t : zeros)
        describe(t);
    for (const auto& t : poles)
        describe(t);
    return out;
}

std::string FactoredForm::text() const
{
    std::string out = formula() + "\n";
    for (const auto& line : definitions())
        out += "  " + line + "\n";
    return out;
}

std::vector<std::string> cornerExpressions(const FactoredForm& form, std::size_t breakpointCount)
{
    std::vector<std::string> out(breakpointCount);
    for (const auto* list : {&form.zeros, &form.poles})
        for (const auto& t : *list)
            if (t.breakpoint >= 0 && static_cast<std::size_t>(t.breakpoint) < breakpointCount)
                out[t.breakpoint] = t.expression;
    return out;
}

}  // namespace tauline
