"""`tauline analyze --json` against an exact rational reference.

Reference: exact rational MNA in SymPy (Meurer et al., SymPy: symbolic
computing in Python, PeerJ Computer Science 3:e103, 2017) -- see
sympy_network.py. Random RC networks over every response kind and every
degenerate shape of network_generator.py; each is written as a .tauline
file and analysed by the binary; coefficients, poles, zeros, order, dc/hf
limits and every capacitor's time constants are compared at 1e-9 relative.

usage: /usr/bin/python3 test_sympy_transfer.py /path/to/tauline [--save-failures DIR]
"""

import sys
sys.dont_write_bytecode = True  # keep tests/reference free of __pycache__
import itertools

import mpmath
from scipy.optimize import linear_sum_assignment

import tauline_reference as tr
import network_generator as gen
import sympy_network as ref_mna

REL = 1e-9          # relative agreement asked of the engine (issue 2, item 7)
ZERO_ROOT = 1e-12   # |root| * slowest time scale for a root the reference has at 0

UNITS = {"impedance": "ohm", "transimpedance": "ohm", "voltage-gain": "V/V"}


def cases():
    """Every (shape, response kind) pair, then extra plain networks."""
    out = []
    seed = 100
    for shape, kind in itertools.product(gen.SHAPES, gen.RESPONSE_KINDS):
        out.append((seed, kind, shape))
        seed += 1
    for kind in gen.RESPONSE_KINDS:
        out.append((seed, kind, "plain"))
        seed += 1
    for seed in range(200, 212):  # kind and shape chosen by the seed
        out.append((seed, None, None))
    for seed in DISAGREED_ONCE:
        out.append((seed, None, None))
    return out


# Networks on which the engine disagreed with the reference in a wider run
# over seeds 2000-2699 (spurious zeros far out, missed roots at the origin,
# accuracy short of 1e-9); kept so the fixes stay fixed.
DISAGREED_ONCE = (2010, 2032, 2046, 2085, 2139, 2253, 2258, 2307, 2378, 2388,
                  2446, 2447, 2473, 2475, 2625, 2699,
                  # a second run over seeds 30000-34249 (a spurious far zero,
                  # zeros at the origin missed); the others that run found are
                  # still open: see OPEN_DISAGREEMENTS.md beside this file
                  31211, 31494, 32029, 33143, 34292,
                  # the same run: a slow zero snapped to the origin, a far
                  # zero dropped, near-cancelling zeros 1e-9..1e-7 off
                  30487, 32020, 32046, 32198, 33427, 33862, 34261,
                  # a run over seeds 40000-40999: zeros and the gain constant
                  # 1e-9..1e-8 off; a pole-zero pair left uncancelled when a
                  # low root was taken from two high shifts
                  40171, 40296, 40877, 40972,
                  # the same run: null time constants 2e-9 off, or rounding
                  # where the nulling shorts a port (port resistances now
                  # refined against extended-precision sums)
                  40647, 40844)


def compare_coefficients(case, name, engine, ref, omega0):
    if not case.check(isinstance(engine, list) and len(engine) == len(ref),
                      "%s: engine has %s coefficients, reference %d: engine %s, reference %s"
                      % (name, len(engine) if isinstance(engine, list) else engine, len(ref),
                         engine, [tr.fmt(x) for x in ref])):
        return
    # A coefficient the reference has at exactly 0 (roots at the origin) is
    # judged against the polynomial's size at the network's slowest rate.
    size = max(abs(float(c)) * omega0 ** k for k, c in enumerate(ref))
    for k, (e, r) in enumerate(zip(engine, ref)):
        zero_abs = REL * size / omega0 ** k
        case.check(tr.close(e, r, REL, zero_abs),
                   "%s[%d] (s^%d): engine %s, reference %s (exact %s)"
                   % (name, k, k, tr.fmt(e), tr.fmt(r), r))


def compare_roots(case, name, engine, ref, t_slow):
    try:
        got = [complex(z["re"], z["im"]) for z in engine]
    except (TypeError, KeyError):
        case.check(False, "%s: not a list of {re, im}: %s" % (name, engine))
        return
    want = [complex(z) for z in ref]
    if not case.check(len(got) == len(want), "%s: engine has %d, reference %d: engine %s, reference %s"
                      % (name, len(got), len(want), got, want)):
        return
    if not want:
        return
    cost = [[abs(g - w) for g in got] for w in want]
    rows, cols = linear_sum_assignment(cost)
    for i, j in zip(rows, cols):
        w, g = want[i], got[j]
        tol = REL * abs(w) if w != 0 else ZERO_ROOT / t_slow
        case.check(abs(g - w) <= tol,
                   "%s: engine %r, reference %r (|diff| %.3g, allowed %.3g)"
                   % (name, g, w, abs(g - w), tol))


def compare_limit(case, name, engine, ref):
    kind, value = ref
    if not case.check(isinstance(engine, dict) and engine.get("limit") == kind,
                      "%s: engine %s, reference limit %s value %s" % (name, engine, kind, tr.fmt(value))):
        return
    if kind == "finite":
        case.check(tr.close(engine.get("value"), value, REL, 0.0),
                   "%s value: engine %s, reference %s" % (name, tr.fmt(engine.get("value")), tr.fmt(value)))
    elif kind == "zero":
        case.check(engine.get("value") == 0, "%s value: engine %s, spec says 0 for a zero limit"
                   % (name, engine.get("value")))
    else:
        case.check(engine.get("value") is None, "%s value: engine %s, spec says null for an infinite limit"
                   % (name, engine.get("value")))


