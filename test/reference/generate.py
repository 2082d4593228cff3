#!/usr/bin/env python3
"""Generates the reference fixtures from numpy and scipy, or checks the committed ones.

Every module test/reference/gen_*.py defines fixtures() -> dict[str, object]; each entry is written to
test/reference/fixtures/<name>.json. With --check the fixtures are regenerated in memory and compared with
the committed files numerically (rtol 1e-9, atol 1e-12 on every number, exact on everything else); a
difference beyond that, a missing file or a stale extra file fails the run.
"""
import importlib.util
import json
import math
import pathlib
import sys

HERE = pathlib.Path(__file__).resolve().parent
OUT = HERE / "fixtures"
RTOL = 1e-9
ATOL = 1e-12


def encode(obj):
    """Makes numpy values JSON-ready; non-finite floats become the strings 'inf', '-inf', 'nan'."""
    import numpy as np

    if isinstance(obj, dict):
        return {str(k): encode(v) for k, v in obj.items()}
    if isinstance(obj, (list, tuple)):
        return [encode(v) for v in obj]
    if isinstance(obj, np.ndarray):
        return encode(obj.tolist())
    if isinstance(obj, (np.bool_, bool)):
        return bool(obj)
    if isinstance(obj, (np.integer,)):
        return int(obj)
    if isinstance(obj, (np.floating, float)):
        v = float(obj)
        if math.isnan(v):
            return "nan"
        if math.isinf(v):
            return "inf" if v > 0 else "-inf"
        return v
    if isinstance(obj, complex) or isinstance(obj, np.complexfloating):
        return {"re": encode(obj.real), "im": encode(obj.imag)}
    return obj


def compare(a, b, path):
    """Returns a list of differences between two decoded fixtures."""
    if isinstance(a, dict) and isinstance(b, dict):
        if set(a) != set(b):
            return [f"{path}: keys differ {sorted(set(a) ^ set(b))}"]
        out = []
        for k in a:
            out += compare(a[k], b[k], f"{path}.{k}")
        return out
    if isinstance(a, list) and isinstance(b, list):
        if len(a) != len(b):
            return [f"{path}: length {len(a)} != {len(b)}"]
        out = []
        for i, (x, y) in enumerate(zip(a, b)):
            out += compare(x, y, f"{path}[{i}]")
            if len(out) > 20:
                break
        return out
    if isinstance(a, (int, float)) and isinstance(b, (int, float)) and not isinstance(a, bool):
        if abs(a - b) <= ATOL + RTOL * abs(b):
            return []
        return [f"{path}: {a} != {b}"]
    return [] if a == b else [f"{path}: {a!r} != {b!r}"]


def load_generators():
    gens = {}
    for f in sorted(HERE.glob("gen_*.py")):
        spec = importlib.util.spec_from_file_location(f.stem, f)
        mod = importlib.util.module_from_spec(spec)
        spec.loader.exec_module(mod)
        for name, data in mod.fixtures().items():
            if name in gens:
                raise SystemExit(f"fixture {name} defined twice")
            gens[name] = encode(data)
    return gens


def main():
    check = "--check" in sys.argv
    import numpy
    import scipy

    print(f"reference fixtures from numpy {numpy.__version__}, scipy {scipy.__version__}")
    fixtures = load_generators()
    OUT.mkdir(exist_ok=True)
    problems = []
    for name, data in fixtures.items():
        target = OUT / f"{name}.json"
        if check:
            if not target.exists():
                problems.append(f"{name}: committed fixture missing")
                continue
            committed = json.loads(target.read_text())
            problems += compare(data, committed, name)
        else:
            target.write_text(json.dumps(data, separators=(",", ":")) + "\n")
    if check:
        extra = {p.stem for p in OUT.glob("*.json")} - set(fixtures)
        problems += [f"{e}: committed fixture has no generator" for e in sorted(extra)]
        if problems:
            print("reference fixtures differ from the regenerated ones:")
            print("\n".join(problems[:50]))
            sys.exit(1)
        print(f"{len(fixtures)} reference fixtures match their regeneration")
    else:
        print(f"wrote {len(fixtures)} fixtures to {OUT}")


if __name__ == "__main__":
    main()
