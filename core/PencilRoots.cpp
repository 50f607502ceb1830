#include "PencilRoots.h"

#include "EquilibratedLu.h"

#include <Eigen/Eigenvalues>
#include <algorithm>
#include <cmath>
#include <limits>
#include <stdexcept>

namespace tauline {

namespace {

constexpr double kInfiniteRatio = 1e11;   // |r|/σ beyond which μ is rounding noise
// A root computed at two shifts agrees with itself to this relative
// distance; rounding noise (an infinite root left finite) does not.
constexpr double kSameRoot = 1e-6;
// A multiple root at the origin comes out of an eigenvalue problem split by
// about ε^(1/m) of the shift; roots this far below lowRate are taken as that
// cluster (a real root there needs a bridge balanced to ~0.1 %).
constexpr double kOriginCluster = 1e-3;
constexpr double kDecadesPerShift = 2.0;
constexpr double kEpsilon = std::numeric_limits<double>::epsilon();
// Rayleigh refinement: steps at most, the relative change that ends it, and
// how far (relative) a root may move.
constexpr int kRayleighSteps = 4;
constexpr double kRayleighSettled = 1e-12;
constexpr double kRayleighWindow = 1e-2;
constexpr double kRayleighNoise = 1e-10;
constexpr double kAgreedClosely = 1e-12;

// Parlett–Reinsch balancing: a diagonal similarity by powers of two (exact
// in floating point) that evens out row and column norms. A transfer's K is
// far from normal (entries 1e5 times its eigenvalues were met), and an
// unbalanced eigensolver's error scales with the norm, not the eigenvalues.
void balance(Eigen::MatrixXd& k)
{
    const int n = static_cast<int>(k.rows());
    for (bool changed = true; changed;) {
        changed = false;
        for (int i = 0; i < n; ++i) {
            double c = 0.0;
            double r = 0.0;
            for (int j = 0; j < n; ++j)
                if (j != i) {
                    c += std::abs(k(j, i));
                    r += std::abs(k(i, j));
                }
            if (c == 0.0 || r == 0.0)
                continue;
            const double before = c + r;
            double f = 1.0;
            while (c < r / 2.0) {
                c *= 2.0;
                r /= 2.0;
                f *= 2.0;
            }
            while (c >= r * 2.0) {
                c /= 2.0;
                r *= 2.0;
                f /= 2.0;
            }
            if (c + r < 0.95 * before) {
                changed = true;
                k.row(i) /= f;
                k.col(i) *= f;
            }
        }
    }
}

// Eigenvalues μ of K for one shift; empty when A(σ) is singular there.
// `reactive` is P·diag(cap)·Pᵀ, formed once for all shifts.
using ExtendedMatrix = Eigen::Matrix<long double, Eigen::Dynamic, Eigen::Dynamic>;

// The reactive part P·diag(cap)·Pᵀ, in double and in extended precision.
struct Reactive {
    Eigen::MatrixXd value;
    ExtendedMatrix extended;
    ExtendedMatrix a0;
};

bool shiftedEigenvalues(const PencilRootProblem& p, const Reactive& reactive, double sigma,
                        std::vector<std::complex<double>>& mu)
{
    const Eigen::MatrixXd a = p.a0 + sigma * reactive.value;
    const EquilibratedLu<double> lu(a, reactive.a0 + static_cast<long double>(sigma) * reactive.extended);
    if (!lu.regular())
        return false;
    const Eigen::VectorXd root = p.capacitance.cwiseSqrt();
    const Eigen::MatrixXd scaledPorts = p.ports * root.asDiagonal();
    const Eigen::MatrixXd scaledLeft = p.leftPorts.size() ? Eigen::MatrixXd(p.leftPorts * root.asDiagonal()) : scaledPorts;
    // One step refined against A(σ) formed in extended precision: without
    // it the slowest zeros of some transfers drift past 1e-9, and near-
    // cancelling ones by 1e-8 (the rounded sums in A break the relations
    // they rest on). A second step made some badly conditioned shifts
    // worse: the double factors no longer contract the difference there.
    Eigen::MatrixXd k = scaledPorts.transpose() * lu.solve(scaledLeft, 1);
    mu.clear();
    if (p.symmetric) {
        k = 0.5 * (k + k.transpose());
        Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd> eig(k, Eigen::EigenvaluesOnly);
        for (int i = 0; i < eig.eigenvalues().size(); ++i)
            mu.emplace_back(eig.eigenvalues()(i), 0.0);
    } else {
        balance(k);
        Eigen::EigenSolver<Eigen::MatrixXd> eig(k, false);
        for (int i = 0; i < eig.eigenvalues().size(); ++i)
            mu.push_back(eig.eigenvalues()(i));
    }
    return true;
}

// Finite roots for one shift; false when A(σ) is singular there (a shift on
// a root, or σ·C swamping a conductive path to the reference).
bool rootsAtShift(const PencilRootProblem& p, const Reactive& reactive, double sigma,
                  std::vector<std::complex<double>>& roots)
{
    std::vector<std::complex<double>> mu;
    if (!shiftedEigenvalues(p, reactive, sigma, mu))
        return false;
    roots.clear();
    for (const auto& m : mu) {
        if (std::abs(m) * sigma * kInfiniteRatio < 1.0)
            continue;
        const std::complex<double> r = sigma - 1.0 / m;
        roots.push_back(r);
    }
    return true;
}

// One root as seen by successive shifts, from the top one down; a shift that
// saw it as infinite leaves a gap.
struct RootTrack {
    std::vector<std::complex<double>> value;  // per shift
    std::vector<bool> seen;
};

double relativeDistance(std::complex<double> a, std::complex<double> b)
{
    const double scale = std::max(std::abs(a), std::abs(b));
    return scale == 0.0 ? 1.0 : std::abs(a - b) / scale;  // two exact zeros say nothing
}

// Tracks started at the top shift; each lower shift's roots are paired with
// the tracks' latest values, nearest pairs first. A root no track takes
// starts a track of its own.
std::vector<RootTrack> followRoots(const std::vector<std::vector<std::complex<double>>>& perShift)
{
    const int shifts = static_cast<int>(perShift.size());
    std::vector<RootTrack> tracks;
    std::vector<std::complex<double>> latest;
    auto start = [&](int k, std::complex<double> r) {
        RootTrack t;
        t.value.assign(shifts, 0.0);
        t.seen.assign(shifts, false);
        t.value[k] = r;
        t.seen[k] = true;
        tracks.push_back(t);
        latest.push_back(r);
    };
    for (const auto& r : perShift.back())
        start(shifts - 1, r);
    for (int k = shifts - 2; k >= 0; --k) {
        const auto& list = perShift[k];
        struct Pair {
            double distance;
            int track;
            int root;
        };
        std::vector<Pair> pairs;
        for (int t = 0; t < static_cast<int>(tracks.size()); ++t)
            for (int i = 0; i < static_cast<int>(list.size()); ++i)
                pairs.push_back({std::abs(latest[t] - list[i]), t, i});
        std::sort(pairs.begin(), pairs.end(), [](const Pair& a, const Pair& b) { return a.distance < b.distance; });
        std::vector<bool> trackTaken(tracks.size(), false);
        std::vector<bool> rootTaken(list.size(), false);
        for (const Pair& p : pairs) {
            if (trackTaken[p.track] || rootTaken[p.root])
                continue;
            trackTaken[p.track] = rootTaken[p.root] = true;
            tracks[p.track].value[k] = list[p.root];
            tracks[p.track].seen[k] = true;
            latest[p.track] = list[p.root];
        }
        for (int i = 0; i < static_cast<int>(list.size()); ++i)
            if (!rootTaken[i])
                start(k, list[i]);
    }
    return tracks;
}

struct Settled {
    std::complex<double> value;
    bool confirmed = false;
    double agreement = 1.0;  // relative distance of the best pair of shifts
};

// The value where two neighbouring shifts agree best, from the one of the
// pair nearer the root (on a log scale); confirmed when they agree to
// kSameRoot. Unconfirmed: the value from the highest shift at or below the
// root (ε·|r|/σ error), or the nearest shift above it.
Settled settle(const RootTrack& track, const std::vector<double>& sigma)
{
    const int shifts = static_cast<int>(sigma.size());
    int bestPair = -1;
    double bestDistance = 0.0;
    for (int k = 0; k + 1 < shifts; ++k) {
        if (!track.seen[k] || !track.seen[k + 1])
            continue;
        // Far below σ, σ − 1/μ keeps only ε·σ of absolute accuracy: two high
        // shifts can agree on a low root to within that grid and still be
        // far off, so the agreement is charged with it.
        const double size = std::max(std::abs(track.value[k]), std::abs(track.value[k + 1]));
        const double grid = size > 0.0 ? 4.0 * kEpsilon * (sigma[k] + sigma[k + 1]) / size : 0.0;
        const double d = relativeDistance(track.value[k], track.value[k + 1]) + grid;
        if (bestPair < 0 || d < bestDistance) {
            bestPair = k;
            bestDistance = d;
        }
    }
    auto logGap = [&](int k, std::complex<double> r) {
        return std::abs(std::log(std::max(std::abs(r), 1e-300) / sigma[k]));
    };
    Settled out;
    if (bestPair >= 0 && bestDistance <= kSameRoot) {
        const auto a = track.value[bestPair];
        const auto b = track.value[bestPair + 1];
        out.value = logGap(bestPair, a) <= logGap(bestPair + 1, b) ? a : b;
        out.confirmed = true;
        out.agreement = bestDistance;
        return out;
    }
    int chosen = -1;
    for (int k = 0; k < shifts; ++k)
        if (track.seen[k] && (chosen < 0 || sigma[k] <= std::abs(track.value[k])))
            chosen = k;
    out.value = track.value[chosen];
    return out;
}

// Two-sided Rayleigh quotient iteration on the pencil itself, from a root
// the shifts found: x and y from inverse iteration at s, then
// s ← s − yᵀ·A(s)·x / yᵀ·B·x with both products summed in extended
// precision against the exact matrices. The quotient's error is the product
// of the vectors' errors, so the root comes out to the pencil's own
// conditioning times the extended rounding, not to that of a shifted
// eigenproblem (whose error grows with σ·C beside small conductances, and
// near a multiple root at the origin with its ε^(1/m) split). False when
// the iteration does not settle.
template <typename Scalar>
bool rayleighRefined(const PencilRootProblem& p, const Reactive& reactive, Scalar& root)
{
    constexpr bool isComplex = Eigen::NumTraits<Scalar>::IsComplex;
    using Ext = std::conditional_t<isComplex, std::complex<long double>, long double>;
    using Matrix = Eigen::Matrix<Scalar, Eigen::Dynamic, Eigen::Dynamic>;
    using Vector = Eigen::Matrix<Scalar, Eigen::Dynamic, 1>;
    using ExtMatrix = Eigen::Matrix<Ext, Eigen::Dynamic, Eigen::Dynamic>;
    using ExtVector = Eigen::Matrix<Ext, Eigen::Dynamic, 1>;
    auto extended = [](Scalar v) {
        if constexpr (isComplex)
            return Ext(v.real(), v.imag());
        else
            return static_cast<Ext>(v);
    };
    auto rounded = [](Ext v) {
        if constexpr (isComplex)
            return Scalar(static_cast<double>(v.real()), static_cast<double>(v.imag()));
        else
            return static_cast<Scalar>(v);
    };
    const int n = static_cast<int>(p.a0.rows());
    // Fixed, unstructured start vectors: one step of inverse iteration at a
    // shift this close to the root already points them at its null vectors.
    Vector x(n);
    Vector y(n);
    for (int i = 0; i < n; ++i) {
        x(i) = 1.0 + 0.5 * std::sin(1.7 * i + 0.3);
        y(i) = 1.0 + 0.5 * std::cos(2.3 * i + 0.1);
    }
    const Matrix b = reactive.value.cast<Scalar>();
    const Matrix a0 = p.a0.cast<Scalar>();
    const ExtMatrix bExtended = reactive.extended.cast<Ext>();
    const ExtMatrix a0Extended = reactive.a0.cast<Ext>();
    Scalar s = root;
    double lastChange = std::numeric_limits<double>::infinity();
    for (int step = 0; step < kRayleighSteps; ++step) {
        const Matrix a = a0 + s * b;
        const ExtMatrix exact = a0Extended + extended(s) * bExtended;
        const EquilibratedLu<Scalar> lu(a, exact);
        if (lu.reciprocalCondition() == 0.0)  // an exact zero pivot: s is no better than the last step
            break;
        // Inverse iteration with A0 on the right: the eigenvalue of
        // A(s)⁻¹·A0 for a root λ is −λ/(s−λ), huge at this root and exactly
        // 0 (nilpotent) on the origin's Jordan chain, so a multiple root at
        // the origin, whose resolvent grows like 1/s^m, is filtered out
        // instead of swamping the vectors of a slow root beside it.
        x = lu.solve(a0 * x, 0);
        y = lu.solveTransposed(a0.transpose() * y);
        if (!(x.norm() > 0.0) || !(y.norm() > 0.0) || !x.allFinite() || !y.allFinite())
            return false;
        x.normalize();
        y.normalize();
        const ExtVector xe = x.template cast<Ext>();
        const ExtVector ye = y.template cast<Ext>();
        const Ext numerator = ye.cwiseProduct(exact * xe).sum();
        const Ext denominator = ye.cwiseProduct(bExtended * xe).sum();
        if (denominator == Ext(0))
            return false;
        const Scalar next = s - rounded(numerator / denominator);
        const double change = std::abs(next - s);
        s = next;
        if (change <= kRayleighSettled * std::abs(s)) {
            root = s;
            return true;
        }
        lastChange = change;
    }
    // Still moving, but by rounding in the vectors only.
    if (lastChange <= kRayleighNoise * std::abs(s)) {
        root = s;
        return true;
    }
    return false;
}

// Each non-zero root refined on the pencil (see rayleighRefined); the result
// is kept only where it stays nearer its own root than any other root is,
// so the iteration cannot move one root onto another.
int refineRoots(const PencilRootProblem& p, const Reactive& reactive, std::vector<std::complex<double>>& roots,
                const std::vector<bool>& confirmed, const std::vector<double>& agreement)
{
    int unsettled = 0;
    const std::vector<std::complex<double>> found = roots;
    for (size_t i = 0; i < found.size(); ++i) {
        const std::complex<double> r = found[i];
        if (r == 0.0 || r.imag() < 0.0)
            continue;  // origin roots are exact; a pair's lower root is its partner's conjugate
        // Two shifts that agree this closely left no error worth an LU
        // (the roots found off by 1e-9 had shifts agreeing to 1e-10 at best).
        if (confirmed[i] && agreement[i] <= kAgreedClosely)
            continue;
        double apart = kRayleighWindow * std::abs(r);
        for (size_t j = 0; j < found.size(); ++j)
            if (j != i)
                apart = std::min(apart, 0.25 * std::abs(found[j] - r));
        std::complex<double> refined = r;
        bool settled = false;
        if (r.imag() == 0.0) {
            double real = r.real();
            settled = rayleighRefined(p, reactive, real);
            refined = real;
        } else {
            settled = rayleighRefined(p, reactive, refined);
        }
        if (settled && std::abs(refined - r) < apart)
            roots[i] = refined;
        else if (!confirmed[i])
            unsettled += r.imag() > 0.0 ? 2 : 1;
    }
    return unsettled;
}

}  // namespace

PencilRoots finitePencilRoots(const PencilRootProblem& problem, int originRoots)
{
    return finitePencilRoots(problem, OriginRootBounds{originRoots, originRoots});
}

namespace {

Reactive reactiveOf(const PencilRootProblem& problem)
{
    Reactive reactive;
    const Eigen::MatrixXd& left = problem.leftPorts.size() ? problem.leftPorts : problem.ports;
    reactive.value = left * problem.capacitance.asDiagonal() * problem.ports.transpose();
    reactive.extended = problem.reactiveExtended.size()
                            ? problem.reactiveExtended
                            : ExtendedMatrix(left.cast<long double>() * problem.capacitance.cast<long double>().asDiagonal() *
                                             problem.ports.cast<long double>().transpose());
    reactive.a0 = problem.a0Extended.size() ? problem.a0Extended : problem.a0.cast<long double>();
    return reactive;
}

}  // namespace

PencilRoots finitePencilRoots(const PencilRootProblem& problem, OriginRootBounds origin)
{
    return finitePencilRoots(problem, origin, problem);
}

PencilRoots finitePencilRoots(const PencilRootProblem& problem, OriginRootBounds origin,
                              const PencilRootProblem& refinement)
{
    PencilRoots out;
    if (problem.capacitance.size() == 0)
        return out;

    const double low = problem.lowRate;
    const double high = std::max(problem.highRate, low);
    int shifts = 1 + static_cast<int>(std::ceil(std::log10(high / low) / kDecadesPerShift));

    const Reactive reactive = reactiveOf(problem);
    std::vector<double> sigma;
    std::vector<std::vector<std::complex<double>>> perShift;
    for (int k = 0; k < shifts; ++k) {
        const double candidate = low * std::pow(10.0, k * std::log10(high / low) / std::max(1, shifts - 1));
        std::vector<std::complex<double>> roots;
        // A shift that lands on a root leaves A(σ) singular: nudge it once.
        for (double s : {candidate, candidate * 1.618})
            if (rootsAtShift(problem, reactive, s, roots)) {
                sigma.push_back(s);
                perShift.push_back(roots);
                break;
            }
    }
    if (sigma.empty())
        throw std::runtime_error(
            "the network's nodal matrix is too near singular at every trial frequency for its roots to be found "
            "(part values too far apart for double precision, such as a few pF across the same nodes as tens of uF); "
            "bring the extreme values closer together, or leave out a part whose effect is negligible");
    shifts = static_cast<int>(sigma.size());

    // Every shift sees nearly every root; a root's error depends on the shift
    // (on where σ·C swamps the conductances, and on the eigenproblem's
    // conditioning there), and a root that comes out the same at two shifts
    // is one those errors did not touch: rounding noise (an infinite or a
    // multiple origin root split by it) moves with σ. So each root is
    // followed down the shifts as a track, and its value is taken where two
    // neighbouring shifts agree best.
    const std::vector<RootTrack> tracks = followRoots(perShift);

    std::vector<std::complex<double>> roots;
    std::vector<bool> confirmed;
    std::vector<double> agreement;
    for (const RootTrack& track : tracks) {
        const Settled settled = settle(track, sigma);
        // Seen at one shift only, or nowhere twice alike, and above the top
        // shift: rounding noise of an infinite root.
        if (!settled.confirmed && shifts > 1 && std::abs(settled.value) > sigma.back())
            continue;
        roots.push_back(settled.value);
        confirmed.push_back(settled.confirmed);
        agreement.push_back(settled.agreement);
    }

    std::vector<int> order(roots.size());
    for (int i = 0; i < static_cast<int>(order.size()); ++i)
        order[i] = i;
    std::sort(order.begin(), order.end(), [&](int x, int y) { return std::abs(roots[x]) < std::abs(roots[y]); });
    {
        std::vector<std::complex<double>> sortedRoots;
        std::vector<bool> sortedConfirmed;
        std::vector<double> sortedAgreement;
        for (int i : order) {
            sortedRoots.push_back(roots[i]);
            sortedConfirmed.push_back(confirmed[i]);
            sortedAgreement.push_back(agreement[i]);
        }
        roots = std::move(sortedRoots);
        confirmed = std::move(sortedConfirmed);
        agreement = std::move(sortedAgreement);
    }
    // The certain origin roots are the smallest ones; above that count, a
    // small root is taken as rounding around the origin only if no two
    // shifts agree on it (a genuinely slow root is reproduced, the split of
    // a multiple root at 0 scales with σ).
    int originRoots = std::min<int>(origin.atLeast, static_cast<int>(roots.size()));
    while (originRoots < origin.atMost && originRoots < static_cast<int>(roots.size()) &&
           !confirmed[originRoots] && std::abs(roots[originRoots]) < kOriginCluster * low)
        ++originRoots;
    for (int i = 0; i < originRoots; ++i)
        roots[i] = 0.0;
    // A symmetric pencil's roots come from the self-adjoint solver, accurate
    // to rounding at every shift (poles and impedance zeros): the refinement
    // is for the non-symmetric bordered pencils of transfers, and costs an
    // LU per root (a third of an analysis of 40 capacitors).
    if (!problem.symmetric)
        out.unsettled = &refinement == &problem ? refineRoots(problem, reactive, roots, confirmed, agreement)
                                                : refineRoots(refinement, reactiveOf(refinement), roots, confirmed, agreement);
    // Real matrices give real roots or conjugate pairs. One shift's pair is
    // exact, but the two tracks of a pair may settle at different shifts:
    // each root in the upper half plane gives its value to its partner.
    std::vector<bool> paired(roots.size(), false);
    for (size_t i = 0; i < roots.size(); ++i) {
        if (roots[i].imag() <= 0.0)
            continue;
        int partner = -1;
        for (size_t j = 0; j < roots.size(); ++j)
            if (!paired[j] && roots[j].imag() < 0.0 &&
                (partner < 0 || std::abs(roots[j] - std::conj(roots[i])) < std::abs(roots[partner] - std::conj(roots[i]))))
                partner = static_cast<int>(j);
        if (partner >= 0) {
            paired[partner] = true;
            roots[partner] = std::conj(roots[i]);
        }
    }
    for (auto& r : roots)
        if (r.imag() == 0.0)
            r = {r.real(), 0.0};
    out.roots = std::move(roots);
    return out;
}

}  // namespace tauline
