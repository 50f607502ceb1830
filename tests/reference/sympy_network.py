"""Exact reference for RC networks: modified nodal analysis in SymPy.

Reference: exact rational MNA in SymPy (Meurer et al., SymPy: symbolic
computing in Python, PeerJ Computer Science 3:e103, 2017). Everything here is
derived from the network's nodal equations with exact Rationals taken from
the same value text the .tauline file holds; nothing is taken from the C++
side. Modified nodal analysis itself: Ho, Ruehli & Brennan, The modified
nodal approach to network analysis, IEEE Trans. Circuits and Systems 22(6),
1975.

analyse(net) returns a dict:
  num, den      exact Rational coefficient lists, ascending powers of s, after
                cancellation; den's lowest-order non-zero coefficient is 1
  poles, zeros  mpmath complex roots (30 digits); roots at the origin exactly 0
  order         degree of den
  dc, hf        (limit, value): ('finite', Rational) / ('zero', 0) / ('infinite', None)
  near_cancelled pole/zero pairs equal to relative 1e-9 but not exactly,
                left out as the command-line contract says (num/den then
                hold 40-digit mpf values instead of Rationals)
  dc_network    the plain DC network's response (capacitors open), see
                dc_network_response
  caps          {name: {'c', 'r', 'r_state', 'r_null', 'null_state',
                'null_dc_view'}}
                r / r_null are Rationals or None; r_state is 'finite' or
                'infinite'; null_state is 'finite', 'infinite', 'undefined'
                (transfer with dc limit zero or infinite) or 'indeterminate'.
                r and r_null are limits s -> 0 of what the capacitor sees
                with the other capacitors in place (see _port_view);
                null_dc_view is (state, value) of the plain DC network.
"""

import re

import mpmath
import sympy as sp
from sympy.polys.matrices import DomainMatrix

S = sp.Symbol("s")
mpmath.mp.dps = 40


class ZeroResponse(ValueError):
    """The output does not depend on the input at any frequency."""


# --------------------------------------------------------------- value text

_PREFIX = {"": 0, "f": -15, "p": -12, "n": -9, "u": -6, "\u00b5": -6, "\u03bc": -6,
           "m": -3, "k": 3, "K": 3, "M": 6, "G": 9, "T": 12}
_UNITS = {"resistor": ("ohm", "\u03a9", "\u2126"), "capacitor": ("F",)}
_SI = re.compile(r"^((?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)\s*([fpnuµμmkKMGT]?)$")
_RKM = re.compile(r"^([0-9]*)([RfpnuµμmkKMGT])([0-9]*)$")


def parse_value(text, kind):
    """Exact Rational for a value as written in the file (JSON number text
    or string), SI prefix or IEC 60062 RKM code, optional unit."""
    t = str(text).strip()
    for unit in _UNITS[kind]:
        if t.endswith(unit):
            t = t[: -len(unit)].rstrip()
            break
    m = _SI.match(t)
    if m:
        return sp.Rational(m.group(1)) * sp.Rational(10) ** _PREFIX[m.group(2)]
    m = _RKM.match(t)
    if m and (m.group(1) or m.group(3)):
        whole, frac = m.group(1) or "0", m.group(3) or "0"
        exp = 0 if m.group(2) == "R" else _PREFIX[m.group(2)]
        return sp.Rational(whole + "." + frac) * sp.Rational(10) ** exp
    raise ValueError("reference cannot read value %r" % text)


# ------------------------------------------------------------- network form

def reference_node(net):
    touched = {n for p in net["parts"] for n in p["nodes"]}
    if "gnd" in touched:
        return "gnd"
    r = net["response"]
    return r["port"][1] if r["kind"] == "impedance" else r["input"][1]


def _layout(net):
    ref = reference_node(net)
    nodes = sorted({n for p in net["parts"] for n in p["nodes"]} - {ref})
    index = {n: i for i, n in enumerate(nodes)}
    return ref, nodes, index


def _pair_vector(index, size, pair):
    v = sp.zeros(size, 1)
    if pair[0] in index:
        v[index[pair[0]]] += 1
    if pair[1] in index:
        v[index[pair[1]]] -= 1
    return v


def _stamp(M, index, a, b, y):
    ia, ib = index.get(a), index.get(b)
    if ia is not None:
        M[ia, ia] += y
    if ib is not None:
        M[ib, ib] += y
    if ia is not None and ib is not None:
        M[ia, ib] -= y
        M[ib, ia] -= y


def values(net):
    return {p["name"]: parse_value(p["value"], p["kind"]) for p in net["parts"]}


# ----------------------------------------------------------- transfer function

