"""How a reference fixture states the tolerance its regeneration is held to.

A generator (test/reference/gen_*.py) returns from fixtures() a dict {name: Fixture(...)}. Each Fixture says,
beside its data, how far a regeneration on another machine may move each number and why (the conditioning
argument), because numpy and scipy do not give the same bits everywhere: OpenBLAS picks a kernel per CPU
(OPENBLAS_CORETYPE), numpy picks SIMD loops per CPU (sin, cos, exp, log, sums), and some kernels even depend on
how an array happens to be aligned in memory. A well-conditioned output moves by a few units in the last place;
an ill-conditioned one moves by that times its condition number.

    Fixture(
        {"coefficients": a, "roots": r},
        tol=Tol(rel=1e-12, why="numpy.roots of well separated roots: eigenvalue condition below 1e3"),
        fields={"coefficients": Tol(rel=4e-16, why="multiplied out in plain Python: the same bits everywhere")},
    )

- tol is the default for every number in the fixture; fields maps key paths to their own Tol. A key path is the
  dict keys from the fixture's top down joined by '.', list positions left out ("cases.y", "roots.re"); a field
  pattern matches with fnmatch ('*' crosses dots: "*group_delay"), and the first matching pattern wins.
- Tolerated(value, tol, fields) inside the data gives one part (a list entry, say) its own tolerances, stated
  where it is built: a degree-512 polynomial's roots deserve a looser bound than a quadratic's.
  pointwise(values, abs_tols, why) gives every entry of a list its own bound (a response in dB is good to ulps
  in the pass band and loses digits next to a zero on the circle); conditioning.py computes such bounds.
- Tol(..., period=2 * math.pi) compares angles modulo the period, so -pi and pi agree.
- A value the reference library cannot compute reliably (its error bound says so) is not a fixture: store None
  there and let the tests skip it, or give the truth from mpmath instead.
- Outputs that amplify rounding of their inputs (filtering with a 10th-order expanded polynomial, say) are
  computed from the committed inputs: Fixture(inputs, derive=fn). The inputs are checked against the committed
  ones with their tolerances; fn(stored) then gets the inputs as they are stored (the committed file's values
  when it has them, else the fresh ones after a JSON round trip) and returns the outputs, which are merged into
  the inputs. So an output that depends on the last bit of its inputs is computed from the same bits everywhere.
- Numbers compare as |fresh - committed| <= abs + rel * |committed|; integers, booleans, strings, None and
  non-finite values ('inf', '-inf', 'nan') must be equal.
"""
from __future__ import annotations

import fnmatch
import math
from dataclasses import dataclass, field
from typing import Any, Callable, Optional


@dataclass(frozen=True)
class Tol:
    """A tolerance |fresh - committed| <= abs + rel * |committed|, and the reason it is that size."""

    rel: float
    abs: float = 0.0
    why: str = ""
    period: Optional[float] = None  # angles: compare modulo this (2 pi), so -pi and pi agree

    def difference(self, fresh: float, committed: float) -> float:
        d = abs(fresh - committed)
        if self.period:
            d = abs(math.remainder(fresh - committed, self.period))
        return d

    def __post_init__(self):
        if not self.why.strip():
            raise ValueError("a Tol must say why it is that size (why=...)")
        if self.rel < 0 or self.abs < 0:
            raise ValueError("tolerances are not negative")

    def allowed(self, committed: float) -> float:
        return self.abs + self.rel * abs(committed)

    def describe(self) -> str:
        parts = [f"rel {self.rel:g}"] + ([f"abs {self.abs:g}"] if self.abs else [])
        parts += [f"modulo {self.period:g}"] if self.period else []
        return ", ".join(parts)


@dataclass
class Tolerated:
    """A part of a fixture with its own default tolerance and field tolerances (key paths relative to it)."""

    value: Any
    tol: Optional[Tol] = None
    fields: dict[str, Tol] = field(default_factory=dict)


@dataclass
class Fixture:
    """One fixture file: data (or inputs plus derive), its default tolerance and per-field tolerances."""

    data: Any
    tol: Tol
    fields: dict[str, Tol] = field(default_factory=dict)
    derive: Optional[Callable[[Any], Any]] = None


def pointwise(values, abs_tols, why: str, rel: float = 0.0, period: Optional[float] = None):
    """A list whose every entry carries its own tolerance: abs_tols[i] (+ rel) for values[i].

    For outputs whose conditioning changes along the list, such as a magnitude in dB that is well conditioned in
    the pass band and loses digits next to a zero on the unit circle. An infinite abs_tols[i] says the value
    cannot be computed reliably; a generator should rather leave such a value out of the fixture.
    """
    return [
        Tolerated(v, Tol(rel=rel, abs=float(t), why=why, period=period)) for v, t in zip(list(values), list(abs_tols))
    ]


# Default for a generator that returns plain data instead of a Fixture: the check before tolerances were stated
# per fixture. The check names every fixture that relies on it.
UNSTATED = Tol(rel=1e-9, abs=1e-12, why="no tolerance stated: the old blanket rtol 1e-9, atol 1e-12")


def encode(obj):
    """Makes numpy values JSON-ready; non-finite floats become the strings 'inf', '-inf', 'nan'.

    Tolerated markers are kept (strip() removes them for writing).
    """
    import numpy as np

    if isinstance(obj, Tolerated):
        return Tolerated(encode(obj.value), obj.tol, obj.fields)
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


def strip(obj):
    """The JSON data of an encoded tree: Tolerated markers replaced by their values."""
    if isinstance(obj, Tolerated):
        return strip(obj.value)
    if isinstance(obj, dict):
        return {k: strip(v) for k, v in obj.items()}
    if isinstance(obj, list):
        return [strip(v) for v in obj]
    return obj


