"""Checks on the referee itself (sympy_network.py and network_generator.py),
so that a disagreement with the engine can be trusted to be the engine's.
Needs no tauline binary (ctest passes its path; it is not used).

usage: /usr/bin/python3 test_reference_selfcheck.py [/path/to/tauline]
"""

import sys
sys.dont_write_bytecode = True  # keep tests/reference free of __pycache__
import random

import numpy as np
import sympy as sp

import tauline_reference as tr
import network_generator as gen
import sympy_network as mna

REL = 1e-9


def two_terminal(parts, response):
    kinds = {"R": "resistor", "C": "capacitor"}
    return {"parts": [{"name": n, "kind": kinds[n[0]], "value": v, "nodes": nodes}
                      for n, v, nodes in parts], "response": response}


def near(x, want, rel):
    return abs(float(x) - want) <= rel * abs(want)


def hand_cases(tally):
    # IEC 60062 RKM and SI examples as the network-file spec lists them
    # (IEC 60062, Marking codes for resistors and capacitors -- from memory).
    c = tr.Case("value parsing", {"parts": [], "response": {}})
    for text, kind, want in [("4K7", "resistor", 4700), ("4k7", "resistor", 4700),
                             ("R47", "resistor", sp.Rational(47, 100)), ("47K3", "resistor", 47300),
                             ("4R7", "resistor", sp.Rational(47, 10)), ("47R", "resistor", 47),
                             ("4k99", "resistor", 4990), ("1M5", "resistor", 1500000),
                             ("4k7\u03a9", "resistor", 4700), ("4.7 k\u2126", "resistor", 4700),
                             ("1M", "resistor", 10 ** 6), ("4700", "resistor", 4700),
                             ("4n7", "capacitor", sp.Rational(47, 10 ** 10)),
                             ("2\u00b52", "capacitor", sp.Rational(22, 10 ** 7)),
                             ("4\u03bc7", "capacitor", sp.Rational(47, 10 ** 7)),
                             ("10 nF", "capacitor", sp.Rational(1, 10 ** 8)),
                             ("1m", "capacitor", sp.Rational(1, 1000)),
                             ("1e-9F", "capacitor", sp.Rational(1, 10 ** 9))]:
        got = mna.parse_value(text, kind)
        c.check(got == want, "%r read as %s, not %s" % (text, got, want))
    tally.record(c)

    # The command-line spec's worked example: 4.7 kOhm in series with
    # 10 kOhm || 2.2 nF, impedance at the port (values in
    # shared/spec/command-line.md, printed to 5-8 digits; hand-derivable:
    # Z = R1 + R2/(1 + s R2 C), common practice (no source)).
    net = two_terminal([("R1", "4k7", ["in", "mid"]), ("R2", "10k", ["mid", "gnd"]),
                        ("C1", "2.2n", ["mid", "gnd"])], {"kind": "impedance", "port": ["in", "gnd"]})
    ref = mna.analyse(net)
    c = tr.Case("spec example", net)
    c.check(ref["order"] == 1, "order %s" % ref["order"])
    c.check(near(ref["num"][0], 14700.0, 1e-12) and near(ref["num"][1], 0.1034, 1e-12), "num %s" % ref["num"])
    c.check(ref["den"] == [1, sp.Rational(22, 10 ** 6)], "den %s" % ref["den"])
    c.check(near(ref["poles"][0].real, -45454.545, 1e-7), "pole %s" % ref["poles"])
    c.check(near(ref["zeros"][0].real, -142166.34, 1e-7), "zero %s" % ref["zeros"])
    c.check(ref["dc"] == ("finite", 14700) and ref["hf"] == ("finite", 4700), "limits %s %s" % (ref["dc"], ref["hf"]))
    cap = ref["caps"]["C1"]
    c.check(cap["r"] == 10000, "r %s" % cap["r"])
    c.check(near(cap["r_null"], 3197.28, 1e-6), "r_null %s" % cap["r_null"])
    c.check(near(cap["r_null"] * cap["c"], 7.034e-6, 1e-4), "tau_null %s" % (cap["r_null"] * cap["c"]))
    tally.record(c)

    # RC low-pass: one pole at -1/RC, null time constant 0 (the capacitor is
    # across the nulled output). Common practice (no source).
    net = two_terminal([("R1", "1k", ["in", "out"]), ("C1", "1u", ["out", "gnd"])],
                       {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["out", "gnd"]})
    ref = mna.analyse(net)
    c = tr.Case("RC low-pass", net)
    c.check(ref["den"] == [1, sp.Rational(1, 1000)] and ref["num"] == [1], "H %s / %s" % (ref["num"], ref["den"]))
    c.check(near(ref["poles"][0].real, -1000.0, 1e-25), "pole %s" % ref["poles"])
    c.check(ref["caps"]["C1"]["r"] == 1000 and ref["caps"]["C1"]["r_null"] == 0, "caps %s" % ref["caps"])
    c.check(ref["dc"] == ("finite", 1) and ref["hf"] == ("zero", 0), "limits")
    tally.record(c)

    # Equal two-section RC ladder: D = 1 + 3x + x^2 with x = sRC, poles at
    # 0.381966/RC and 2.618034/RC (exact roots (3 -+ sqrt 5)/2; the issue's
    # citation: Gray, Hurst, Lewis & Meyer, Analysis and Design of Analog
    # Integrated Circuits, 5th ed., sec. 7.2-7.3).
    net = two_terminal([("R1", "1k", ["in", "a"]), ("C1", "1u", ["a", "gnd"]),
                        ("R2", "1k", ["a", "b"]), ("C2", "1u", ["b", "gnd"])],
                       {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["b", "gnd"]})
    ref = mna.analyse(net)
    c = tr.Case("two-section ladder", net)
    poles = sorted(-float(p.real) * 1e-3 for p in ref["poles"])
    c.check(len(poles) == 2 and near(poles[0], (3 - 5 ** 0.5) / 2, 1e-14)
            and near(poles[1], (3 + 5 ** 0.5) / 2, 1e-14), "poles*RC %s" % poles)
    c.check(near(poles[0], 0.381966, 1e-6) and near(poles[1], 2.618034, 1e-6), "poles*RC %s" % poles)
    c.check(ref["caps"]["C1"]["r"] == 1000 and ref["caps"]["C2"]["r"] == 2000, "r %s" % ref["caps"])
    tally.record(c)

    # Series R-C port: Z = R + 1/(sC): pole at the origin, dc infinite, no DC
    # path for C (tau null), port shorted -> R. Common practice (no source).
    net = two_terminal([("R1", "1k", ["in", "a"]), ("C1", "1u", ["a", "gnd"])],
                       {"kind": "impedance", "port": ["in", "gnd"]})
    ref = mna.analyse(net)
    c = tr.Case("series RC port", net)
    c.check(ref["den"] == [0, 1] and ref["num"] == [10 ** 6, 1000], "Z %s / %s" % (ref["num"], ref["den"]))
    c.check(ref["poles"] == [0] and near(ref["zeros"][0].real, -1000.0, 1e-25), "roots")
    c.check(ref["dc"] == ("infinite", None) and ref["hf"] == ("finite", 1000), "limits")
    c.check(ref["caps"]["C1"]["r"] is None and ref["caps"]["C1"]["r_null"] == 1000, "caps %s" % ref["caps"])
    tally.record(c)

    # Capacitive divider: flat C1/(C1 + C2) although the middle node has no
    # DC path. Common practice (no source).
    net = two_terminal([("R1", "1k", ["in", "gnd"]), ("R2", "1k", ["in", "x"]), ("C3", "1n", ["x", "gnd"]),
                        ("C1", "1n", ["in", "mid"]), ("C2", "3n", ["mid", "gnd"])],
                       {"kind": "voltage-gain", "input": ["in", "gnd"], "output": ["mid", "gnd"]})
    ref = mna.analyse(net)
    c = tr.Case("capacitive divider", net)
    c.check(ref["num"] == [sp.Rational(1, 4)] and ref["den"] == [1] and ref["order"] == 0,
            "H %s / %s" % (ref["num"], ref["den"]))
    tally.record(c)


