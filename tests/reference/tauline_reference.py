"""Shared plumbing for the reference tests: running the tauline binary on
generated networks, tolerant number comparisons, and the pass/fail tally
that ends every script with `N passed, M failed`."""

import json
import math
import os
import subprocess
import sys
import tempfile

HERE = os.path.dirname(os.path.abspath(__file__))
if HERE not in sys.path:
    sys.path.insert(0, HERE)

import network_generator  # noqa: E402


def binary_from_argv():
    """argv[1] is the tauline binary (ctest passes it). Optional
    `--save-failures DIR` writes each failing network there as a .tauline
    file with a note beside it."""
    args = sys.argv[1:]
    save = None
    if "--save-failures" in args:
        i = args.index("--save-failures")
        save = args[i + 1]
        del args[i:i + 2]
    if not args or not os.access(args[0], os.X_OK):
        print("usage: %s /path/to/tauline [--save-failures DIR]" % sys.argv[0])
        print("tauline binary missing or not executable: %r" % (args[0] if args else None))
        print("0 passed, 1 failed")
        sys.exit(1)
    return os.path.abspath(args[0]), save


class Workspace:
    """A temporary directory holding the generated .tauline files."""

    def __init__(self):
        self._tmp = tempfile.TemporaryDirectory(prefix="tauline-reference-")
        self.path = self._tmp.name

    def write(self, name, net):
        path = os.path.join(self.path, name + ".tauline")
        with open(path, "w", encoding="utf-8") as f:
            f.write(network_generator.file_text(net))
        return path


def run(binary, args, timeout=60):
    """(exit status, stdout, stderr) of one tauline run."""
    try:
        p = subprocess.run([binary] + args, capture_output=True, timeout=timeout,
                           env=dict(os.environ, QT_QPA_PLATFORM="offscreen"))
    except subprocess.TimeoutExpired:
        return (None, "", "timed out after %d s" % timeout)
    return (p.returncode, p.stdout.decode("utf-8", "replace"),
            p.stderr.decode("utf-8", "replace"))


def run_json(binary, args):
    """Parsed JSON stdout of a tauline run, or (None, problem text)."""
    rc, out, err = run(binary, args)
    if rc != 0:
        return None, "tauline %s: exit status %s; stderr: %s" % (" ".join(args), rc, err.strip())
    try:
        return json.loads(out), None
    except ValueError as e:
        return None, "tauline %s: stdout is not JSON (%s): %.300s" % (" ".join(args), e, out)


def close(engine, ref, rel, zero_abs):
    """engine within rel of ref; an exact-zero ref needs |engine| <= zero_abs."""
    if engine is None or (isinstance(engine, float) and math.isnan(engine)):
        return False
    ref = float(ref)
    if ref == 0:
        return abs(engine) <= zero_abs
    return abs(engine - ref) <= rel * abs(ref)


def fmt(x):
    if x is None:
        return "null"
    try:
        return "%.12g" % float(x)
    except (TypeError, ValueError):
        return str(x)


class Case:
    """The problems found on one network; reports them with the file text so
    the failure can be reproduced by hand."""

    def __init__(self, label, net):
        self.label = label
        self.net = net
        self.problems = []

    def check(self, ok, text):
        if not ok:
            self.problems.append(text)
        return ok


class Tally:
    def __init__(self, save_dir=None):
        self.passed = 0
        self.failed = 0
        self.save_dir = save_dir

    def record(self, case):
        if not case.problems:
            self.passed += 1
            return
        self.failed += 1
        print("FAIL %s" % case.label)
        for p in case.problems:
            print("  - " + p)
        text = network_generator.file_text(case.net)
        print("  file content:")
        for line in text.splitlines():
            print("    " + line)
        if self.save_dir:
            os.makedirs(self.save_dir, exist_ok=True)
            base = os.path.join(self.save_dir, case.label.replace(" ", "_").replace("/", "_"))
            with open(base + ".tauline", "w", encoding="utf-8") as f:
                f.write(text)
            with open(base + ".txt", "w", encoding="utf-8") as f:
                f.write("\n".join(case.problems) + "\n")

    def fail(self, text):
        self.failed += 1
        print("FAIL " + text)

    def finish(self, minimum_passed=0):
        if self.passed + self.failed < minimum_passed:
            print("FAIL only %d cases ran, %d required" % (self.passed + self.failed, minimum_passed))
            self.failed += 1
        print("%d passed, %d failed" % (self.passed, self.failed))
        sys.exit(0 if self.failed == 0 else 1)