def revive(obj):
    """JSON data with 'inf', '-inf', 'nan' turned back into floats (what derive functions receive)."""
    if isinstance(obj, dict):
        return {k: revive(v) for k, v in obj.items()}
    if isinstance(obj, list):
        return [revive(v) for v in obj]
    if obj in ("inf", "-inf", "nan"):
        return float(obj)
    return obj


def merge(inputs, outputs, path="fixture"):
    """Deep merge of derived outputs into the inputs (dicts by key, equal-length lists by position)."""
    if isinstance(inputs, Tolerated):
        return Tolerated(merge(inputs.value, outputs, path), inputs.tol, inputs.fields)
    if isinstance(outputs, Tolerated):
        return Tolerated(merge(inputs, outputs.value, path), outputs.tol, outputs.fields)
    if isinstance(inputs, dict) and isinstance(outputs, dict):
        out = dict(inputs)
        for k, v in outputs.items():
            out[k] = merge(inputs[k], v, f"{path}.{k}") if k in inputs else v
        return out
    if isinstance(inputs, list) and isinstance(outputs, list) and len(inputs) == len(outputs):
        return [merge(a, b, f"{path}[{i}]") for i, (a, b) in enumerate(zip(inputs, outputs))]
    raise ValueError(f"{path}: derived output overlaps an input")


def project(committed, shape):
    """The part of the committed data that has the shape of the (encoded) inputs, or None if it does not fit."""
    if isinstance(shape, Tolerated):
        return project(committed, shape.value)
    if isinstance(shape, dict):
        if not isinstance(committed, dict) or not set(shape) <= set(committed):
            return None
        out = {}
        for k, v in shape.items():
            p = project(committed[k], v)
            if p is None and v is not None:
                return None
            out[k] = p
        return out
    if isinstance(shape, list):
        if not isinstance(committed, list) or len(committed) != len(shape):
            return None
        out = []
        for c, s in zip(committed, shape):
            p = project(c, s)
            if p is None and s is not None:
                return None
            out.append(p)
        return out
    return committed


@dataclass
class Difference:
    path: str
    fresh: Any
    committed: Any
    allowed: Optional[float]  # None: must be equal
    tol: Optional[Tol]

    def __str__(self):
        if self.allowed is None:
            return f"{self.path}: {self.fresh!r} != committed {self.committed!r}"
        d = self.tol.difference(self.fresh, self.committed)
        return (
            f"{self.path}: {self.fresh!r} vs committed {self.committed!r}: difference {d:.3g} > allowed "
            f"{self.allowed:.3g} ({self.tol.describe()}: {self.tol.why})"
        )


@dataclass
class Comparison:
    """Differences beyond tolerance, and per key path the worst ratio |difference| / allowed seen."""

    differences: list[Difference] = field(default_factory=list)
    worst: dict[str, tuple[float, Tol]] = field(default_factory=dict)
    compared: int = 0

    def worst_ratio(self) -> float:
        return max((r for r, _ in self.worst.values()), default=0.0)


class _Context:
    def __init__(self, tol: Tol, fields: dict[str, Tol], base: str):
        self.tol, self.fields, self.base = tol, fields, base

    def tol_for(self, keypath: str) -> Tol:
        rel = keypath[len(self.base) + 1 :] if self.base and keypath.startswith(self.base + ".") else keypath
        if self.base and keypath == self.base:
            rel = ""
        for pattern, tol in self.fields.items():
            if fnmatch.fnmatchcase(rel, pattern):
                return tol
        return self.tol


def _is_number(v):
    return isinstance(v, (int, float)) and not isinstance(v, bool)


def compare(fresh, committed, tol: Tol, fields: dict[str, Tol], name: str) -> Comparison:
    """Compares an encoded fresh tree (with Tolerated markers) with the committed JSON data."""
    result = Comparison()
    contexts = [_Context(tol, fields, "")]

    def walk(a, b, path, keypath):
        if isinstance(a, Tolerated):
            contexts.append(_Context(a.tol or contexts[-1].tol_for(keypath), a.fields, keypath))
            walk(a.value, b, path, keypath)
            contexts.pop()
            return
        if isinstance(a, dict) and isinstance(b, dict):
            if set(a) != set(b):
                result.differences.append(
                    Difference(path, f"keys {sorted(a)}", f"keys {sorted(b)}", None, None)
                )
                return
            for k in a:
                walk(a[k], b[k], f"{path}.{k}", f"{keypath}.{k}" if keypath else k)
            return
        if isinstance(a, list) and isinstance(b, list):
            if len(a) != len(b):
                result.differences.append(Difference(path, f"length {len(a)}", f"length {len(b)}", None, None))
                return
            for i, (x, y) in enumerate(zip(a, b)):
                walk(x, y, f"{path}[{i}]", keypath)
            return
        result.compared += 1
        if _is_number(a) and _is_number(b) and not (isinstance(a, int) and isinstance(b, int)):
            t = contexts[-1].tol_for(keypath)
            allowed = t.allowed(b)
            d = t.difference(a, b)
            ratio = 0.0 if d == 0 else (d / allowed if allowed > 0 else math.inf)
            prev = result.worst.get(keypath)
            if prev is None or ratio > prev[0]:
                result.worst[keypath] = (ratio, t)
            if ratio > 1:
                result.differences.append(Difference(path, a, b, allowed, t))
            return
        if a != b:
            result.differences.append(Difference(path, a, b, None, None))

    walk(fresh, committed, name, "")
    return result