def numeric_h(net, s):
    """H(s) by a direct complex MNA solve in numpy (no determinants)."""
    vals = {k: float(v) for k, v in mna.values(net).items()}
    ref, nodes, index = mna._layout(net)
    n = len(nodes)
    r = net["response"]
    extra = 1 if r["kind"] == "voltage-gain" else 0
    A = np.zeros((n + extra, n + extra), complex)
    b = np.zeros(n + extra, complex)

    def vec(pair):
        v = np.zeros(n + extra, complex)
        if pair[0] in index:
            v[index[pair[0]]] += 1
        if pair[1] in index:
            v[index[pair[1]]] -= 1
        return v
    for p in net["parts"]:
        y = 1 / vals[p["name"]] if p["kind"] == "resistor" else s * vals[p["name"]]
        d = vec(p["nodes"])[:n]
        A[:n, :n] += y * np.outer(d, d)
    if r["kind"] == "voltage-gain":
        B = vec(r["input"])[:n]
        A[:n, n] = B
        A[n, :n] = B
        b[n] = 1
        out = vec(r["output"])
    elif r["kind"] == "transimpedance":
        b = vec(r["input"])
        out = vec(r["output"])
    else:
        b = vec(r["port"])
        out = b
    return out @ np.linalg.solve(A, b)