def _det(M):
    dm = DomainMatrix.from_Matrix(M).convert_to(sp.QQ[S])
    return sp.Poly(dm.domain.to_sympy(dm.det()), S, domain=sp.QQ)


def _system(net, vals):
    """(A, b, c): the MNA matrix in s, excitation and output selectors, with
    H(s) = c^T A^-1 b."""
    ref, nodes, index = _layout(net)
    n = len(nodes)
    r = net["response"]
    extra = 1 if r["kind"] == "voltage-gain" else 0
    A = sp.zeros(n + extra, n + extra)
    for p in net["parts"]:
        y = 1 / vals[p["name"]] if p["kind"] == "resistor" else S * vals[p["name"]]
        _stamp(A, index, p["nodes"][0], p["nodes"][1], y)
    if r["kind"] == "impedance":
        b = _pair_vector(index, n, r["port"])
        c = b
    elif r["kind"] == "transimpedance":
        b = _pair_vector(index, n, r["input"])
        c = _pair_vector(index, n, r["output"])
    else:
        B = _pair_vector(index, n, r["input"])
        A[:n, n] = B
        A[n, :n] = B.T
        b = sp.zeros(n + 1, 1)
        b[n] = 1
        c = _pair_vector(index, n, r["output"]).col_join(sp.zeros(1, 1))
    return A, b, c


def transfer(net, vals=None):
    """Exact (numerator, denominator) Polys of H(s) before cancellation.
    By the Schur complement, det([[A, b], [c^T, 0]]) = -det(A) c^T A^-1 b."""
    vals = vals or values(net)
    A, b, c = _system(net, vals)
    bordered = A.row_join(b).col_join(c.T.row_join(sp.zeros(1, 1)))
    return -_det(bordered), _det(A)


def _low_order(coeffs):
    for k, v in enumerate(coeffs):
        if v != 0:
            return k
    return None


def _limit(num, den, at_zero):
    """dc (at_zero) or hf limit of num/den given ascending coefficient lists."""
    if at_zero:
        kn, kd = _low_order(num), _low_order(den)
    else:
        kn, kd = len(num) - 1, len(den) - 1
    if kn == kd:
        return ("finite", num[kn] / den[kd])
    if at_zero:
        return ("zero", 0) if kn > kd else ("infinite", None)
    return ("zero", 0) if kn < kd else ("infinite", None)


def _roots(coeffs):
    """Roots (30+ digits) of an ascending exact coefficient list; roots at the
    origin come out exactly 0. mpmath's polyroots at 60 digits with its error
    estimate; exact isolation (CRootOf) when that does not converge."""
    k = _low_order(coeffs)
    rest = coeffs[k:]
    roots = [mpmath.mpc(0)] * k
    if len(rest) <= 1:
        return roots
    with mpmath.workdps(60):
        top = [mpmath.mpf(c.p) / c.q for c in reversed(rest)]
        try:
            found, err = mpmath.polyroots(top, maxsteps=400, extraprec=400, error=True)
            if err > mpmath.mpf(10) ** -35:
                raise mpmath.NoConvergence(err)
            roots += [mpmath.mpc(z) for z in found]
            return roots
        except mpmath.NoConvergence:
            pass
    poly = sp.Poly(list(reversed(rest)), S, domain=sp.QQ)
    for z in poly.all_roots():
        re_, im_ = z.evalf(35).as_real_imag()
        roots.append(mpmath.mpc(mpmath.mpf(str(re_)), mpmath.mpf(str(im_))))
    return roots


def ascending(poly):
    return list(reversed(poly.all_coeffs()))


# ------------------------------------------------------------ port views

