#include "Analysis.h"

#include "BreakpointTable.h"
#include "ExactResponse.h"
#include "NodalModel.h"
#include "RootPolynomial.h"
#include "TimeConstantEngine.h"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace tauline {

std::complex<double> Analysis::evaluate(std::complex<double> s) const
{
    return evaluateFactored(gainConstant, originPower, zeros, poles, s);
}

std::complex<double> Analysis::atHz(double hz) const
{
    return evaluate({0.0, 2.0 * std::numbers::pi * hz});
}

Analysis analyze(const Network& network)
{
    const NodalModel model = buildNodalModel(network);
    const ExactResponse exact = solveExact(model);
    const TimeConstantEngine engine(model, exact);

    Analysis a;
    a.kind = network.response.kind;
    a.warnings = model.warnings;
    a.poles = exact.poles;
    a.zeros = exact.zeros;
    a.numerator = exact.numerator;
    a.denominator = exact.denominator;
    a.order = static_cast<int>(exact.denominator.size()) - 1;
    a.dc = exact.dc;
    a.hf = exact.hf;
    a.gainConstant = exact.gainConstant;
    a.originPower = exact.originPower;
    a.timeConstants = engine.firstOrder();
    a.pairTimeConstants = engine.secondOrder();
    a.breakpoints = breakpointTable(exact.poles, exact.zeros, exact.numerator, exact.denominator);
    return a;
}

std::vector<double> logSpacedHz(double fromHz, double toHz, int points)
{
    std::vector<double> out;
    if (points <= 1) {
        out.push_back(fromHz);
        return out;
    }
    const double step = std::log10(toHz / fromHz) / (points - 1);
    for (int k = 0; k < points; ++k)
        out.push_back(fromHz * std::pow(10.0, k * step));
    out.back() = toHz;
    return out;
}

std::vector<SweepPoint> sweep(const Analysis& analysis, std::vector<double> hz)
{
    std::sort(hz.begin(), hz.end());
    hz.erase(std::unique(hz.begin(), hz.end()), hz.end());
    std::vector<SweepPoint> out;
    out.reserve(hz.size());
    for (double f : hz) {
        SweepPoint p;
        p.hz = f;
        p.value = analysis.evaluate({0.0, 2.0 * std::numbers::pi * f});
        p.db = 20.0 * std::log10(std::abs(p.value));
        p.deg = std::arg(p.value) * 180.0 / std::numbers::pi;
        if (p.deg <= -180.0)
            p.deg += 360.0;
        out.push_back(p);
    }
    return out;
}

}  // namespace tauline
