#include "AnalysisJson.h"

#include "FactoredForm.h"
#include "HazardCaution.h"
#include "LowQPair.h"
#include "ResistanceExpressions.h"

#include <cmath>
#include <numbers>

namespace tauline::cli {

namespace {

using nlohmann::ordered_json;

// JSON has no infinity: an empty optional becomes null, and the caller adds
// a sibling field saying why.
ordered_json numberOrNull(const std::optional<double>& value)
{
    return value && std::isfinite(*value) ? ordered_json(*value) : ordered_json(nullptr);
}

ordered_json limitJson(const ResponseLimit& limit)
{
    ordered_json out;
    switch (limit.kind) {
    case LimitKind::Finite:
        out["limit"] = "finite";
        out["value"] = limit.value;
        break;
    case LimitKind::Zero:
        out["limit"] = "zero";
        out["value"] = 0.0;
        break;
    case LimitKind::Infinite:
        out["limit"] = "infinite";
        out["value"] = nullptr;
        break;
    }
    return out;
}

ordered_json rootsJson(const std::vector<std::complex<double>>& roots)
{
    ordered_json out = ordered_json::array();
    for (const auto& root : roots)
        out.push_back({{"re", root.real()}, {"im", root.imag()}});
    return out;
}

ordered_json expressionOrNull(const std::optional<ResistanceExpression>& e)
{
    return e ? ordered_json(e->text()) : ordered_json(nullptr);
}

ordered_json timeConstantsJson(const Analysis& a, const std::vector<TimeConstantExpression>& expressions)
{
    ordered_json out = ordered_json::array();
    for (size_t k = 0; k < a.timeConstants.size(); ++k) {
        const auto& tc = a.timeConstants[k];
        ordered_json entry;
        entry["element"] = tc.element;
        entry["tau_s"] = numberOrNull(tc.tau);
        entry["r_ohms"] = numberOrNull(tc.r);
        entry["tau_null_s"] = numberOrNull(tc.tauNull);
        entry["r_null_ohms"] = numberOrNull(tc.rNull);
        entry["tau_state"] = tc.tau ? "finite" : "infinite";
        entry["tau_null_state"] = nullTimeConstantState(a, tc);
        if (k < expressions.size()) {
            // In part names: "C1 · (R1 ∥ R2)"; r_expression the resistance
            // alone ("∞", "0", "bridge(…)" as the text says), null where the
            // state has no series–parallel form or is undefined.
            const auto& e = expressions[k];
            const bool undefined = entry["tau_null_state"] == "undefined";
            entry["expression"] = e.tauText();
            entry["expression_null"] = undefined ? std::string("undefined") : e.nullTauText();
            entry["r_expression"] = expressionOrNull(e.seen);
            entry["r_null_expression"] = undefined ? ordered_json(nullptr) : expressionOrNull(e.nulled);
            entry["series_parallel"] = e.seen.has_value() && e.seen->seriesParallel();
            entry["series_parallel_null"] = !undefined && e.nulled.has_value() && e.nulled->seriesParallel();
        }
        out.push_back(entry);
    }
    return out;
}

ordered_json pairTimeConstantsJson(const Analysis& a)
{
    ordered_json out = ordered_json::array();
    for (const auto& pair : a.pairTimeConstants) {
        ordered_json entry;
        entry["element"] = pair.element;
        entry["shorted"] = pair.shorted;
        entry["tau_s"] = numberOrNull(pair.tau);
        entry["r_ohms"] = numberOrNull(pair.r);
        entry["tau_state"] = pair.tau ? "finite" : "infinite";
        out.push_back(entry);
    }
    return out;
}

ordered_json breakpointsJson(const Analysis& a)
{
    ordered_json out = ordered_json::array();
    for (const auto& bp : a.breakpoints) {
        ordered_json entry;
        entry["type"] = bp.type == RootType::Pole ? "pole" : "zero";
        entry["hz"] = bp.hz;
        entry["estimate_hz"] = bp.estimateHz;
        entry["estimate_error"] = bp.estimateError;
        entry["poorly_separated"] = bp.poorlySeparated;
        if (bp.q) {
            // A pair on the jω axis (an ideal notch's zeros) has no damping.
            entry["q"] = std::isfinite(*bp.q) ? ordered_json(*bp.q) : ordered_json(nullptr);
            if (!std::isfinite(*bp.q))
                entry["q_limit"] = "infinite";
        }
        entry["root"] = {{"re", bp.root.real()}, {"im", bp.root.imag()}};
        out.push_back(entry);
    }
    return out;
}

ordered_json factoredJson(const FactoredForm& form)
{
    ordered_json out;
    out["text"] = form.formula();
    out["constant"] = form.constant;
    out["origin_power"] = form.originPower;
    auto terms = [](const std::vector<FactoredTerm>& list) {
        ordered_json array = ordered_json::array();
        for (const auto& t : list) {
            ordered_json entry;
            entry["label"] = t.label;
            entry["kind"] = t.quadratic ? "quadratic" : "real";
            entry["w_rad_s"] = t.omega;
            entry["hz"] = t.omega / (2.0 * std::numbers::pi);
            if (t.quadratic)
                entry["q"] = std::isfinite(t.q) ? ordered_json(t.q) : ordered_json(nullptr);
            entry["right_half_plane"] = t.rightHalfPlane;
            entry["breakpoint"] = t.breakpoint;
            entry["expression"] = t.expression.empty() ? ordered_json(nullptr) : ordered_json(t.expression);
            array.push_back(entry);
        }
        return array;
    };
    out["zeros"] = terms(form.zeros);
    out["poles"] = terms(form.poles);
    out["definitions"] = form.definitions();
    return out;
}

ordered_json pairsJson(const std::vector<LowQPair>& pairs)
{
    ordered_json out = ordered_json::array();
    for (const auto& p : pairs) {
        ordered_json entry;
        entry["type"] = p.type == RootType::Pole ? "pole" : "zero";
        entry["breakpoints"] = {p.lowBreakpoint, p.highBreakpoint};
        entry["w0_rad_s"] = p.omega0;
        entry["f0_hz"] = p.omega0Hz();
        entry["q"] = p.q;
        entry["hz"] = {p.exactLowHz, p.exactHighHz};
        entry["estimate_hz"] = {p.estimateLowHz, p.estimateHighHz};
        entry["estimate_error"] = {p.estimateLowError, p.estimateHighError};
        entry["low_q_hz"] = {p.lowQLowHz, p.lowQHighHz};
        entry["low_q_error"] = {p.lowQLowError, p.lowQHighError};
        if (p.quadraticLowHz) {
            entry["quadratic_hz"] = {*p.quadraticLowHz, *p.quadraticHighHz};
            entry["quadratic_error"] = {*p.quadraticLowError, *p.quadraticHighError};
        } else {
            entry["quadratic_hz"] = nullptr;
            entry["quadratic_error"] = nullptr;
        }
        entry["sketch_hz"] = p.sketchHz;
        out.push_back(entry);
    }
    return out;
}

}  // namespace

ordered_json analysisJson(const AnalysedFile& file)
{
    const Analysis& a = file.analysis;
    ordered_json out;
    out["response"] = responseKindName(a.kind);
    out["unit"] = responseUnit(a.kind);
    out["order"] = a.order;
    out["dc"] = limitJson(a.dc);
    out["hf"] = limitJson(a.hf);
    out["poles"] = rootsJson(a.poles);
    out["zeros"] = rootsJson(a.zeros);
    out["numerator"] = a.numerator;
    out["denominator"] = a.denominator;
    const auto expressions = timeConstantExpressions(file.loaded.network, a);
    out["time_constants"] = timeConstantsJson(a, expressions);
    out["breakpoints"] = breakpointsJson(a);
    out["factored"] = factoredJson(factoredForm(a, expressions));
    out["pairs"] = pairsJson(lowQPairs(a));
    out["pair_time_constants"] = pairTimeConstantsJson(a);
    out["gain_constant"] = a.gainConstant;
    out["origin_power"] = a.originPower;
    out["title"] = file.loaded.network.title;
    out["warnings"] = file.warnings();
    if (file.needsCaution())
        out["caution"] = hazardCautionText();
    return out;
}

}  // namespace tauline::cli
