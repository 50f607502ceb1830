"""Seeded random RC networks for the reference tests.

A network is a plain dict shaped like a version-1 .tauline file (see
shared/spec/network-file.md). Part values are kept as the exact text written
to the file: a str becomes a JSON string, a JsonNumber a bare JSON number.
Every network is valid by construction: one connected piece, no part with
both ends on one node, every response node touched, 1-6 capacitors, 2-10
resistors, 3-8 nodes.

Some shapes are degenerate on purpose (see SHAPES): a node reached only
through capacitors, capacitor loops, an AC-coupled transfer (dc gain 0), a
capacitive divider, a network with no ground node, a part that carries no
signal.
"""

import json
import math
import random
from decimal import Decimal

R_RANGE = (10.0, 1e6)      # ohms
C_RANGE = (10e-12, 10e-6)  # farads

RESPONSE_KINDS = ("impedance-gnd", "impedance-floating", "voltage-gain", "transimpedance")
SHAPES = ("plain", "cap-only-node", "cap-triangle", "cap-parallel", "ac-coupled",
          "cap-divider", "no-gnd", "dead-part")


class JsonNumber(str):
    """A value written as a bare JSON number token (its text is exact)."""


# --------------------------------------------------------------------- values

_PREFIX_LETTERS = {-12: ["p"], -9: ["n"], -6: ["u", "\u00b5", "\u03bc"], -3: ["m"],
                   0: [""], 3: ["k", "K"], 6: ["M"]}


def _decimal_text(digits, exponent):
    """digits * 10**exponent as a plain decimal string, no trailing zeros."""
    text = format(Decimal(digits).scaleb(exponent).normalize(), "f")
    return text


def random_value(rng, kind):
    """A log-uniform value rounded to 2 or 3 significant digits, written in
    one of several notations. Returns the text (str or JsonNumber)."""
    lo, hi = R_RANGE if kind == "resistor" else C_RANGE
    x = 10 ** rng.uniform(math.log10(lo), math.log10(hi))
    sig = 2 if rng.random() < 0.7 else 3
    e = math.floor(math.log10(x))
    k = e - sig + 1
    digits = int(round(x / 10 ** k))
    if digits >= 10 ** sig:
        digits //= 10
        k += 1
    while digits % 10 == 0 and digits > 0:  # canonical (digits, k)
        digits //= 10
        k += 1
    value_exp = math.floor(math.log10(digits)) + k  # value in [10^v, 10^(v+1))
    p = 3 * math.floor(value_exp / 3)
    p = max(-12, min(6, p))
    mant = _decimal_text(digits, k - p)
    letter = rng.choice(_PREFIX_LETTERS[p])
    unit_choices = ["\u03a9", "\u2126", "ohm"] if kind == "resistor" else ["F"]

    style = rng.choice(["rkm", "rkm", "si", "si", "si-unit", "si-space-unit",
                        "plain", "json-number", "exponent"])
    if kind == "capacitor" and p == -6 and rng.random() < 0.15:
        style = "milli"
    if style == "rkm":
        mark = letter or "R"  # IEC 60062: R marks the decimal point of ohms
        if "." in mant:
            a, b = mant.split(".")
            text = a + mark + b
        else:
            text = mant + mark
        if rng.random() < 0.2:
            text += rng.choice(unit_choices)
        return text
    if style == "si":
        return mant + letter
    if style == "si-unit":
        return mant + letter + rng.choice(unit_choices)
    if style == "si-space-unit":
        return mant + " " + letter + rng.choice(unit_choices)
    if style == "milli":
        return _decimal_text(digits, k + 3) + "m" + rng.choice(["", "F"])
    if style == "plain":
        return _decimal_text(digits, k)
    if style == "exponent":
        text = "%de%d" % (digits, k)
        if rng.random() < 0.3:
            text += rng.choice(unit_choices)
        return text
    # json-number: an integer token, or the shortest round-trip float text
    if k >= 0:
        return JsonNumber(str(digits * 10 ** k))
    return JsonNumber(repr(float("%de%d" % (digits, k))))


# ------------------------------------------------------------------- building

class _Builder:
    def __init__(self, rng):
        self.rng = rng
        self.parts = []
        self.counts = {"resistor": 0, "capacitor": 0}

    def add(self, kind, a, b):
        assert a != b
        self.counts[kind] += 1
        name = ("R" if kind == "resistor" else "C") + str(self.counts[kind])
        self.parts.append({"name": name, "kind": kind,
                           "value": random_value(self.rng, kind), "nodes": [a, b]})
        return name

    def random_connected(self, nodes, kinds):
        """Spanning tree over nodes, then the remaining kinds between random
        pairs. kinds: list of 'resistor'/'capacitor', len >= len(nodes) - 1."""
        rng = self.rng
        kinds = list(kinds)
        rng.shuffle(kinds)
        order = list(nodes)
        rng.shuffle(order)
        for i in range(1, len(order)):
            kind = kinds.pop()
            a, b = order[i], rng.choice(order[:i])
            self.add(kind, *rng.sample([a, b], 2))
        for kind in kinds:
            a, b = rng.sample(list(nodes), 2)
            self.add(kind, a, b)


