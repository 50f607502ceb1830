"""`tauline analyze --json` against the exact rational reference on networks
of the shapes designers draw, which the random generator rarely makes:
long ladders (12 and 20 sections, gain and impedance), a twin-T notch with
its zeros on the jω axis (unloaded) and just off it (loaded), a bridged T,
a lattice with a right-half-plane zero across two floating nodes, three
high-pass sections, a decoupling bank whose values span eight decades.
The values are this project's own scenarios; the check values are computed
here, from the files' value text, by exact rational MNA in SymPy (Meurer et
al., SymPy: symbolic computing in Python, PeerJ Computer Science 3:e103,
2017 -- see sympy_network.py), compared as in test_sympy_transfer.py (1e-9
relative).

usage: /usr/bin/python3 test_structured_networks.py /path/to/tauline [--save-failures DIR]
"""

import os
import sys
sys.dont_write_bytecode = True  # keep tests/reference free of __pycache__

import test_wide_values as twv

HERE = os.path.dirname(os.path.abspath(__file__))

def exact_zeros(case, got, ref):
    """Where the exact polynomial has no term (an ideal notch's zeros on the
    jω axis leave no s term; SymPy's rational coefficients say so exactly),
    the engine reports exactly 0, not rounding: a pair on the axis has an
    infinite Q, not 1e15."""
    for name, key in (("numerator", "num"), ("denominator", "den")):
        engine = got.get(name) or []
        for k, c in enumerate(ref[key]):
            if c == 0 and k < len(engine):
                case.check(engine[k] == 0, "%s[%d]: the reference's is exactly 0, the engine's %r"
                           % (name, k, engine[k]))
    for bp in got.get("breakpoints", []):
        if bp["root"]["re"] == 0 and bp["root"]["im"] != 0:
            case.check(bp.get("q") is None and bp.get("q_limit") == "infinite",
                       "a pair on the jω axis: q %r, q_limit %r" % (bp.get("q"), bp.get("q_limit")))


if __name__ == "__main__":
    twv.check_folder(os.path.join(HERE, "structured-networks"), exact_zeros)
