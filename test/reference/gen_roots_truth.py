"""High-precision truth for typed coefficients: the exact roots and stability of the rational numbers the doubles are.

A user who types or pastes b and a means those doubles; every double is an exact rational, so the polynomial has
exact roots, and a verdict about it is a fact. mpmath.polyroots at 60 digits (with several hundred extra bits
inside the iteration) gives those roots; for the exactly representable (z ± 1)^m the roots are known without it.
numpy.roots' figures on the same doubles are kept beside ours as a comparison (they depend on the LAPACK
build and CPU, so they are checked only to an order of magnitude on regeneration).

- roots_truth_designs: 112 typed designs from scipy.signal (Butterworth, Chebyshev I and II, elliptic; low-,
  high-, band-pass and band-stop; orders 2-20; edges from 1e-4 fs to 0.45 fs) plus the designs named in
  issue 10 (elliptic 6th order at 20 Hz of 48 kHz, Butterworth 8th order at 50 Hz of 48 kHz, elliptic 12th
  order at 10 Hz of 1 kHz).
- roots_truth_special: pole pairs straddling the unit circle (separations 1e-8 to 1e-3, real and complex),
  pairs just inside it, Wilkinson-type polynomials prod (z - k/n), and (z + 1)^m, (z - 1)^m for m = 1..16.

Per polynomial: the doubles (descending powers of z, i.e. b or a in powers of z^-1) and, derived from the
committed doubles so that every machine checks the same truth, the true roots rounded to double, for
denominators the true verdict, and numpy.roots' set backward error
max_k |p_k - q_k| / max_k |p_k| (q = p_0 prod (z - r_i) multiplied out at 60 digits) and forward error
(largest distance from a true root to its match among numpy's roots).
"""
import math
from fractions import Fraction

import mpmath
import numpy as np
from scipy import signal

from conditioning import EPS, ULPS
from fixture import Fixture, Tol

DPS = 60
FAMILIES = ["butter", "cheby1", "cheby2", "ellip"]
BANDS = ["lowpass", "highpass", "bandpass", "bandstop"]
EDGES = [1e-4, 1e-3, 5e-3, 0.02, 0.1, 0.25, 0.45]  # fractions of the sample rate
ORDERS_LH = [2, 4, 8, 12, 16, 20, 3, 6, 10]
ORDERS_BAND = [2, 3, 4, 6, 8, 10, 5]
SEPARATIONS = [1e-8, 1e-7, 1e-6, 1e-5, 1e-4, 1e-3]


def design(family, band, order, edge):
    wn = 2 * edge if band in ("lowpass", "highpass") else [2 * 0.7 * edge, 2 * edge]
    if family == "butter":
        return signal.butter(order, wn, band)
    if family == "cheby1":
        return signal.cheby1(order, 1, wn, band)
    if family == "cheby2":
        return signal.cheby2(order, 40, wn, band)
    return signal.ellip(order, 0.5, 60, wn, band)


def trimmed(c):
    c = [float(x) for x in c]
    while c and c[0] == 0:
        c = c[1:]
    return c


def exact_roots(c):
    """Roots of the exact rational polynomial of the doubles c (descending), at DPS digits."""
    mpmath.mp.dps = DPS
    coeffs = [mpmath.mpf(x) for x in c]
    for extra in (300, 1200, 4000):
        try:
            roots, err = mpmath.polyroots(coeffs, maxsteps=4000, extraprec=extra, error=True)
        except mpmath.libmp.libhyper.NoConvergence:
            continue
        if err < mpmath.mpf(10) ** (-40):
            return [mpmath.mpc(r) for r in roots]
    raise RuntimeError(f"mpmath.polyroots did not converge for {c}")


def set_backward_error(c, roots, dps=DPS):
    """max_k |c_k - q_k| / max_k |c_k| with q = c_0 prod (z - r) multiplied out at dps digits."""
    mpmath.mp.dps = dps
    q = [mpmath.mpc(1)]
    for r in roots:
        r = mpmath.mpc(complex(r))
        q = [a - r * b for a, b in zip(q + [0], [0] + q)]
    scale = max(abs(x) for x in c)
    return float(max(abs(mpmath.mpf(x) - c[0] * y) for x, y in zip(c, q)) / scale)


