#include "CornerPlacement.h"

#include "CornerSensitivity.h"
#include "Errors.h"
#include "ValueParser.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>

namespace tauline {

namespace {

// Newton stops when the corner is this close to the target (relative).
constexpr double kConverged = 1e-13;
// Each step may move the corner by at most this much in ln f as predicted,
// and the part by at most a factor 100, so the prediction that follows the
// corner stays good.
constexpr double kMaxPredictedMove = 0.7;
constexpr double kMaxPartMove = 4.605170185988091;  // ln 100
// How far the search may take the part (ln of a factor 1e9 either way):
// values beyond that are no longer a design.
constexpr double kReach = 20.72326583694641;  // ln 1e9
constexpr int kMaxAnalyses = 600;
constexpr int kMaxHalvings = 40;
// Where the corner stops moving (|d ln f / d ln x| below this), it has
// reached its limit for this part.
constexpr double kSaturated = 1e-4;

// The corner at one value of the part.
struct Sample {
    double u = 0.0;      // ln of the part value
    double lnf = 0.0;    // ln of the corner frequency
    double slope = 0.0;  // d ln f / d ln x there (exact)
    int index = -1;      // into breakpoints
    Breakpoint corner;
    std::vector<Breakpoint> all;
};

enum class Lost { None, Unanalysable, Vanished, Meets, Merges, Limit, Steps };

struct Step {
    std::optional<Sample> sample;
    Lost lost = Lost::None;
    double u = 0.0;                     // where it was lost
    std::optional<Breakpoint> other;    // the corner it met
    std::string why;                    // the engine's message
};

std::string hzText(double hz)
{
    return formatQuantity(hz, "Hz", 4);
}

class CornerFollower {
public:
    CornerFollower(const Network& network, std::size_t part) : network_(network), part_(part) {}

    int analyses() const { return analyses_; }

    std::optional<Sample> start(const Analysis& a, int corner, double u)
    {
        Sample s = sampleOf(a, corner, u);
        const auto slope = exactCornerSensitivity(network_, s.corner, part_);
        s.slope = slope ? *slope : 0.0;
        return s;
    }

    // Follows the corner from `from` to the part value exp(target), in as
    // many steps as continuity needs.
    Step follow(const Sample& from, double target)
    {
        Sample current = from;
        while (current.u != target) {
            double du = target - current.u;
            const double limit =
                std::min(kMaxPartMove, kMaxPredictedMove / std::max(std::abs(current.slope), 1e-300));
            if (std::abs(du) > limit)
                du = std::copysign(limit, du);
            Step step;
            for (int halving = 0; halving <= kMaxHalvings; ++halving, du *= 0.5) {
                const double u = (std::abs(target - current.u) <= std::abs(du)) ? target : current.u + du;
                step = oneStep(current, u);
                if (step.sample || step.lost == Lost::Unanalysable || step.lost == Lost::Steps)
                    break;
            }
            if (!step.sample)
                return step;
            current = *step.sample;
        }
        Step done;
        done.sample = current;
        return done;
    }

private:
    static Sample sampleOf(const Analysis& a, int corner, double u)
    {
        Sample s;
        s.u = u;
        s.index = corner;
        s.corner = a.breakpoints[corner];
        s.lnf = std::log(s.corner.hz);
        s.all = a.breakpoints;
        return s;
    }

