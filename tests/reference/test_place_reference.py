"""`tauline place --json` against an exact rational reference.

Reference: exact rational MNA in SymPy (Meurer et al., SymPy: symbolic
computing in Python, PeerJ Computer Science 3:e103, 2017) -- see
sympy_network.py. For random networks, one corner is moved to a new
frequency; the value `place` solved for, and each nearest standard-series
value it offers, are written back into the network, and the reference's
exact corner of that network must sit where `place` says (1e-8 relative:
the solved value is printed to double precision, and the engine's corners
hold to 1e-9).

usage: /usr/bin/python3 test_place_reference.py /path/to/tauline [--save-failures DIR]
"""

import sys
sys.dont_write_bytecode = True  # keep tests/reference free of __pycache__
import copy
import json

import mpmath
import sympy as sp

import tauline_reference as tr
import network_generator as gen
import sympy_network as ref_mna

REL = 1e-8
SEEDS = range(500, 540)
ENOUGH = 15  # placements that must succeed (others may be honestly unreachable)


def corners_hz(net):
    """The breakpoint list of the command-line contract, exactly: finite
    non-zero roots after cancellation, a complex pair once, low to high."""
    vals = ref_mna.values(net)
    num_p, den_p = ref_mna.transfer(net, vals)
    if num_p.is_zero:
        raise ref_mna.ZeroResponse("response is zero at every frequency")
    g = sp.gcd(num_p, den_p)
    num = ref_mna.ascending(sp.div(num_p, g)[0])
    den = ref_mna.ascending(sp.div(den_p, g)[0])
    num = [sp.Rational(x) for x in num]
    den = [sp.Rational(x) for x in den]
    poles, zeros = ref_mna._roots(den), ref_mna._roots(num)
    _, _, poles, zeros, _ = ref_mna._drop_near_cancelling(num, den, poles, zeros)
    out = []
    for kind, roots in (("pole", poles), ("zero", zeros)):
        for z in roots:
            if z == 0 or z.imag < 0:
                continue  # the origin gives no corner; a pair counts once
            out.append((float(abs(z) / (2 * mpmath.pi)), kind))
    return sorted(out)


def with_value(net, part, value):
    changed = copy.deepcopy(net)
    for p in changed["parts"]:
        if p["name"] == part:
            p["value"] = repr(float(value))
    return changed


def check_landing(case, net, part, value, corner, want_hz, what):
    got = corners_hz(with_value(net, part, value))
    if not case.check(1 <= corner <= len(got), "%s: corner %d of %d in the reference" % (what, corner, len(got))):
        return
    hz = got[corner - 1][0]
    case.check(abs(hz - want_hz) <= REL * want_hz,
               "%s: %s = %r puts corner %d at %.12g Hz in the reference, place says %.12g Hz"
               % (what, part, value, corner, hz, want_hz))


def main():
    binary, save = tr.binary_from_argv()
    tally = tr.Tally(save)
    ws = tr.Workspace()
    mpmath.mp.dps = 40
    placed = 0
    for seed in SEEDS:
        net = gen.network(seed, None, None)
        try:
            before = corners_hz(net)
        except ref_mna.ZeroResponse:
            continue
        if not before:
            continue
        corner = 1 + seed % len(before)
        target = before[corner - 1][0] * (1.25 if seed % 2 else 0.8)
        path = ws.write(net["label"], net)
        rc, out, err = tr.run(binary, ["place", path, "--corner", str(corner), "--to", repr(target), "--json"])
        case = tr.Case(net["label"], net)
        if rc == 1:
            # Honestly unreachable targets must say why.
            case.check("corner" in err or "cannot" in err or "reach" in err,
                       "place refused without a reason: %s" % err.strip())
            tally.record(case)
            continue
        if not case.check(rc == 0, "place: exit status %s; stderr: %s" % (rc, err.strip())):
            tally.record(case)
            continue
        got = json.loads(out)
        case.check(abs(got["placed_hz"] - target) <= 1e-9 * target,
                   "placed_hz %.12g, target %.12g" % (got["placed_hz"], target))
        check_landing(case, net, got["part"], got["value"], got["placed_corner"], target, "solved value")
        for near in got["nearest"]:
            check_landing(case, net, got["part"], near["value"], near["corner"], near["hz"],
                          "series value %s" % near["text"])
        placed += 1
        tally.record(case)
    print("%d placements checked against the reference" % placed)
    if placed < ENOUGH:
        tally.fail("only %d placements succeeded (at least %d expected)" % (placed, ENOUGH))
    tally.finish()


if __name__ == "__main__":
    main()