def forward_error(truth, found):
    """Largest distance from a true root to its partner under a greedy nearest matching."""
    left = [complex(r) for r in found]
    worst = 0.0
    for t in sorted((complex(r) for r in truth), key=lambda z: (z.real, z.imag)):
        k = min(range(len(left)), key=lambda j: abs(left[j] - t))
        worst = max(worst, abs(left.pop(k) - t))
    return worst


def exact_verdict(c, roots):
    """'stable' / 'marginal' / 'unstable' for the exact polynomial: roots at +-1 decided with fractions."""
    frac = [Fraction(x) for x in c]
    on = 0
    for z in (1, -1):
        k = 0
        p = frac
        while len(p) > 1 and sum(x * z ** (len(p) - 1 - i) for i, x in enumerate(p)) == 0:
            k += 1
            # synthetic division by (z - z0)
            q = [p[0]]
            for x in p[1:-1]:
                q.append(x + q[-1] * z)
            p = q
        if k > 1:
            return "unstable"
        on += k
    radii = [abs(r) for r in roots if not (abs(r.imag) < 1e-45 and abs(abs(r.real) - 1) < 1e-45)]
    close = [r for r in radii if abs(r - 1) < mpmath.mpf(10) ** -35]
    if close:
        raise RuntimeError(f"a complex root within 1e-35 of the unit circle: {c}")
    if any(r > 1 for r in radii):
        return "unstable"
    return "marginal" if on else "stable"


def as_pairs(roots):
    return {"re": [float(mpmath.re(r)) for r in roots], "im": [float(mpmath.im(r)) for r in roots]}


def poly_input(c, role, known_root=None):
    """A polynomial as stored: its doubles, its role, and for (z -+ 1)^m the exactly known root."""
    case = {"role": role, "coefficients": trimmed(c)}
    if known_root is not None:
        case["knownRoot"] = known_root
    return case


def poly_outputs(case):
    """Truth and numpy's figures for one stored polynomial (computed from the committed doubles)."""
    c = [float(x) for x in case["coefficients"]]
    if "knownRoot" in case:
        truth = [mpmath.mpc(case["knownRoot"])] * (len(c) - 1)
    else:
        truth = exact_roots(c)
    found = np.roots(c) if len(c) > 1 else np.array([])
    out = {
        "roots": as_pairs(truth),
        "numpyBackwardError": set_backward_error(c, found) if len(c) > 1 else 0.0,
        "numpyForwardError": forward_error(truth, found) if len(c) > 1 else 0.0,
    }
    if case["role"] == "a":
        out["verdict"] = exact_verdict(c, truth)
    return out


def designs():
    out = []
    for fi, family in enumerate(FAMILIES):
        for bi, band in enumerate(BANDS):
            orders = ORDERS_LH if band in ("lowpass", "highpass") else ORDERS_BAND
            for ei, edge in enumerate(EDGES):
                order = orders[(3 * fi + 2 * bi + ei) % len(orders)]
                b, a = design(family, band, order, edge)
                name = f"{family} {band} order {order} at {edge:g} fs"
                out.append({"name": name, "b": poly_input(b, "b"), "a": poly_input(a, "a")})
    named = [
        ("ellip(6, 0.5, 60, 20, fs=48000)", signal.ellip(6, 0.5, 60, 20, fs=48000)),
        ("butter(8, 50, fs=48000)", signal.butter(8, 50, fs=48000)),
        ("ellip(12, 0.5, 60, 10, fs=1000)", signal.ellip(12, 0.5, 60, 10, fs=1000)),
    ]
    for name, (b, a) in named:
        out.append({"name": name, "b": poly_input(b, "b"), "a": poly_input(a, "a")})
    return out


def multiply_out(roots):
    """Descending coefficients of prod (z - r) in plain Python doubles (the same bits on every platform)."""
    p = [complex(1)]
    for r in roots:
        q = p + [0j]
        for k in range(1, len(q)):
            q[k] -= r * p[k - 1]
        p = q
    return [x.real for x in p]