def degenerate_dc_null(ref, cap):
    """For a transfer: the capacitors-open network does not fix the dc gain,
    or this capacitor's DC null view differs from the s -> 0 limit. (An
    impedance's null is the port shorted: always defined.)"""
    if ref["kind"] == "impedance":
        return False
    state, value = ref["dc_network"]
    dc_gain_fixed = state == "finite" and value != 0
    return not dc_gain_fixed or cap["null_dc_view"] != ("finite", cap["r_null"])


def compare_time_constants(case, engine, ref, r_scale, t_slow, notes):
    if not case.check(isinstance(engine, list), "time_constants missing: %s" % engine):
        return
    by_name = {e.get("element"): e for e in engine}
    case.check(sorted(by_name) == sorted(ref["caps"]) and len(engine) == len(ref["caps"]),
               "time_constants elements: engine %s, reference %s" % (sorted(by_name), sorted(ref["caps"])))
    for name, cap in ref["caps"].items():
        e = by_name.get(name)
        if e is None:
            continue
        for r_key, t_key, r_val, state in (("r_ohms", "tau_s", cap["r"], cap["r_state"]),
                                           ("r_null_ohms", "tau_null_s", cap["r_null"], cap["null_state"])):
            if state == "finite" and r_key == "r_null_ohms" and e.get(r_key) is None \
                    and e.get(t_key) is None and degenerate_dc_null(ref, cap):
                # Null double injection at the DC reference does not exist
                # here (nodes reached only through capacitors carry the
                # signal, so the capacitors-open network does not fix the
                # dc gain, or this capacitor's DC null differs from the
                # s -> 0 limit): the spec's null ("undefined") is accepted;
                # a number must still be the s -> 0 limit.
                notes.append("%s: engine null, reference limit %s (DC network gain %s, DC null view %s)"
                             % (name, tr.fmt(r_val), ref["dc_network"], cap["null_dc_view"]))
                continue
            if state == "finite":
                for key, want, zero_abs in ((r_key, r_val, ZERO_ROOT * r_scale),
                                            (t_key, r_val * cap["c"], ZERO_ROOT * t_slow)):
                    case.check(tr.close(e.get(key), want, REL, zero_abs),
                               "%s.%s: engine %s, reference %s (exact %s)"
                               % (name, key, tr.fmt(e.get(key)), tr.fmt(want), want))
            else:
                # infinite (no DC path), undefined (transfer with dc limit 0
                # or infinite) or indeterminate: the spec's null
                for key in (r_key, t_key):
                    case.check(e.get(key) is None, "%s.%s: engine %s, reference %s (null expected)"
                               % (name, key, tr.fmt(e.get(key)), state))


def compare(case, got, ref, net, notes):
    r = net["response"]
    # reference: exact rational MNA in SymPy (Meurer et al., SymPy: symbolic
    # computing in Python, PeerJ Computer Science 3:e103, 2017)
    t_slow = ref_mna.slowest_time_scale(ref)
    r_scale = max(float(ref_mna.parse_value(p["value"], p["kind"]))
                  for p in net["parts"] if p["kind"] == "resistor")
    case.check(got.get("response") == r["kind"], "response: engine %s, file %s" % (got.get("response"), r["kind"]))
    case.check(got.get("unit") == UNITS[r["kind"]], "unit: engine %s, spec %s" % (got.get("unit"), UNITS[r["kind"]]))
    case.check(got.get("order") == ref["order"], "order: engine %s, reference %d" % (got.get("order"), ref["order"]))
    compare_coefficients(case, "numerator", got.get("numerator"), ref["num"], 1 / t_slow)
    compare_coefficients(case, "denominator", got.get("denominator"), ref["den"], 1 / t_slow)
    compare_roots(case, "poles", got.get("poles"), ref["poles"], t_slow)
    compare_roots(case, "zeros", got.get("zeros"), ref["zeros"], t_slow)
    compare_limit(case, "dc", got.get("dc"), ref["dc"])
    compare_limit(case, "hf", got.get("hf"), ref["hf"])
    compare_time_constants(case, got.get("time_constants"), ref, r_scale, t_slow, notes)


def main():
    binary, save = tr.binary_from_argv()
    tally = tr.Tally(save)
    ws = tr.Workspace()
    mpmath.mp.dps = 40
    covered = set()
    for seed, kind, shape in cases():
        net = gen.network(seed, kind, shape)
        label = net["label"]
        try:
            ref = ref_mna.analyse(net)
        except ref_mna.ZeroResponse:
            print("skip %s: the response is zero at every frequency (not a valid test network)" % label)
            continue
        path = ws.write(label, net)
        case = tr.Case(label, net)
        got, problem = tr.run_json(binary, ["analyze", path, "--json"])
        notes = ["pole %s and zero %s equal to relative 1e-9: left out as the spec says"
                 % (tr.fmt(p.real), tr.fmt(z.real)) for p, z in ref["near_cancelled"]]
        if case.check(got is not None, str(problem)):
            compare(case, got, ref, net, notes)
        for n in notes:
            print("note %s: %s" % (label, n))
        tally.record(case)
        covered.add(net["response"]["kind"])
    if covered != {"impedance", "voltage-gain", "transimpedance"}:
        tally.fail("response kinds covered: %s" % sorted(covered))
    tally.finish(minimum_passed=24)


if __name__ == "__main__":
    main()
