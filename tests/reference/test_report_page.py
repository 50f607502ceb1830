"""`tauline report FILE --svg OUT.svg`: the design-review page read by an
outside XML parser, its numbers checked against the exact reference.

Parser: Python's xml.etree.ElementTree (the standard library), so the page
is well-formed XML by a parser that is not Qt's. Reference: exact rational
MNA in SymPy (Meurer et al., SymPy: symbolic computing in Python, PeerJ
Computer Science 3:e103, 2017), see sympy_network.py. Checked on generated
networks: every corner |root|/2pi and every finite time constant R*C
appears on the page as text (4 significant digits, SI prefix), every part
name appears (the schematic), the title and the caution (ideal parts, no
rating) too; the exit status is 0 and then 1 / 2 as for `plot`
(shared/spec/command-line.md), with nothing written on failure.

usage: /usr/bin/python3 test_report_page.py /path/to/tauline
"""

import sys
sys.dont_write_bytecode = True  # keep tests/reference free of __pycache__
import math
import os
import re
import xml.etree.ElementTree as ET

import mpmath

import tauline_reference as tr
import network_generator as gen
import sympy_network as ref_mna

SVG = "{http://www.w3.org/2000/svg}"
# The page shows 4 significant digits: half a unit in the 4th digit.
REL = 5.5e-4
PREFIX = {"p": 1e-12, "n": 1e-9, "\u00b5": 1e-6, "u": 1e-6, "m": 1e-3, "": 1.0,
          "k": 1e3, "M": 1e6, "G": 1e9, "T": 1e12}
QUANTITY = re.compile(r"^([+\-\u2212]?[0-9.]+(?:e[+\-]?[0-9]+)?) ?([pn\u00b5umkMGT]?)(Hz|s)$")


def page_texts(path):
    """(texts, problem): the content of every <text> element."""
    try:
        root = ET.parse(path).getroot()
    except (ET.ParseError, OSError) as e:
        return None, "not well-formed XML: %s" % e
    if root.tag != SVG + "svg":
        return None, "root element is %s, not svg" % root.tag
    return ["".join(t.itertext()).strip() for t in root.iter(SVG + "text")], None


def quantities(texts, unit):
    out = []
    for t in texts:
        m = QUANTITY.match(t)
        if m and m.group(3) == unit:
            out.append(float(m.group(1).replace("\u2212", "-")) * PREFIX[m.group(2)])
    return out


def shown(values, want):
    return any(abs(v - want) <= REL * abs(want) for v in values)


def check_network(case, binary, path, net, ref, out):
    rc, _, err = tr.run(binary, ["report", path, "--svg", out])
    if not case.check(rc == 0, "report exit status %s; stderr: %s" % (rc, err.strip())):
        return
    texts, problem = page_texts(out)
    if not case.check(texts is not None, problem or ""):
        return
    # Wrapped lines and script runs are separate elements: compare without
    # white space.
    compact = "".join("".join(texts).split())
    case.check("".join(net["title"].split()) in compact, "title %r not on the page" % net["title"])
    case.check("idealparts" in compact and "novoltageorpowerrating" in compact,
               "the caution is not on the page")
    for p in net["parts"]:
        case.check(p["name"] in texts, "part %s not on the page" % p["name"])
    hz = quantities(texts, "Hz")
    corners = set()
    for root in ref["poles"] + ref["zeros"]:
        f = float(abs(root)) / (2 * math.pi)
        if f > 0:
            corners.add(float(mpmath.nstr(f, 12)))
    for f in sorted(corners):
        case.check(shown(hz, f), "corner %s Hz not on the page (shown: %s)" % (tr.fmt(f), hz))
    seconds = quantities(texts, "s")
    for name, cap in ref["caps"].items():
        if cap["r_state"] != "finite" or cap["r"] == 0:
            continue
        tau = float(cap["r"] * cap["c"])
        case.check(shown(seconds, tau), "time constant of %s, %s s, not on the page" % (name, tr.fmt(tau)))


def check_exit_statuses(tally, binary, ws):
    case = tr.Case("exit statuses", {"parts": [], "response": {}})
    good = ws.write("good", gen.network(5))
    out = os.path.join(ws.path, "status.svg")
    broken = os.path.join(ws.path, "broken.tauline")
    with open(broken, "w", encoding="utf-8") as f:
        f.write('{"format": "tauline-network", "version": 1, "parts": [')
    for args, want in [(["report", broken, "--svg", out], 1),
                       (["report", os.path.join(ws.path, "missing.tauline"), "--svg", out], 1),
                       (["report", good], 2),
                       (["report", good, "--svg", out, "--from", "10"], 2),
                       (["report", good, "--svg", out, "--bogus"], 2)]:
        rc, _, err = tr.run(binary, args)
        case.check(rc == want, "%s: exit status %s, expected %d" % (" ".join(args[1:]), rc, want))
        case.check(err.strip() != "", "%s: no message on stderr" % " ".join(args[1:]))
        case.check(not os.path.exists(out), "%s: wrote %s on failure" % (" ".join(args[1:]), out))
    tally.record(case)


def main():
    binary, save = tr.binary_from_argv()
    tally = tr.Tally(save)
    ws = tr.Workspace()
    check_exit_statuses(tally, binary, ws)
    mpmath.mp.dps = 40
    picks = [(500, "impedance-gnd", "plain"), (501, "voltage-gain", "plain"),
             (502, "transimpedance", "plain"), (503, "voltage-gain", "ac-coupled"),
             (504, "impedance-floating", "cap-parallel"), (505, None, None)]
    for seed, kind, shape in picks:
        net = gen.network(seed, kind, shape)
        try:
            ref = ref_mna.analyse(net)
        except ref_mna.ZeroResponse:
            print("skip %s: response zero at every frequency" % net["label"])
            continue
        path = ws.write(net["label"], net)
        case = tr.Case(net["label"], net)
        check_network(case, binary, path, net, ref, os.path.join(ws.path, net["label"] + ".svg"))
        tally.record(case)
    tally.finish(minimum_passed=5)


if __name__ == "__main__":
    main()
