#!/usr/bin/env python3
"""Regenerates the reference fixtures from numpy/scipy/mpmath, or checks the committed ones.

Every module test/reference/gen_*.py defines fixtures() -> {name: Fixture}; each is stored as
test/reference/fixtures/<name>.json. A Fixture states beside its data the tolerance a regeneration on another
machine is held to, and why (see fixture.py and DEVELOPERS.md, "Reference fixtures").

    generate.py --check      regenerate in memory and compare with the committed files under each fixture's
                             tolerances; fails on a difference beyond them, a missing file or a stale extra file
    generate.py              the same comparison, then write the fixtures that are new, changed shape or moved
                             beyond their tolerance (a fixture within its tolerance is left as committed)
    --force                  write every fixture from this machine's numbers
    --only a,b               only these fixtures (every generator still runs)
    --report                 the worst |difference| / allowed for every key path, not just per fixture
    --quiet                  print only the fixtures that are not ok, and the summary
"""
import argparse
import importlib.util
import json
import os
import pathlib
import sys

HERE = pathlib.Path(__file__).resolve().parent
OUT = HERE / "fixtures"
sys.path.insert(0, str(HERE))

from fixture import UNSTATED, Fixture, compare, encode, merge, project, revive, strip  # noqa: E402

MAX_LISTED = 12  # differences printed per fixture


def load_generators():
    gens = {}
    for f in sorted(HERE.glob("gen_*.py")):
        spec = importlib.util.spec_from_file_location(f.stem, f)
        mod = importlib.util.module_from_spec(spec)
        spec.loader.exec_module(mod)
        for name, fx in mod.fixtures().items():
            if name in gens:
                raise SystemExit(f"fixture {name} defined twice")
            gens[name] = (fx if isinstance(fx, Fixture) else Fixture(fx, UNSTATED), f.name)
    return gens


def read_committed(name):
    target = OUT / f"{name}.json"
    return json.loads(target.read_text()) if target.exists() else None


def build(fx: Fixture, committed, force: bool):
    """(fresh encoded tree to compare, JSON data to store if written, comparison of the inputs or None)."""
    fresh_inputs = encode(fx.data)
    if fx.derive is None:
        return fresh_inputs, strip(fresh_inputs), None
    stored_inputs = strip(fresh_inputs)
    input_check = None
    if committed is not None and not force:
        old = project(committed, fresh_inputs)
        if old is not None:
            input_check = compare(fresh_inputs, old, fx.tol, fx.fields, "inputs")
            if not input_check.differences:
                stored_inputs = old  # outputs from the committed bits: the same on every machine
    outputs = encode(fx.derive(revive(stored_inputs)))
    return merge(fresh_inputs, outputs), strip(merge(stored_inputs, outputs)), input_check


def main():
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--check", action="store_true")
    ap.add_argument("--force", action="store_true")
    ap.add_argument("--only", default="")
    ap.add_argument("--report", action="store_true")
    ap.add_argument("--quiet", action="store_true")
    args = ap.parse_args()
    import mpmath
    import numpy
    import scipy

    blas = os.environ.get("OPENBLAS_CORETYPE") or "unset"
    print(
        f"reference fixtures from numpy {numpy.__version__}, scipy {scipy.__version__}, mpmath {mpmath.__version__}"
        f" (OPENBLAS_CORETYPE {blas})"
    )
    fixtures = load_generators()
    only = {n for n in args.only.split(",") if n}
    unknown = only - set(fixtures)
    if unknown:
        raise SystemExit(f"no generator defines {', '.join(sorted(unknown))}")
    OUT.mkdir(exist_ok=True)
    failed, written, unstated = [], [], []
    width = max(len(n) for n in fixtures)
    for name, (fx, source) in fixtures.items():
        if only and name not in only:
            continue
        if fx.tol is UNSTATED:
            unstated.append(name)
        committed = read_committed(name)
        fresh, data, _ = build(fx, committed, args.force and not args.check)
        if committed is None:
            status, detail = "new", f"no committed file ({source})"
            result = None
        else:
            result = compare(fresh, committed, fx.tol, fx.fields, name)
            worst_path = max(result.worst, key=lambda k: result.worst[k][0], default="")
            ratio = result.worst_ratio()
            detail = f"{result.compared:6d} values, worst {ratio:8.2g} of tolerance" + (
                f" at {worst_path or '(top)'}" if ratio > 0 else ""
            )
            status = "DIFF" if result.differences else "ok"
        if args.check:
            if status != "ok":
                failed.append(name)
        elif status != "ok" or args.force:
            (OUT / f"{name}.json").write_text(json.dumps(data, separators=(",", ":")) + "\n")
            written.append(name)
            status = "wrote" if status == "ok" else f"{status}>wrote"
        if not (args.quiet and status == "ok"):
            print(f"  {status:10s} {name:{width}s} {detail}")
        if result is not None:
            for d in result.differences[:MAX_LISTED]:
                print(f"      {d}")
            if len(result.differences) > MAX_LISTED:
                print(f"      ... and {len(result.differences) - MAX_LISTED} more")
            if args.report:
                for path, (ratio, tol) in sorted(result.worst.items()):
                    print(f"      {path or '(top)':40s} {ratio:8.2g} of {tol.describe()}")
    if unstated:
        print(f"{len(unstated)} fixtures state no tolerance and are held to {UNSTATED.describe()}: {', '.join(unstated)}")
    if args.check:
        if not only:
            extra = {p.stem for p in OUT.glob("*.json")} - set(fixtures)
            for e in sorted(extra):
                print(f"  STALE      {e}: committed fixture has no generator")
                failed.append(e)
        if failed:
            print(f"reference fixtures differ from their regeneration beyond the stated tolerances: {', '.join(failed)}")
            sys.exit(1)
        print(f"{len(fixtures) if not only else len(only)} reference fixtures match their regeneration within tolerance")
    else:
        print(f"wrote {len(written)} fixtures to {OUT}" + (f": {', '.join(written)}" if written else ""))


if __name__ == "__main__":
    main()