def _node_names(count, with_gnd=True):
    names = ["n%d" % i for i in range(1, count + (0 if with_gnd else 1))]
    return (["gnd"] if with_gnd else []) + names


def _pick_response(rng, kind, nodes):
    """A response of the given kind over the given nodes (gnd may be absent)."""
    others = [n for n in nodes if n != "gnd"]
    has_gnd = "gnd" in nodes
    if kind == "impedance-gnd":
        return {"kind": "impedance", "port": [rng.choice(others), "gnd"]}
    if kind == "impedance-floating":
        return {"kind": "impedance", "port": rng.sample(others, 2)}
    rkind = "voltage-gain" if kind == "voltage-gain" else "transimpedance"
    if has_gnd and rng.random() < 0.8:
        inp = [rng.choice(others), "gnd"]
    else:
        inp = rng.sample(others, 2)
    for _ in range(100):
        if has_gnd and rng.random() < 0.7:
            out = [rng.choice(others), "gnd"]
        else:
            out = rng.sample(others, 2)
        if sorted(out) != sorted(inp):
            break
    return {"kind": rkind, "input": inp, "output": out}


def _counts(rng, min_caps=1, max_caps=6, min_res=2, max_res=10):
    return rng.randint(min_caps, max_caps), rng.randint(min_res, max_res)


def _build(seed, kind, shape):
    rng = random.Random(seed)
    b = _Builder(rng)
    if shape == "plain" or shape == "no-gnd":
        n_c, n_r = _counts(rng)
        n_nodes = rng.randint(3, min(8, n_c + n_r + 1))
        nodes = _node_names(n_nodes, with_gnd=(shape == "plain"))
        if shape == "no-gnd" and kind == "impedance-gnd":
            kind = "impedance-floating"
        b.random_connected(nodes, ["capacitor"] * n_c + ["resistor"] * n_r)
        response = _pick_response(rng, kind, nodes)
    elif shape == "cap-only-node":
        # node x touched by capacitors only: no DC path to it
        n_x = rng.randint(1, 2)
        n_c, n_r = _counts(rng, max_caps=6 - n_x)
        n_nodes = rng.randint(2, min(7, n_c + n_r + 1))
        nodes = _node_names(n_nodes)
        b.random_connected(nodes, ["capacitor"] * n_c + ["resistor"] * n_r)
        x = "n%d" % n_nodes
        for t in rng.sample(nodes, n_x):
            b.add("capacitor", x, t)
        nodes = nodes + [x]
        if kind.startswith("impedance") and rng.random() < 0.6:
            response = ({"kind": "impedance", "port": [x, "gnd"]} if kind == "impedance-gnd"
                        else {"kind": "impedance", "port": [x, rng.choice(nodes[1:-1])]})
        else:
            response = _pick_response(rng, kind, nodes)
    elif shape in ("cap-triangle", "cap-parallel"):
        loop = 3 if shape == "cap-triangle" else 2
        n_c, n_r = _counts(rng, max_caps=6 - loop)
        n_c = min(n_c, 6 - loop)
        n_nodes = rng.randint(3, min(8, n_c + n_r + 1))
        nodes = _node_names(n_nodes)
        b.random_connected(nodes, ["capacitor"] * n_c + ["resistor"] * n_r)
        if loop == 3:
            t = rng.sample(nodes, 3)
            for i in range(3):
                b.add("capacitor", t[i], t[(i + 1) % 3])
        else:
            t = rng.sample(nodes, 2)
            b.add("capacitor", t[0], t[1])
            b.add("capacitor", t[1], t[0])
        response = _pick_response(rng, kind, nodes)
    elif shape == "ac-coupled":
        # Rest network: resistor spanning tree to gnd, so every rest node sits
        # at 0 V at DC. The signal enters (voltage gain) or leaves (either
        # transfer) through one series capacitor: dc gain 0.
        if kind not in ("voltage-gain", "transimpedance"):
            kind = rng.choice(["voltage-gain", "transimpedance"])
        n_c, n_r = _counts(rng, max_caps=5, max_res=8)
        n_rest = rng.randint(2, min(6, n_r + 1))
        rest = _node_names(n_rest)
        b.random_connected(rest, ["resistor"] * (n_rest - 1))
        extra = ["capacitor"] * (n_c - 0) + ["resistor"] * (n_r - (n_rest - 1))
        for k in extra:
            a, c = rng.sample(rest, 2)
            b.add(k, a, c)
        input_side = kind == "voltage-gain" and rng.random() < 0.5
        if input_side:
            b.add("capacitor", "in", rng.choice(rest[1:]))
            if rng.random() < 0.5:
                b.add("resistor", "in", "gnd")
            out = rng.choice(rest[1:])
            response = {"kind": kind, "input": ["in", "gnd"], "output": [out, "gnd"]}
        else:
            b.add("capacitor", rng.choice(rest[1:]), "out")
            b.add("resistor", "out", "gnd")
            response = {"kind": kind, "input": [rng.choice(rest[1:]), "gnd"],
                        "output": ["out", "gnd"]}
    elif shape == "cap-divider":
        # in -C- mid -C- gnd with mid touched by nothing else: a flat
        # capacitive divider (or, as a port, an impedance with a pole at 0).
        n_c, n_r = _counts(rng, max_caps=4)
        n_nodes = rng.randint(2, min(6, n_c + n_r + 1))
        nodes = _node_names(n_nodes)
        b.random_connected(nodes, ["capacitor"] * n_c + ["resistor"] * n_r)
        top = rng.choice(nodes[1:])
        b.add("capacitor", top, "mid")
        b.add("capacitor", "mid", "gnd")
        if kind == "voltage-gain" or kind == "transimpedance":
            response = {"kind": kind, "input": [top, "gnd"], "output": ["mid", "gnd"]}
        elif kind == "impedance-gnd":
            response = {"kind": "impedance", "port": ["mid", "gnd"]}
        else:
            response = {"kind": "impedance", "port": ["mid", top]}
    elif shape == "dead-part":
        # A part that carries no signal: a capacitor straight across the
        # driving voltage source, or one dangling to a node nothing else
        # touches, or a resistor dangling likewise.
        n_c, n_r = _counts(rng, max_caps=5, max_res=9)
        n_nodes = rng.randint(3, min(7, n_c + n_r + 1))
        nodes = _node_names(n_nodes)
        b.random_connected(nodes, ["capacitor"] * n_c + ["resistor"] * n_r)
        response = _pick_response(rng, kind, nodes)
        if response["kind"] == "voltage-gain" and rng.random() < 0.6:
            b.add("capacitor", *response["input"])
        else:
            anchor = rng.choice(nodes)
            b.add(rng.choice(["capacitor", "resistor"]), anchor, "dangle")
    else:
        raise ValueError("unknown shape " + shape)

    net = {"format": "tauline-network", "version": 1,
           "title": "reference network %d (%s, %s)" % (seed, shape, kind),
           "parts": b.parts, "response": response}
    return net


