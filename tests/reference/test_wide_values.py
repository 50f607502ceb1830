"""`tauline analyze --json` against the exact rational reference on networks
with wide part values (1 ohm - 10 Mohm, 1 pF - 100 uF, up to 10 capacitors),
where the engine once disagreed: roots at the origin missed or invented, far
zeros dropped, near-cancelling responses short of 1e-9.

Reference: exact rational MNA in SymPy (Meurer et al., SymPy: symbolic
computing in Python, PeerJ Computer Science 3:e103, 2017) -- see
sympy_network.py; computed here from the files' value text, no stored
numbers. Compared as in test_sympy_transfer.py (1e-9 relative).

usage: /usr/bin/python3 test_wide_values.py /path/to/tauline [--save-failures DIR]
"""

import json
import os
import sys
sys.dont_write_bytecode = True  # keep tests/reference free of __pycache__

import mpmath

import tauline_reference as tr
import network_generator as gen
import sympy_network as ref_mna
import test_sympy_transfer as tst

HERE = os.path.dirname(os.path.abspath(__file__))
WIDE = os.path.join(HERE, "wide-networks")


def load(path):
    """A .tauline file as the generator's dict, values kept as their text."""
    with open(path, encoding="utf-8") as f:
        net = json.load(f)
    for p in net["parts"]:
        if not isinstance(p["value"], str):
            p["value"] = gen.JsonNumber(repr(p["value"]) if isinstance(p["value"], float) else str(p["value"]))
    net["label"] = os.path.splitext(os.path.basename(path))[0]
    return net


def check_folder(folder, extra=None):
    """Every .tauline file in `folder` against its exact reference;
    `extra(case, got, ref)` adds checks of its own."""
    binary, save = tr.binary_from_argv()
    tally = tr.Tally(save)
    mpmath.mp.dps = 40
    names = sorted(n for n in os.listdir(folder) if n.endswith(".tauline"))
    for name in names:
        net = load(os.path.join(folder, name))
        # reference: exact rational MNA in SymPy (Meurer et al. 2017)
        ref = ref_mna.analyse(net)
        case = tr.Case(net["label"], net)
        got, problem = tr.run_json(binary, ["analyze", os.path.join(folder, name), "--json"])
        notes = []
        if case.check(got is not None, str(problem)):
            tst.compare(case, got, ref, net, notes)
            if extra:
                extra(case, got, ref)
        tally.record(case)
    tally.finish(minimum_passed=len(names))


def main():
    check_folder(WIDE)


if __name__ == "__main__":
    main()