def _port_view(net, vals, cap, mode, with_caps=True):
    """What capacitor `cap` sees at its terminals a, b (the capacitor itself
    removed), by exact MNA with a 1 A test current from b into a.

    mode 'zeroed': the input source set to zero (voltage source shorted,
    current source opened). mode 'nulled': the response held at zero by the
    input (impedance: port shorted; transfer: the input's value left free and
    the output voltage constrained to 0, the null double injection).

    with_caps: the other capacitors stay in as s*C and the result is the limit
    s -> 0 of the impedance seen (every other capacitor opens in the limit,
    but a node reached only through capacitors keeps its capacitive division);
    without, they are simply left out (the plain DC resistive network).
    Returns ('finite', R), ('infinite', None) when the test current has no
    return path or the impedance has a pole at s = 0, or ('indeterminate',
    None) when V(a) - V(b) is not fixed by the equations."""
    ref, nodes, index = _layout(net)
    n = len(nodes)
    r = net["response"]
    a, b = next(p["nodes"] for p in net["parts"] if p["name"] == cap)
    A = sp.zeros(n, n)
    for p in net["parts"]:
        if p["name"] == cap:
            continue
        if p["kind"] == "resistor":
            _stamp(A, index, p["nodes"][0], p["nodes"][1], 1 / vals[p["name"]])
        elif with_caps:
            _stamp(A, index, p["nodes"][0], p["nodes"][1], S * vals[p["name"]])
    # Extra unknowns: their KCL columns (None: the free source voltage u, no
    # KCL part); extra equations: (node pair whose voltage is fixed, minus u?).
    kcl_cols = []
    extra_rows = []
    if r["kind"] == "voltage-gain":
        kcl_cols.append(_pair_vector(index, n, r["input"]))  # source current
        if mode == "zeroed":
            extra_rows.append((r["input"], False))
        else:
            kcl_cols.append(None)
            extra_rows.append((r["input"], True))
            extra_rows.append((r["output"], False))
    elif r["kind"] == "transimpedance":
        if mode == "nulled":
            kcl_cols.append(-_pair_vector(index, n, r["input"]))  # free input current
            extra_rows.append((r["output"], False))
    elif mode == "nulled":  # impedance: the port shorted
        kcl_cols.append(_pair_vector(index, n, r["port"]))
        extra_rows.append((r["port"], False))
    m = n + len(kcl_cols)
    M = sp.zeros(n + len(extra_rows), m + 1)
    M[:n, :n] = A
    for j, col in enumerate(kcl_cols):
        if col is not None:
            M[:n, n + j] = col
    for i, (pair, minus_u) in enumerate(extra_rows):
        M[n + i, :n] = _pair_vector(index, n, pair).T
        if minus_u:
            M[n + i, n + 1] = -1
    M[:n, m] = _pair_vector(index, n, (a, b))  # test current
    c = sp.zeros(1, m)
    c[0, :n] = _pair_vector(index, n, (a, b)).T
    state, q = _solve_for(M, c, with_caps)
    if state != "finite" or not with_caps:
        return (state, q)
    # q is a reduced fraction of polynomials in s: its limit at s = 0
    num0 = q.numer.get((0,), 0)
    den0 = q.denom.get((0,), 0)
    if den0 == 0:
        return ("infinite", None)
    return ("finite", sp.Rational(sp.QQ.to_sympy(num0 / den0)))


def _solve_for(M, c, with_s):
    """Solve the augmented system M = [A | rhs] exactly (over QQ(s) when
    with_s, else QQ) and return the quantity c . x: ('finite', value),
    ('infinite', None) when the system has no solution (a current with no
    return path), ('indeterminate', None) when c . x is not fixed."""
    m = M.cols - 1
    K = sp.QQ.frac_field(S) if with_s else sp.QQ
    dm = DomainMatrix.from_Matrix(M).convert_to(K)
    rref, pivots = dm.rref()
    if m in pivots:
        return ("infinite", None)
    R = rref.rep.to_ddm()
    x = [K.zero] * m
    for row, col in enumerate(pivots):
        x[col] = R[row][m]
    cv = [K.convert(sp.Rational(c[0, j])) if c[0, j] != 0 else K.zero for j in range(m)]
    for vec in dm[:, :m].nullspace().rep.to_ddm():
        if sum((v * cj for v, cj in zip(vec, cv)), K.zero) != K.zero:
            return ("indeterminate", None)
    q = sum((xi * ci for xi, ci in zip(x, cv)), K.zero)
    return ("finite", q if with_s else K.to_sympy(q))


def dc_network_response(net, vals=None):
    """The response of the plain DC network (every capacitor open, left
    out): ('finite', value) / ('infinite', None) / ('indeterminate', None).
    It differs from the dc limit of H(s) when nodes reached only through
    capacitors carry the signal (a capacitive divider, a floating output)."""
    vals = vals or values(net)
    ref, nodes, index = _layout(net)
    n = len(nodes)
    r = net["response"]
    extra = 1 if r["kind"] == "voltage-gain" else 0
    M = sp.zeros(n + extra, n + extra + 1)
    for p in net["parts"]:
        if p["kind"] == "resistor":
            _stamp(M, index, p["nodes"][0], p["nodes"][1], 1 / vals[p["name"]])
    if r["kind"] == "voltage-gain":
        B = _pair_vector(index, n, r["input"])
        M[:n, n] = B
        M[n, :n] = B.T
        M[n, n + 1] = 1
    else:
        M[:n, n] = _pair_vector(index, n, r["port"] if r["kind"] == "impedance" else r["input"])
    c = sp.zeros(1, n + extra)
    c[0, :n] = _pair_vector(index, n, r["port"] if r["kind"] == "impedance" else r["output"]).T
    return _solve_for(M, c, False)


# ------------------------------------------------------------------- analyse