def check_valid(net):
    """Raises AssertionError unless the network meets the generator's promises."""
    parts = net["parts"]
    caps = sum(p["kind"] == "capacitor" for p in parts)
    res = sum(p["kind"] == "resistor" for p in parts)
    assert 1 <= caps <= 6, caps
    assert 2 <= res <= 10, res
    nodes = set()
    adj = {}
    for p in parts:
        a, c = p["nodes"]
        assert a != c, p
        nodes.update((a, c))
        adj.setdefault(a, set()).add(c)
        adj.setdefault(c, set()).add(a)
    assert 3 <= len(nodes) <= 8, len(nodes)
    start = next(iter(nodes))
    seen, todo = {start}, [start]
    while todo:
        for m in adj[todo.pop()]:
            if m not in seen:
                seen.add(m)
                todo.append(m)
    assert seen == nodes, "not one piece"
    r = net["response"]
    named = r["port"] if r["kind"] == "impedance" else r["input"] + r["output"]
    for n in named:
        assert n in nodes, "response node %s untouched" % n
    pairs = [r["port"]] if r["kind"] == "impedance" else [r["input"], r["output"]]
    for pr in pairs:
        assert pr[0] != pr[1]
    assert len({p["name"] for p in parts}) == len(parts)


def network(seed, kind=None, shape=None):
    """The network for a seed. kind / shape default to a seeded choice."""
    pick = random.Random(seed * 7919 + 1)
    kind = kind or pick.choice(RESPONSE_KINDS)
    shape = shape or pick.choice(SHAPES)
    for attempt in range(1000):
        net = _build(seed * 1000 + attempt, kind, shape)
        net["title"] = "reference network, seed %d (%s, %s)" % (seed, shape, kind)
        net["label"] = "seed-%d-%s-%s" % (seed, shape, kind)  # not written to the file
        try:
            check_valid(net)
            return net
        except AssertionError:
            continue
    raise RuntimeError("no valid network for seed %d" % seed)


def file_text(net):
    """The .tauline text (UTF-8 JSON); JsonNumber values become bare numbers."""
    lines = ['{', '  "format": "tauline-network",', '  "version": 1,',
             '  "title": %s,' % json.dumps(net.get("title", "reference network")), '  "parts": [']
    rows = []
    for p in net["parts"]:
        v = p["value"]
        value = str(v) if isinstance(v, JsonNumber) else json.dumps(v, ensure_ascii=False)
        rows.append('    {"name": %s, "kind": %s, "value": %s, "nodes": %s}' % (
            json.dumps(p["name"]), json.dumps(p["kind"]), value, json.dumps(p["nodes"])))
    lines.append(",\n".join(rows))
    lines.append('  ],')
    lines.append('  "response": %s' % json.dumps(net["response"]))
    lines.append('}')
    return "\n".join(lines) + "\n"


if __name__ == "__main__":
    import sys
    seed = int(sys.argv[1]) if len(sys.argv) > 1 else 1
    sys.stdout.write(file_text(network(seed)))
