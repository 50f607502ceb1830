#include "AnalysisText.h"

#include "BreakpointTable.h"
#include "FactoredForm.h"
#include "HazardCaution.h"
#include "LowQPair.h"
#include "ResistanceExpressions.h"
#include "TextTable.h"
#include "ValueParser.h"

#include <cmath>
#include <cstdio>
#include <numbers>

namespace tauline::cli {

namespace {

constexpr int kDigits = 4;

std::string general(double value)
{
    char buffer[64];
    std::snprintf(buffer, sizeof buffer, "%.6g", value);
    return buffer;
}

std::string describeResponse(const Network& network, const Analysis& a)
{
    const auto& r = network.response;
    std::string unit = std::string(" (") + unitSymbol(a.kind) + ")";
    switch (a.kind) {
    case ResponseKind::Impedance:
        return "impedance between " + r.input[0] + " and " + r.input[1] + unit;
    case ResponseKind::VoltageGain:
        return "voltage gain from " + r.input[0] + "/" + r.input[1] + " to " + r.output[0] + "/" + r.output[1] + unit;
    case ResponseKind::Transimpedance:
        return "transimpedance from current into " + r.input[0] + " (out of " + r.input[1] + ") to " + r.output[0] +
               "/" + r.output[1] + unit;
    }
    return "";
}

std::string describeLimit(const ResponseLimit& limit, ResponseKind kind, const char* zeroMeaning,
                          const char* infiniteMeaning)
{
    switch (limit.kind) {
    case LimitKind::Finite: {
        std::string text = formatQuantity(limit.value, unitSymbol(kind), kDigits);
        if (limit.value != 0.0)
            text += "  (" + fixedPoint(20.0 * std::log10(std::fabs(limit.value)), 2) +
                    (kind == ResponseKind::VoltageGain ? " dB)" : " dB\u03A9)");
        return text;
    }
    case LimitKind::Zero: return std::string("0 (") + zeroMeaning + ")";
    case LimitKind::Infinite: return std::string("infinite (") + infiniteMeaning + ")";
    }
    return "";
}

std::string rootText(std::complex<double> root)
{
    if (root.imag() == 0.0)
        return formatEngineering(root.real(), kDigits) + " rad/s";
    const std::string imaginary = "\u00B1 j" + formatEngineering(std::fabs(root.imag()), kDigits) + " rad/s";
    // A pair on the jω axis reads as such, not as "0 ± j…".
    return root.real() == 0.0 ? imaginary : formatEngineering(root.real(), kDigits) + " " + imaginary;
}

// A complex pair is shown once, as re ± j·im.
void writeRoots(std::ostream& out, const char* label, const std::vector<std::complex<double>>& roots)
{
    out << label;
    bool any = false;
    for (const auto& root : roots) {
        if (root.imag() < 0.0)
            continue;
        out << (any ? "\n" + std::string(displayWidth(label), ' ') : std::string()) << rootText(root);
        if (std::abs(root) > 0.0)
            out << "  (" << formatQuantity(std::abs(root) / (2.0 * std::numbers::pi), "Hz", kDigits) << ")";
        else
            out << "  (at the origin)";
        any = true;
    }
    out << (any ? "\n" : "none\n");
}

std::string coefficients(const std::vector<double>& values)
{
    std::string text;
    for (size_t i = 0; i < values.size(); ++i)
        text += (i == 0 ? "" : ", ") + general(values[i]);
    return text.empty() ? "none" : text;
}

std::string secondsOrInfinite(const std::optional<double>& value)
{
    return value ? formatQuantity(*value, "s", kDigits) : "\u221E";
}

std::string ohmsOrInfinite(const std::optional<double>& value)
{
    return value ? formatQuantity(*value, "\u03A9", kDigits) : "\u221E";
}

void writeTimeConstants(std::ostream& out, const Analysis& a)
{
    out << "\nTime constants (the other capacitors open; input zeroed | response nulled):\n";
    if (a.timeConstants.empty()) {
        out << "  none (no reactive parts)\n";
        return;
    }
    TextTable table({"part", "\u03C4", "R seen", "\u03C4 null", "R null"});
    for (const auto& tc : a.timeConstants) {
        std::string nullState = nullTimeConstantState(a, tc);
        bool undefined = nullState == "undefined";
        table.addRow({tc.element, secondsOrInfinite(tc.tau), ohmsOrInfinite(tc.r),
                      undefined ? "undefined" : secondsOrInfinite(tc.tauNull),
                      undefined ? "undefined" : ohmsOrInfinite(tc.rNull)});
    }
    table.print(out);
    if (a.kind != ResponseKind::Impedance && a.dc.kind != LimitKind::Finite)
        out << "  (null time constants are undefined where the dc value is zero or infinite)\n";
}

void writePairTimeConstants(std::ostream& out, const Analysis& a)
{
    if (a.pairTimeConstants.empty())
        return;
    out << "\nPair time constants (a part's \u03C4 with another part shorted):\n";
    TextTable table({"part", "shorted", "\u03C4", "R seen"});
    for (const auto& pair : a.pairTimeConstants)
        table.addRow({pair.element, pair.shorted, secondsOrInfinite(pair.tau), ohmsOrInfinite(pair.r)});
    table.print(out);
}

std::string signedPercent(double fraction)
{
    std::string percent = fixedPoint(100.0 * fraction, 1);
    if (percent == "-0.0")
        percent = "0.0";
    return (percent[0] == '-' ? "" : "+") + percent + " %";
}

void writeExpressions(std::ostream& out, const Analysis& a, const std::vector<TimeConstantExpression>& expressions)
{
    if (expressions.empty())
        return;
    out << "\nTime constants in part names (input zeroed | response nulled):\n";
    TextTable table({"part", "\u03C4", "", "\u03C4 null", ""});
    bool anyBridge = false;
    bool anyWithoutForm = false;
    for (size_t k = 0; k < expressions.size() && k < a.timeConstants.size(); ++k) {
        const auto& e = expressions[k];
        const auto& tc = a.timeConstants[k];
        const std::string nullState = nullTimeConstantState(a, tc);
        table.addRow({e.element, e.tauText(), secondsOrInfinite(tc.tau),
                      nullState == "undefined" ? "undefined" : e.nullTauText(),
                      nullState == "undefined" ? "" : secondsOrInfinite(tc.tauNull)});
        anyBridge = anyBridge || (e.seen && !e.seen->seriesParallel()) || (e.nulled && !e.nulled->seriesParallel());
        anyWithoutForm = anyWithoutForm || (e.nullDefined && !e.nulled && nullState != "undefined");
    }
    table.print(out);
    if (anyBridge)
        out << "  bridge(\u2026): that resistance is not series\u2013parallel; its branches are reduced as far as\n"
               "    they go, and the value beside it is exact.\n";
    if (anyWithoutForm)
        out << "  no series\u2013parallel form: the null state holds the output at zero through the input,\n"
               "    which no series or parallel step removes; the value beside it is exact.\n";
}

void writeFactoredForm(std::ostream& out, const FactoredForm& form)
{
    out << "\nFactored form (exact roots):\n  " << form.formula() << '\n';
    for (const auto& line : form.definitions())
        out << "    " << line << '\n';
}

void writeLowQPairs(std::ostream& out, const std::vector<LowQPair>& pairs)
{
    if (pairs.empty())
        return;
    out << "\nClose corners read as one quadratic (\u03C90 and Q from the time-constant sums;\n"
           "low-Q approximation, Erickson & Maksimovi\u0107, Fundamentals of Power Electronics, ch. 8):\n";
    TextTable table({"type", "exact", "f0", "Q", "simple estimate", "low-Q: Q\u00B7f0, f0/Q", "quadratic's roots"});
    auto both = [](double x, double y) { return signedPercent(x) + ", " + signedPercent(y); };
    for (const auto& p : pairs) {
        table.addRow({p.type == RootType::Pole ? "poles" : "zeros",
                      formatQuantity(p.exactLowHz, "Hz", kDigits) + ", " + formatQuantity(p.exactHighHz, "Hz", kDigits),
                      formatQuantity(p.omega0Hz(), "Hz", kDigits), fixedPoint(p.q, 3),
                      both(p.estimateLowError, p.estimateHighError), both(p.lowQLowError, p.lowQHighError),
                      p.quadraticLowError ? both(*p.quadraticLowError, *p.quadraticHighError)
                                          : std::string("Q \u2265 0.5: no real split")});
    }
    table.print(out);
    out << "  Errors are against the exact corners. Q\u00B7f0 and f0/Q are the simple estimates again\n"
           "  (a\u2096\u208B\u2081/a\u2096 and a\u2096/a\u2096\u208A\u2081); the factor F = (1 + \u221A(1 \u2212 4Q\u00B2))/2 "
           "moves them to the\n  quadratic's roots f0\u00B7Q/F and f0\u00B7F/Q.\n";
}

void writeBreakpoints(std::ostream& out, const Analysis& a)
{
    out << "\nBreakpoints (exact, and estimated from the time-constant sums):\n";
    if (a.breakpoints.empty()) {
        out << "  none\n";
        return;
    }
    TextTable table({"type", "exact", "estimate", "error", "q", ""});
    bool anyPoor = false;
    for (const auto& bp : a.breakpoints) {
        const std::string error = signedPercent(bp.estimateError);
        table.addRow({bp.type == RootType::Pole ? "pole" : "zero", formatQuantity(bp.hz, "Hz", kDigits),
                      formatQuantity(bp.estimateHz, "Hz", kDigits), error, bp.q ? qualityFactorText(*bp.q) : "",
                      bp.poorlySeparated ? "*" : ""});
        anyPoor = anyPoor || bp.poorlySeparated;
    }
    table.print(out);
    if (anyPoor)
        out << "  * estimate more than 10 % off: these corners are too close together for the\n"
               "    time-constant estimate; trust the exact column.\n";
}

}  // namespace

void writeAnalysisText(std::ostream& out, const AnalysedFile& file)
{
    const Network& network = file.loaded.network;
    const Analysis& a = file.analysis;
    if (!network.title.empty())
        out << network.title << '\n';
    out << "File:      " << file.path << '\n';
    out << "Response:  " << describeResponse(network, a) << '\n';
    out << "Order:     " << a.order << '\n';
    out << "DC:        " << describeLimit(a.dc, a.kind, "blocked at dc", "rises without limit towards dc") << '\n';
    out << "HF:        "
        << describeLimit(a.hf, a.kind, "falls without limit at high frequency", "rises without limit at high frequency")
        << '\n';
    writeRoots(out, "Poles:     ", a.poles);
    writeRoots(out, "Zeros:     ", a.zeros);
    out << "Numerator (ascending powers of s):   " << coefficients(a.numerator) << '\n';
    out << "Denominator (ascending powers of s): " << coefficients(a.denominator) << '\n';
    writeTimeConstants(out, a);
    const auto expressions = timeConstantExpressions(network, a);
    writeExpressions(out, a, expressions);
    writePairTimeConstants(out, a);
    writeFactoredForm(out, factoredForm(a, expressions));
    writeBreakpoints(out, a);
    writeLowQPairs(out, lowQPairs(a));

    auto warnings = file.warnings();
    if (!warnings.empty()) {
        out << "\nWarnings:\n";
        for (const auto& w : warnings)
            out << "  - " << w << '\n';
    }
    if (file.needsCaution())
        out << "\nCaution: " << hazardCautionText() << '\n';
}

}  // namespace tauline::cli