def special():
    out = []
    for s in SEPARATIONS:
        out.append({"name": f"real pair 1 -+ {s:g}/2", **poly_input(multiply_out([1 - s / 2, 1 + s / 2]), "a")})
        out.append({"name": f"real pair inside, 1 - {s:g} and 1 - {s:g}/2", **poly_input(multiply_out([1 - s, 1 - s / 2]), "a")})
        t = 0.3
        pair = [(1 - s / 2) * complex(math.cos(t), math.sin(t)), (1 + s / 2) * complex(math.cos(t), math.sin(t))]
        out.append({"name": f"complex pairs at 0.3 rad, radii 1 -+ {s:g}/2", **poly_input(multiply_out(pair + [z.conjugate() for z in pair]), "a")})
    out.append({"name": "typed 1, -1.9999994, 0.99999939999993", **poly_input([1, -1.9999994, 0.99999939999993], "a")})
    for n in (10, 15, 20):
        out.append({"name": f"Wilkinson type, roots k/{n + 1}", **poly_input(multiply_out([k / (n + 1) for k in range(1, n + 1)]), "a")})
    for n in (10, 20):
        out.append({"name": f"Wilkinson type, roots k/{n} (one at 1)", **poly_input(multiply_out([k / n for k in range(1, n + 1)]), "a")})
    for m in range(1, 17):
        for z0 in (-1, 1):
            c = [float(math.comb(m, k) * (-z0) ** k) for k in range(m + 1)]
            out.append({"name": f"(z {'+' if z0 < 0 else '-'} 1)^{m}", **poly_input(c, "a", known_root=z0)})
    return out


def butterworth_denominator(n, cutoff=0.2):
    """Order-n digital Butterworth low-pass denominator (cutoff a fraction of Nyquist) by the bilinear transform,
    its poles multiplied out in plain Python doubles: the polynomial `npm run bench -- roots` times."""
    wc = math.tan(math.pi * cutoff / 2)
    poles = []
    for k in range(n):
        s = wc * complex(math.cos(math.pi * (2 * k + n + 1) / (2 * n)), math.sin(math.pi * (2 * k + n + 1) / (2 * n)))
        poles.append((1 + s) / (1 - s))
    return multiply_out(poles)


def high_degree():
    """Clustered denominators of high degree, where a set must still multiply out to the coefficients."""
    return [{"name": f"Butterworth denominator, order {n}, cutoff 0.2 of Nyquist", **poly_input(butterworth_denominator(n), "a")} for n in (128, 256, 512)]


def mulberry32(seed):
    """The project's seeded generator (src/core/random.ts) in Python: the same numbers on [0, 1) for a seed."""
    state = seed & 0xFFFFFFFF

    def imul(a, b):
        return (a * b) & 0xFFFFFFFF

    def next_value():
        nonlocal state
        state = (state + 0x6D2B79F5) & 0xFFFFFFFF
        t = state
        t = imul(t ^ (t >> 15), t | 1)
        t ^= (t + imul(t ^ (t >> 7), t | 61)) & 0xFFFFFFFF
        return ((t ^ (t >> 14)) & 0xFFFFFFFF) / 4294967296

    return next_value


def multiply_out_pairs(pairs):
    """prod over (re, im, multiplicity) of z^2 - 2 re z + (re^2 + im^2), as real quadratics in plain doubles."""
    p = [1.0]
    for re, im, mult in pairs:
        factor = [1.0, -2 * re, re * re + im * im]
        for _ in range(mult):
            q = [0.0] * (len(p) + 2)
            for i, a in enumerate(p):
                if a == 0:
                    continue
                for j, b in enumerate(factor):
                    q[i + j] += a * b
            p = q
    return p