    Step oneStep(const Sample& from, double u)
    {
        Step step;
        step.u = u;
        if (++analyses_ > kMaxAnalyses) {
            step.lost = Lost::Steps;
            return step;
        }
        Network changed = network_;
        changed.parts[part_].value = std::exp(u);
        Analysis a;
        try {
            a = analyze(changed);
        } catch (const std::exception& e) {
            step.lost = Lost::Unanalysable;
            step.why = e.what();
            return step;
        }
        const double predicted = from.lnf + from.slope * (u - from.u);
        int best = -1;
        double d1 = std::numeric_limits<double>::infinity();
        double d2 = d1;
        for (std::size_t i = 0; i < a.breakpoints.size(); ++i) {
            if (a.breakpoints[i].type != from.corner.type)
                continue;
            const double d = std::abs(std::log(a.breakpoints[i].hz) - predicted);
            if (d < d1) {
                d2 = d1;
                d1 = d;
                best = static_cast<int>(i);
            } else if (d < d2) {
                d2 = d;
            }
        }
        const bool pairChanged = best >= 0 && a.breakpoints[best].q.has_value() != from.corner.q.has_value();
        if (best < 0 || !(d1 <= 0.35) || !(d1 <= 0.5 * d2) || pairChanged) {
            step.lost = best < 0 || !(d1 <= 0.35) ? Lost::Vanished : pairChanged ? Lost::Merges : Lost::Meets;
            // The corner it ran into: the nearest other one of its kind.
            double nearest = std::numeric_limits<double>::infinity();
            for (const auto& bp : from.all)
                if (bp.type == from.corner.type && std::abs(std::log(bp.hz) - from.lnf) > 1e-12 &&
                    std::abs(std::log(bp.hz) - from.lnf) < nearest) {
                    nearest = std::abs(std::log(bp.hz) - from.lnf);
                    step.other = bp;
                }
            return step;
        }
        Sample s = sampleOf(a, best, u);
        const auto slope = exactCornerSensitivity(changed, s.corner, part_);
        // On a double root the derivative does not exist: the local chord
        // stands in, so Newton still has a direction.
        s.slope = slope ? *slope : (u != from.u ? (s.lnf - from.lnf) / (u - from.u) : from.slope);
        step.sample = s;
        return step;
    }