def random_cases(tally):
    rng = random.Random(4242)
    for seed in range(300, 345):
        net = gen.network(seed)
        c = tr.Case(net["label"], net)
        try:
            gen.check_valid(net)
        except AssertionError as e:
            c.check(False, "generator broke its promise: %s" % e)
        c.check(gen.file_text(gen.network(seed)) == gen.file_text(net), "generator not repeatable")
        try:
            ref = mna.analyse(net)
        except mna.ZeroResponse:
            tally.record(c)
            continue
        vals = mna.values(net)
        caps = ref["caps"]
        c.check(ref["order"] <= len(caps), "order %d > %d capacitors" % (ref["order"], len(caps)))

        # Determinant form against a direct numeric solve at a few points.
        for _ in range(3):
            s = complex(0, 2 * np.pi * 10 ** rng.uniform(0, 7))
            want = numeric_h(net, s)
            got = complex(mna.evaluate(ref, s.imag / (2 * np.pi)))
            c.check(abs(got - want) <= 1e-7 * abs(want), "H(%g j): rational %r, direct solve %r" % (s.imag, got, want))

        # The zeroed-input view by the s -> 0 limit equals the plain DC
        # resistive network (a passive RC driving point has at most a simple
        # pole at s = 0). Common practice (no source).
        for name in caps:
            dc_view = mna._port_view(net, vals, name, "zeroed", with_caps=False)
            c.check(dc_view == (caps[name]["r_state"], caps[name]["r"]),
                    "%s: limit view %s, DC view %s" % (name, caps[name]["r"], dc_view))

        num_p, den_p = mna.transfer(net, vals)
        num = mna.ascending(num_p) + [0, 0]
        den = mna.ascending(den_p) + [0, 0]
        # b1 = sum of the open-circuit time constants (Cochrun & Grabel, IEEE
        # Trans. Circuit Theory 20(1), 1973; Gray, Hurst, Lewis & Meyer,
        # Analysis and Design of Analog ICs, 5th ed., sec. 7.2).
        if den[0] != 0:
            b1 = den[1] / den[0]
            tau_sum = sum(cp["r"] * cp["c"] for cp in caps.values())
            c.check(b1 == tau_sum, "b1 %s != sum tau_i0 %s" % (b1, tau_sum))
        # a1 = H0 * sum of the null time constants when H0 is finite, non-zero
        # and the DC network is sound (Middlebrook, Vorperian & Lindal, The
        # N extra element theorem, IEEE TCAS-I 45(9), 1998).
        if den[0] != 0 and num[0] != 0:
            a1 = num[1] / num[0]
            if all(cp["null_state"] == "finite" for cp in caps.values()):
                null_sum = sum(cp["r_null"] * cp["c"] for cp in caps.values())
                c.check(a1 == null_sum, "a1/a0 %s != sum tau_null %s" % (a1, null_sum))
            else:
                c.check(False, "H0 finite and DC network sound, yet null views %s"
                        % {k: v["null_state"] for k, v in caps.items()})

        # An RC driving point obeys Foster's theorem (Van Valkenburg,
        # Introduction to Modern Network Synthesis, Wiley 1960, ch. 4 -- from
        # memory): real simple roots on the non-positive axis, interlaced,
        # the lowest a pole.
        if net["response"]["kind"] == "impedance":
            roots = sorted([(abs(complex(p)), "p", complex(p)) for p in ref["poles"]] +
                           [(abs(complex(z)), "z", complex(z)) for z in ref["zeros"]])
            ok = all(abs(r[2].imag) <= 1e-20 and r[2].real <= 0 for r in roots)
            ok = ok and all(roots[i][1] != roots[i + 1][1] for i in range(len(roots) - 1))
            ok = ok and (not roots or roots[0][1] == "p")
            c.check(ok, "reference impedance breaks Foster: %s" % roots)
        tally.record(c)


def main():
    tally = tr.Tally()
    hand_cases(tally)
    random_cases(tally)
    tally.finish(minimum_passed=45)


if __name__ == "__main__":
    main()