def repeated_roots(n, seed=None):
    """n/4 seeded conjugate pairs, each a double root, moduli 0.3 to 1.2: the repeated-roots polynomial of
    `npm run bench -- roots` with the default seed (same seed and construction; its doubles may differ from the
    bench's by the ulps in which Python's and V8's cos and sin differ)."""
    u = mulberry32(5000 + n if seed is None else seed)
    pairs = []
    for _ in range(n // 4):
        r = 0.3 + 0.9 * u()
        a = 0.1 + (math.pi - 0.2) * u()
        pairs.append((r * math.cos(a), r * math.sin(a), 2))
    return multiply_out_pairs(pairs)


def degree_768_1024():
    """Degrees 768 and 1024, where approximations that shared one root, real approximations standing where a
    conjugate pair belonged, and a subnormal constant coefficient (Butterworth at 0.5 of Nyquist) used to leave
    roots out of the set."""
    butter = [(1024, 0.2), (768, 0.3), (1024, 0.5), (768, 0.5)]
    return [
        {"name": f"Butterworth denominator, order {n}, cutoff {f:g} of Nyquist", **poly_input(butterworth_denominator(n, f), "a")}
        for n, f in butter
    ] + [
        {"name": "256 seeded double conjugate pairs, degree 1024", **poly_input(repeated_roots(1024), "a")},
        {"name": "256 seeded double conjugate pairs, degree 1024, seed 3", **poly_input(repeated_roots(1024, 3), "a")},
        {"name": "256 seeded double conjugate pairs, degree 1024, seed 5", **poly_input(repeated_roots(1024, 5), "a")},
    ]


def derive_high_degree(stored):
    """numpy.roots' set backward error only (mpmath's polyroots at degree 512 would take hours)."""
    out = []
    for case in stored:
        c = [float(x) for x in case["coefficients"]]
        out.append({"numpyBackwardError": set_backward_error(c, np.roots(c))})
    return out


# At degree 1024 the partial products of numpy's roots, taken in numpy's order, grow far beyond the final
# coefficients (to about 1e120 for the repeated-roots polynomial, whose largest coefficient is 2e43), so 60 digits
# leave nothing of the difference; 400 digits do (150 and 300 digits give the same double).
DPS_DEGREE_1024 = 400


def derive_degree_1024(stored):
    """numpy.roots' set backward error, multiplied out by mpmath at DPS_DEGREE_1024 digits."""
    out = []
    for case in stored:
        c = [float(x) for x in case["coefficients"]]
        out.append({"numpyBackwardError": set_backward_error(c, np.roots(c), DPS_DEGREE_1024)})
    mpmath.mp.dps = DPS
    return out


def derive_designs(stored):
    return [{"b": poly_outputs(d["b"]), "a": poly_outputs(d["a"])} for d in stored]


def derive_special(stored):
    return [poly_outputs(case) for case in stored]


# The doubles come from scipy (numpy's sin, cos, exp and products) or from plain Python: a few ulps apart between
# machines. Everything else is computed from the committed doubles: mpmath's roots are then the same everywhere,
# while numpy.roots' figures depend on the LAPACK build and the CPU and are kept only as a comparison.
COEFFICIENTS = Tol(rel=ULPS * EPS, abs=1e-300, why="scipy designs and plain-Python products: ulps of each double")
TRUTH = Tol(rel=1e-14, abs=1e-15, why="mpmath.polyroots at 60 digits of the committed doubles, rounded to double")
NUMPY = {
    "*numpyBackwardError": Tol(
        rel=9, abs=1e-12, why="numpy.roots depends on LAPACK and the CPU: an order of magnitude, below 1e-12 alike"
    ),
    "*numpyForwardError": Tol(
        rel=9, abs=1e-6, why="numpy.roots depends on LAPACK and the CPU: an order of magnitude, below 1e-6 alike"
    ),
}


def fixtures():
    return {
        "roots_truth_designs": Fixture(
            designs(), tol=COEFFICIENTS, fields={"*roots.*": TRUTH, **NUMPY}, derive=derive_designs
        ),
        "roots_truth_special": Fixture(special(), tol=COEFFICIENTS, fields={"roots.*": TRUTH, **NUMPY}, derive=derive_special),
        "roots_truth_high_degree": Fixture(
            high_degree(), tol=COEFFICIENTS, fields={**NUMPY}, derive=derive_high_degree
        ),
        "roots_truth_degree_768_1024": Fixture(
            degree_768_1024(), tol=COEFFICIENTS, fields={**NUMPY}, derive=derive_degree_1024
        ),
    }
