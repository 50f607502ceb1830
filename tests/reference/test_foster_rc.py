"""Foster's theorem for RC driving-point impedances, on the engine's output.

Source: Foster's reactance theorem carried over to RC one-ports (Van
Valkenburg, Introduction to Modern Network Synthesis, Wiley 1960, ch. 4 on
RC driving-point functions -- chapter number from memory): the poles and
zeros of an RC impedance are simple, real and on the non-positive real axis,
they interlace, the critical frequency nearest the origin is a pole (which
may sit at s = 0), and Z(0) >= Z(inf). Consequences checked too: a pole at
the origin exactly when Z(0) is infinite; Z(inf) = 0 exactly when the
highest critical frequency is a pole; never a zero at the origin.

At least 200 random RC one-ports (network_generator.py, impedance responses
only, ports to ground and between two other nodes, every shape), each run
through `tauline analyze FILE --json`.

usage: /usr/bin/python3 test_foster_rc.py /path/to/tauline [--save-failures DIR]
"""

import sys
sys.dont_write_bytecode = True  # keep tests/reference free of __pycache__
import tauline_reference as tr
import network_generator as gen

COUNT = 220
REL = 1e-9   # the engine's promised relative accuracy (issue 2, item 7)

# ac-coupled is a transfer shape; every other shape has an impedance form.
SHAPES = [s for s in gen.SHAPES if s != "ac-coupled"]


def networks():
    out = []
    for i in range(COUNT):
        seed = 5000 + i
        kind = "impedance-gnd" if i % 2 == 0 else "impedance-floating"
        out.append(gen.network(seed, kind, SHAPES[(i // 2) % len(SHAPES)]))
    for seed, kind, shape in REFUSED_ONCE:
        out.append(gen.network(seed, kind, shape))
    return out


# Valid RC one-ports the engine once refused to analyse ("nodal matrix is
# singular at every trial frequency"), found in a run over 3000 seeds.
REFUSED_ONCE = ((20636, "impedance-gnd", "cap-parallel"),
                (21643, "impedance-floating", "cap-triangle"))


def check_foster(case, got):
    # Van Valkenburg 1960, ch. 4 (from memory): RC driving-point impedance.
    try:
        poles = [complex(p["re"], p["im"]) for p in got["poles"]]
        zeros = [complex(z["re"], z["im"]) for z in got["zeros"]]
        dc, hf = got["dc"], got["hf"]
    except (KeyError, TypeError) as e:
        case.check(False, "JSON lacks poles/zeros/dc/hf: %s" % e)
        return
    nonzero = [abs(r) for r in poles + zeros if r != 0]
    # A root the engine puts at the origin must be exactly there; everything
    # else is judged relative to its own size (or to the slowest rate).
    tiny = 1e-12 * min(nonzero) if nonzero else 0.0
    crit = []
    for kind, roots in (("pole", poles), ("zero", zeros)):
        for r in roots:
            case.check(abs(r.imag) <= max(REL * abs(r.real), tiny),
                       "%s %r is not real" % (kind, r))
            case.check(r.real <= tiny, "%s %r is in the right half-plane" % (kind, r))
            crit.append((abs(r.real), kind, r))
    crit.sort(key=lambda c: c[0])
    at_origin = [c for c in crit if c[0] <= tiny]
    case.check(all(c[1] == "pole" for c in at_origin), "a zero at the origin: %s" % at_origin)
    case.check(len(at_origin) <= 1, "a multiple root at the origin: %s" % at_origin)
    for a, b in zip(crit, crit[1:]):
        case.check(b[0] - a[0] > REL * b[0], "not simple: %r and %r coincide" % (a[2], b[2]))
        case.check(a[1] != b[1], "not interlaced: %s %r then %s %r" % (a[1], a[2], b[1], b[2]))
    if crit:
        case.check(crit[0][1] == "pole", "nearest the origin is a %s (%r), not a pole"
                   % (crit[0][1], crit[0][2]))
        last_is_pole = crit[-1][1] == "pole"
        case.check(last_is_pole == (hf.get("limit") == "zero"),
                   "highest critical frequency is a %s but hf limit is %s" % (crit[-1][1], hf.get("limit")))
    case.check(bool(at_origin) == (dc.get("limit") == "infinite"),
               "pole at origin: %s, dc limit %s" % (bool(at_origin), dc.get("limit")))
    case.check(dc.get("limit") in ("finite", "infinite"), "dc limit %s for an RC impedance" % dc.get("limit"))
    case.check(hf.get("limit") in ("finite", "zero"), "hf limit %s for an RC impedance" % hf.get("limit"))
    # Z(0) >= Z(inf); an infinite Z(0) is >= anything.
    if dc.get("limit") == "finite":
        z0 = dc.get("value")
        zinf = hf.get("value") if hf.get("limit") == "finite" else 0.0
        case.check(isinstance(z0, (int, float)) and isinstance(zinf, (int, float))
                   and z0 > 0 and z0 >= zinf * (1 - REL),
                   "Z(0) = %s < Z(inf) = %s" % (z0, zinf))
    case.check(got.get("order") == len(poles), "order %s but %d poles" % (got.get("order"), len(poles)))


def main():
    binary, save = tr.binary_from_argv()
    tally = tr.Tally(save)
    ws = tr.Workspace()
    nets = networks()
    paths = [ws.write(net["label"], net) for net in nets]
    for net, path in zip(nets, paths):
        case = tr.Case(net["label"], net)
        got, problem = tr.run_json(binary, ["analyze", path, "--json"])
        if case.check(got is not None, str(problem)):
            check_foster(case, got)
        tally.record(case)
    tally.finish(minimum_passed=200)


if __name__ == "__main__":
    main()