def analyse(net):
    vals = values(net)
    num_p, den_p = transfer(net, vals)
    if num_p.is_zero:
        raise ZeroResponse("response is zero at every frequency")
    g = sp.gcd(num_p, den_p)
    num_p = sp.div(num_p, g)[0]
    den_p = sp.div(den_p, g)[0]
    num = ascending(num_p)
    den = ascending(den_p)
    scale = den[_low_order(den)]
    num = [sp.Rational(x) / scale for x in num]
    den = [sp.Rational(x) / scale for x in den]
    poles, zeros = _roots(den), _roots(num)
    num, den, poles, zeros, dropped = _drop_near_cancelling(num, den, poles, zeros)
    out = {
        "kind": net["response"]["kind"],
        "num": num, "den": den, "order": len(den) - 1,
        "poles": poles, "zeros": zeros, "near_cancelled": dropped,
        "dc": _limit(num, den, True), "hf": _limit(num, den, False),
        "dc_network": dc_network_response(net, vals),
        "caps": {},
    }
    r = net["response"]
    for p in net["parts"]:
        if p["kind"] != "capacitor":
            continue
        c = vals[p["name"]]
        state, rv = _port_view(net, vals, p["name"], "zeroed")
        if r["kind"] != "impedance" and out["dc"][0] != "finite":
            nstate, nv = "undefined", None
            dc_view = (nstate, nv)
        else:
            nstate, nv = _port_view(net, vals, p["name"], "nulled")
            dc_view = _port_view(net, vals, p["name"], "nulled", with_caps=False)
        # null_dc_view: the plain DC resistive network's answer. Where it
        # differs from the s -> 0 limit the DC network is degenerate (nodes
        # reached only through capacitors take part in the null).
        out["caps"][p["name"]] = {"c": c, "r": rv, "r_state": state,
                                  "r_null": nv, "null_state": nstate,
                                  "null_dc_view": dc_view}
    return out


def _mpf(x):
    if isinstance(x, mpmath.mpf):
        return x
    x = sp.Rational(x)
    return mpmath.mpf(x.p) / x.q


def _drop_near_cancelling(num, den, poles, zeros):
    """The command-line contract leaves out a pole and a zero that are equal
    to relative 1e-9 (shared/spec/command-line.md); the exact gcd above only
    removes exactly equal ones. Remove the near pairs too, dividing their
    factors out of the coefficients in 40-digit arithmetic (the coefficients
    are then no longer exact Rationals, but good to far below 1e-9)."""
    dropped = []
    zeros = list(zeros)
    keep_poles = []
    for p in poles:
        match = None
        if p != 0:
            for z in zeros:
                if abs(p - z) <= mpmath.mpf("1e-9") * max(abs(p), abs(z)):
                    match = z
                    break
        if match is None:
            keep_poles.append(p)
            continue
        if abs(p.imag) > 0 or abs(match.imag) > 0:
            raise NotImplementedError("near-cancelling complex pole/zero pair: %s %s" % (p, match))
        zeros.remove(match)
        dropped.append((p, match))
    if not dropped:
        return num, den, poles, zeros, dropped
    num = [_mpf(x) for x in num]
    den = [_mpf(x) for x in den]
    for p, z in dropped:
        num = _deflate(num, z.real)
        den = _deflate(den, p.real)
    k = _low_order(den)
    scale = den[k]
    return [x / scale for x in num], [x / scale for x in den], keep_poles, zeros, dropped


def _deflate(coeffs, root):
    """Ascending coefficients of coeffs(s) / (s - root) (synthetic division),
    the roots at the origin kept exact."""
    k = _low_order(coeffs)
    top = list(reversed(coeffs[k:]))
    out = [top[0]]
    for c in top[1:-1]:
        out.append(c + root * out[-1])
    return [coeffs[0] * 0] * k + list(reversed(out))


def evaluate(ref, hz):
    """H(j 2 pi hz) from the reference coefficients, in 40-digit arithmetic."""
    s = mpmath.mpc(0, 2 * mpmath.pi * mpmath.mpf(hz))
    n = mpmath.polyval([_mpf(x) for x in reversed(ref["num"])], s)
    d = mpmath.polyval([_mpf(x) for x in reversed(ref["den"])], s)
    return n / d


def slowest_time_scale(ref):
    """The network's slowest time scale: 1/|root| of the smallest non-zero
    pole or zero, or the largest finite time constant, whichever is larger."""
    t = []
    for z in ref["poles"] + ref["zeros"]:
        if abs(z) != 0:
            t.append(1 / abs(z))
    for cap in ref["caps"].values():
        for key in ("r", "r_null"):
            if cap[key]:
                t.append(_mpf(cap[key] * cap["c"]))
    return float(max(t)) if t else 1.0
