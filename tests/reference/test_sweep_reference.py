"""`tauline sweep` against H(j 2 pi f) of the exact rational reference.

Reference: exact rational MNA in SymPy (Meurer et al., SymPy: symbolic
computing in Python, PeerJ Computer Science 3:e103, 2017), see
sympy_network.py; H(j 2 pi f) evaluated from the exact coefficients in
40-digit mpmath arithmetic. Checked: --json over 1 Hz .. 10 MHz, 50 points
(re/im within 1e-9 of |H|, dB and phase wrapped to (-180, 180]); --at with
an unsorted list holding a duplicate (low to high, duplicates once); --csv
header and row shape (shared/spec/command-line.md).

usage: /usr/bin/python3 test_sweep_reference.py /path/to/tauline [--save-failures DIR]
"""

import sys
sys.dont_write_bytecode = True  # keep tests/reference free of __pycache__
import math

import mpmath

import tauline_reference as tr
import network_generator as gen
import sympy_network as ref_mna

REL = 1e-9
DB_TOL = 20 * math.log10(1 + REL)     # |H| within 1e-9 relative, in dB
DEG_TOL = math.degrees(REL)           # the phase within 1e-9 rad


def wrapped_deg(h):
    """Phase in degrees wrapped to (-180, 180]."""
    d = float(mpmath.degrees(mpmath.arg(h)))
    return 180.0 if d <= -180.0 else d


def compare_point(case, tag, point, h):
    hz = point.get("hz")
    mag = float(abs(h))
    for key, want in (("re", float(h.real)), ("im", float(h.imag))):
        got = point.get(key)
        # re and im judged against |H|: a part that is tiny next to the other
        # carries no meaning beyond the magnitude's rounding.
        case.check(isinstance(got, (int, float)) and abs(got - want) <= REL * mag,
                   "%s %g Hz %s: engine %s, reference %.15g" % (tag, hz, key, got, want))
    want_db = float(20 * mpmath.log10(abs(h)))
    got_db = point.get("db")
    case.check(isinstance(got_db, (int, float)) and abs(got_db - want_db) <= DB_TOL,
               "%s %g Hz db: engine %s, reference %.15g" % (tag, hz, got_db, want_db))
    got_deg = point.get("deg")
    want_deg = wrapped_deg(h)
    if case.check(isinstance(got_deg, (int, float)) and -180.0 < got_deg <= 180.0,
                  "%s %g Hz deg %s not in (-180, 180]" % (tag, hz, got_deg)):
        diff = (got_deg - want_deg + 180.0) % 360.0 - 180.0
        case.check(abs(diff) <= DEG_TOL,
                   "%s %g Hz deg: engine %s, reference %.15g" % (tag, hz, got_deg, want_deg))


def check_sweep_json(case, binary, path, ref):
    got, problem = tr.run_json(binary, ["sweep", path, "--from", "1", "--to", "1e7",
                                        "--points", "50", "--json"])
    if not case.check(got is not None, str(problem)):
        return None
    if not case.check(isinstance(got, list) and len(got) == 50,
                      "--points 50 gave %s entries" % (len(got) if isinstance(got, list) else got)):
        return None
    hz = [p.get("hz") for p in got]
    case.check(all(isinstance(f, (int, float)) for f in hz), "hz not numbers: %s" % hz)
    if not all(isinstance(f, (int, float)) for f in hz):
        return None
    case.check(abs(hz[0] - 1) <= REL and abs(hz[-1] - 1e7) <= REL * 1e7,
               "sweep ends %s .. %s, asked 1 .. 1e7" % (hz[0], hz[-1]))
    case.check(all(a < b for a, b in zip(hz, hz[1:])), "hz not strictly increasing: %s" % hz)
    for p in got:
        compare_point(case, "--json", p, ref_mna.evaluate(ref, mpmath.mpf(p["hz"])))
    return hz


def check_at(case, binary, path, ref):
    got, problem = tr.run_json(binary, ["sweep", path, "--at", "15000,120,15000,3.3", "--json"])
    if not case.check(got is not None, str(problem)):
        return
    hz = [p.get("hz") for p in got] if isinstance(got, list) else got
    if case.check(hz == [3.3, 120, 15000], "--at 15000,120,15000,3.3 gave hz %s, spec: low to high, "
                  "duplicates once" % hz):
        for p in got:
            compare_point(case, "--at", p, ref_mna.evaluate(ref, mpmath.mpf(p["hz"])))


def check_csv(case, binary, path, json_hz):
    rc, out, err = tr.run(binary, ["sweep", path, "--from", "1", "--to", "1e7", "--points", "50", "--csv"])
    if not case.check(rc == 0, "--csv exit status %s: %s" % (rc, err.strip())):
        return
    lines = [line for line in out.splitlines() if line.strip()]
    case.check(bool(lines) and lines[0].strip() == "hz,re,im,db,deg",
               "--csv header %r, spec says 'hz,re,im,db,deg'" % (lines[0] if lines else None))
    rows = lines[1:]
    case.check(len(rows) == 50, "--csv has %d rows, 50 asked" % len(rows))
    for row in rows:
        cells = row.split(",")
        try:
            nums = [float(c) for c in cells]
        except ValueError:
            nums = None
        case.check(len(cells) == 5 and nums is not None and all(math.isfinite(x) for x in nums),
                   "--csv row %r is not five finite numbers" % row)
    if json_hz and len(rows) == 50:
        try:
            csv_hz = [float(r.split(",")[0]) for r in rows]
            case.check(all(abs(a - b) <= 1e-6 * b for a, b in zip(csv_hz, json_hz)),
                       "--csv hz column differs from --json hz")
        except ValueError:
            pass


def main():
    binary, save = tr.binary_from_argv()
    tally = tr.Tally(save)
    ws = tr.Workspace()
    picks = [(400, "impedance-gnd", "plain"), (401, "impedance-floating", "cap-triangle"),
             (402, "voltage-gain", "plain"), (403, "transimpedance", "plain"),
             (404, "voltage-gain", "ac-coupled"), (405, "voltage-gain", "cap-divider"),
             (406, "impedance-gnd", "cap-only-node"), (407, "transimpedance", "no-gnd"),
             (408, "voltage-gain", "dead-part"), (409, "impedance-floating", "cap-parallel"),
             # the engine's sweep was once off by 2.5e-9 and 8.4e-7 here
             (2447, None, None), (2699, None, None),
             # off in a second run over seeds 30000-34249; the others found
             # then are still open: see OPEN_DISAGREEMENTS.md
             (31211, None, None), (31494, None, None), (32029, None, None),
             (33143, None, None), (34292, None, None),
             # a slow zero, near-cancelling zeros and gain constants, off
             # in that run and a later one over seeds 40000-40999
             (32046, None, None), (33427, None, None), (33862, None, None),
             (40296, None, None)]
    mpmath.mp.dps = 40
    for seed, kind, shape in picks:
        net = gen.network(seed, kind, shape)
        try:
            ref = ref_mna.analyse(net)
        except ref_mna.ZeroResponse:
            print("skip %s: response zero at every frequency" % net["label"])
            continue
        path = ws.write(net["label"], net)
        case = tr.Case(net["label"], net)
        json_hz = check_sweep_json(case, binary, path, ref)
        check_at(case, binary, path, ref)
        check_csv(case, binary, path, json_hz)
        tally.record(case)
    tally.finish(minimum_passed=8)


if __name__ == "__main__":
    main()