    const Network& network_;
    std::size_t part_;
    int analyses_ = 0;
};

const char* typeName(RootType type)
{
    return type == RootType::Pole ? "pole" : "zero";
}

std::string cornerName(int index, const Breakpoint& corner)
{
    return "corner " + std::to_string(index + 1) + " (" + typeName(corner.type) + " at " + hzText(corner.hz) + ")";
}

[[noreturn]] void unreachable(const std::string& head, const Step& step, const Sample& last, const Part& part,
                              double targetHz)
{
    const std::string value = formatQuantity(std::exp(step.u), valueUnit(part.kind), 4);
    switch (step.lost) {
    case Lost::Unanalysable:
        throw InputError(head + ": with " + part.name + " = " + value + " the network cannot be analysed (" +
                         step.why + ")");
    case Lost::Meets:
        throw InputError(head + ": it meets " +
                         (step.other ? std::string("the ") + typeName(step.other->type) + " at " + hzText(step.other->hz)
                                     : std::string("another corner")) +
                         " near " + part.name + " = " + value + " and cannot pass it");
    case Lost::Merges:
        if (last.corner.q)
            throw InputError(head + ": near " + part.name + " = " + value + " the pair splits into two real " +
                             typeName(last.corner.type) + "s at about " + hzText(std::exp(last.lnf)) +
                             "; that is as far as it goes as one corner");
        throw InputError(head + ": near " + part.name + " = " + value + " it merges with " +
                         (step.other ? std::string("the ") + typeName(step.other->type) + " at " + hzText(step.other->hz)
                                     : std::string("its neighbour")) +
                         " into a complex pair at about " + hzText(std::exp(last.lnf)) +
                         "; that is as far as it goes as one corner");
    case Lost::Vanished:
        throw InputError(head + ": the corner vanishes near " + part.name + " = " + value +
                         " (its root cancels against the other kind, or leaves the network)");
    case Lost::Steps:
        throw InputError(head + ": the search did not settle; last at " + hzText(std::exp(last.lnf)) + " with " +
                         part.name + " = " + formatQuantity(std::exp(last.u), valueUnit(part.kind), 4));
    default: break;
    }
    throw InputError(head + ": the target " + hzText(targetHz) + " was not reached");
}

}  // namespace

std::optional<std::size_t> mostSensitivePart(const Network& network, const Analysis& analysis, int corner)
{
    if (corner < 0 || corner >= static_cast<int>(analysis.breakpoints.size()))
        return std::nullopt;
    const auto all = cornerSensitivities(network, analysis);
    const auto& parts = all[corner].parts;
    for (const auto& p : parts) {
        if (p.value == 0.0)
            break;
        for (std::size_t i = 0; i < network.parts.size(); ++i)
            if (network.parts[i].name == p.part)
                return i;
    }
    return std::nullopt;
}

CornerPlacement placeCorner(const Network& network, const PlacementRequest& request)
{
    const Analysis base = analyze(network);
    const int count = static_cast<int>(base.breakpoints.size());
    if (count == 0)
        throw InputError("the response has no corners to place");
    if (request.corner < 0 || request.corner >= count)
        throw InputError("there is no corner " + std::to_string(request.corner + 1) + ": the response has " +
                         std::to_string(count) + (count == 1 ? " corner" : " corners") + ", numbered 1 to " +
                         std::to_string(count) + " from low to high frequency");
    if (!(request.targetHz > 0.0) || !std::isfinite(request.targetHz))
        throw InputError("the target frequency must be positive and finite");

    const Breakpoint& corner = base.breakpoints[request.corner];
    const std::string head = "cannot move " + cornerName(request.corner, corner) + " to " + hzText(request.targetHz);

    std::size_t part = 0;
    if (request.part) {
        auto it = std::find_if(network.parts.begin(), network.parts.end(),
                               [&](const Part& p) { return p.name == *request.part; });
        if (it == network.parts.end())
            throw InputError("there is no part named " + *request.part);
        part = static_cast<std::size_t>(it - network.parts.begin());
        if (it->kind != PartKind::Resistor && it->kind != PartKind::Capacitor)
            throw InputError("part " + it->name + ": only resistors and capacitors can be varied");
    } else {
        const auto chosen = mostSensitivePart(network, base, request.corner);
        if (!chosen)
            throw InputError(head + ": no part moves this corner");
        part = *chosen;
    }
    const Part& varied = network.parts[part];

    CornerFollower follower(network, part);
    const double u0 = std::log(varied.value);
    Sample current = *follower.start(base, request.corner, u0);
    if (std::abs(current.slope) < 1e-9)
        throw InputError(head + ": " + varied.name + " does not move this corner (its sensitivity is 0)");

    CornerPlacement out;
    out.part = varied.name;
    out.kind = varied.kind;
    out.startValue = varied.value;
    out.startHz = corner.hz;
    out.targetHz = request.targetHz;
    out.corner = request.corner;
    out.type = corner.type;
    out.sensitivity = current.slope;
    out.series = request.series;

    const double goal = std::log(request.targetHz);
    auto g = [&](const Sample& s) { return s.lnf - goal; };

    // Without a bracket: Newton steps, each at most a factor 100 in the part,
    // until the target is passed, reached, or the corner stops moving.
    std::optional<Sample> other;  // the far end of the bracket, once there is one
    const double wanted = (goal - current.lnf) / current.slope > 0 ? 1.0 : -1.0;  // direction in u
    while (!other && std::abs(g(current)) > kConverged) {
        double du = -g(current) / current.slope;
        if (!(du * wanted > 0.0) || !std::isfinite(du)) {
            // The corner turned back before reaching the target: it peaks here.
            throw InputError(head + ": changing " + varied.name + " takes it no further than about " +
                             hzText(std::exp(current.lnf)) + " (reached with " + varied.name + " = " +
                             formatQuantity(std::exp(current.u), valueUnit(varied.kind), 4) + ")");
        }
        du = std::copysign(std::min(std::abs(du), kMaxPartMove), du);
        if (std::abs(current.u + du - u0) > kReach) {
            const double edge = u0 + wanted * kReach;
            const bool up = wanted > 0;
            if (std::abs(current.slope) < kSaturated) {
                // A limit on another corner is that corner: it cannot be passed.
                std::string beside;
                for (std::size_t i = 0; i < current.all.size(); ++i)
                    if (static_cast<int>(i) != current.index &&
                        std::abs(std::log(current.all[i].hz) - current.lnf) < 1e-3)
                        beside = ", where the " + std::string(typeName(current.all[i].type)) +
                                 " is: it cannot pass it";
                throw InputError(head + ": as " + varied.name + (up ? " grows" : " shrinks") +
                                 " the corner only approaches its limit of about " + hzText(std::exp(current.lnf)) +
                                 " (" + varied.name + (up ? " → ∞" : " → 0") + ")" + beside);
            }
            if (std::abs(current.u - edge) < 1e-9)
                throw InputError(head + ": it would need " + varied.name + (up ? " above " : " below ") +
                                 formatQuantity(std::exp(edge), valueUnit(varied.kind), 4) + " (a factor 10⁹ from its value), where "
                                 "the corner is still only at " + hzText(std::exp(current.lnf)));
            du = edge - current.u;
        }
        Step step = follower.follow(current, current.u + du);
        if (!step.sample)
            unreachable(head, step, current, varied, request.targetHz);
        if (g(*step.sample) * g(current) < 0.0)
            other = current;
        current = *step.sample;
    }

    // Bracketed: Newton inside [current, other], bisection where it leaves.
    while (other && std::abs(g(current)) > kConverged) {
        const double lo = std::min(current.u, other->u);
        const double hi = std::max(current.u, other->u);
        if (hi - lo <= 4.0 * std::numeric_limits<double>::epsilon() * std::max(1.0, std::abs(hi)))
            break;
        double u = current.u - g(current) / current.slope;
        if (!std::isfinite(u) || !(u > lo && u < hi))
            u = 0.5 * (lo + hi);
        Step step = follower.follow(current, u);
        if (!step.sample)
            unreachable(head, step, current, varied, request.targetHz);
        if (g(*step.sample) * g(current) < 0.0)
            other = current;
        current = *step.sample;
    }
    // Of the two ends, the one nearer the target.
    if (other && std::abs(g(*other)) < std::abs(g(current)))
        current = *other;

    out.value = std::exp(current.u);
    out.hz = std::exp(current.lnf);
    out.landingCorner = current.index;
    // The reported value is the one re-analysed: exp(ln x) may differ from
    // the sample's own value by rounding, so settle on the rounded double.
    {
        Step again = follower.follow(current, std::log(out.value));
        if (again.sample) {
            out.hz = again.sample->corner.hz;
            out.landingCorner = again.sample->index;
            current = *again.sample;
        }
    }

    std::vector<double> candidates;
    const double nearest = nearestInSeries(out.value, request.series);
    if (std::abs(nearest - out.value) <= 1e-9 * out.value) {
        candidates.push_back(nearest);
    } else {
        candidates.push_back(stepDown(out.value, request.series));
        candidates.push_back(stepUp(out.value, request.series));
    }
    for (double v : candidates) {
        PlacedValue placed;
        // The series value as the value parser reads its text ("8.2 nF", not
        // 8.199999999999999 nF from mantissa times decade), so it is the part
        // a user would type.
        placed.value = parseValue(formatQuantity(v, valueUnit(varied.kind), 3), varied.kind);
        placed.text = formatValue(placed.value, varied.kind);
        Step step = follower.follow(current, std::log(placed.value));
        if (step.sample) {
            placed.hz = step.sample->corner.hz;
            placed.corner = step.sample->index;
        }
        out.nearest.push_back(placed);
    }
    out.steps = follower.analyses();
    return out;
}

}  // namespace tauline
