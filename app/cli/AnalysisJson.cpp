#include "AnalysisJson.h"

#include "HazardCaution.h"

#include <cmath>

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

ordered_json timeConstantsJson(const Analysis& a)
{
    ordered_json out = ordered_json::array();
    for (const auto& tc : a.timeConstants) {
        ordered_json entry;
        entry["element"] = tc.element;
        entry["tau_s"] = numberOrNull(tc.tau);
        entry["r_ohms"] = numberOrNull(tc.r);
        entry["tau_null_s"] = numberOrNull(tc.tauNull);
        entry["r_null_ohms"] = numberOrNull(tc.rNull);
        entry["tau_state"] = tc.tau ? "finite" : "infinite";
        entry["tau_null_state"] = nullTimeConstantState(a, tc);
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
        if (bp.q)
            entry["q"] = *bp.q;
        entry["root"] = {{"re", bp.root.real()}, {"im", bp.root.imag()}};
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
    out["time_constants"] = timeConstantsJson(a);
    out["breakpoints"] = breakpointsJson(a);
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
