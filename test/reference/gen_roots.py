"""Reference polynomials and their roots for test/core/roots.test.ts.

- roots_random / roots_fir: numpy.roots (companion-matrix eigenvalues) of seeded random polynomials and of
  scipy.signal.firwin low-pass filters; these roots are well enough conditioned that another LAPACK build
  reproduces them far inside the --check tolerance (checked by perturbing the coefficients by 1e-15).
- roots_butterworth: denominators of digital Butterworth low-passes (analog prototype poles mapped by the
  bilinear transform, multiplied out in plain Python so every platform gets the same bits, checked against
  scipy.signal.butter), with the true poles and the exact roots of the rounded coefficients computed by
  mpmath.polyroots at 80 digits. At order 40 the rounding of the coefficients alone moves the roots by ~0.2,
  so only the exact roots of the stored coefficients measure a root finder's accuracy.
- roots_repeated: polynomials with known repeated roots (multiplicities 2 to 4) and close distinct roots.
"""
import cmath
import math

import numpy as np
import scipy.signal as ss

from conditioning import EPS, ULPS, eigenvalue_root_error
from fixture import Fixture, Tol, pointwise

RANDOM_DEGREES = [1, 2, 3, 4, 5, 8, 16, 32, 64, 128, 256, 512]
FIR_TAPS = [9, 33, 129, 255, 513, 1025]
FIR_CUTOFF = 0.3
BUTTER_ORDERS = [4, 8, 20, 40]
BUTTER_CUTOFF = 0.2


def sorted_roots(r, coefficients=None):
    """Roots sorted by real part (to 1e-9), then imaginary part. With the coefficients they came from (numpy.roots),
    each root carries the tolerance of its eigenvalue error bound."""
    r = np.asarray(r, dtype=complex)
    r = r[np.lexsort((r.imag, np.round(r.real, 9)))]
    if coefficients is None:
        return {"re": r.real, "im": r.imag}
    bound = ULPS * EPS * eigenvalue_root_error(coefficients, r)
    why = "numpy.roots: n eps ||c|| ||(r^n..1)|| / |p'(r)| per root (LAPACK differs by CPU kernel)"
    return {"re": pointwise(r.real, bound, why), "im": pointwise(r.imag, bound, why)}


def roots_random():
    out = []
    for n in RANDOM_DEGREES:
        p = np.random.default_rng(100 + n).standard_normal(n + 1)
        out.append({"degree": n, "coefficients": p, "roots": sorted_roots(np.roots(p), p)})
    return out


def roots_fir():
    out = []
    for taps in FIR_TAPS:
        h = ss.firwin(taps, FIR_CUTOFF)
        out.append({"taps": taps, "coefficients": h, "roots": sorted_roots(np.roots(h), h)})
    return out


def multiply_out(roots):
    """Descending coefficients of prod (z - r), in plain Python arithmetic (same bits on every platform)."""
    p = [complex(1)]
    for r in roots:
        q = p + [0j]
        for k in range(1, len(q)):
            q[k] -= r * p[k - 1]
        p = q
    return [c.real for c in p]


def butterworth_poles(n, wn):
    """Digital Butterworth low-pass poles: analog prototype poles on a circle, prewarped, bilinear transform."""
    wc = math.tan(math.pi * wn / 2)
    poles = []
    for k in range(n):
        s = wc * cmath.exp(1j * math.pi * (2 * k + n + 1) / (2 * n))
        poles.append((1 + s) / (1 - s))
    return poles


def roots_butterworth():
    out = []
    for n in BUTTER_ORDERS:
        poles = butterworth_poles(n, BUTTER_CUTOFF)
        a = multiply_out(poles)
        _, a_scipy = ss.butter(n, BUTTER_CUTOFF)
        assert np.allclose(a, a_scipy, rtol=1e-9, atol=1e-12), f"order {n} disagrees with scipy.signal.butter"
        out.append({"order": n, "coefficients": a, "poles": sorted_roots(poles)})
    return out


def exact_roots(stored):
    """mpmath.polyroots at 80 digits of the committed coefficients: at order 40 an ulp of one coefficient moves
    the roots by ~0.2, so they are computed from the committed bits, never from this machine's rounding."""
    import mpmath

    mpmath.mp.dps = 80
    out = []
    for case in stored:
        exact = mpmath.polyroots([mpmath.mpf(c) for c in case["coefficients"]], maxsteps=800, extraprec=600)
        out.append({"exactRoots": sorted_roots([complex(r) for r in exact])})
    return out


def repeated_case(name, roots):
    """roots: (re, im, multiplicity) with im >= 0; a complex root implies its conjugate."""
    full = []
    for re, im, m in roots:
        full += [complex(re, im)] * m
        if im > 0:
            full += [complex(re, -im)] * m
    return {
        "name": name,
        "coefficients": multiply_out(full),
        "roots": [{"re": re, "im": im, "multiplicity": m} for re, im, m in roots],
    }


def roots_repeated():
    rng = np.random.default_rng(2024)
    pairs = [(float(r * math.cos(t)), float(r * math.sin(t)), 2) for r, t in zip(rng.uniform(0.4, 1.1, 8), rng.uniform(0.3, 2.8, 8))]
    return [
        {"name": "double at 0.8, typed coefficients", "coefficients": [1, -1.6, 0.64], "roots": [{"re": 0.8, "im": 0, "multiplicity": 2}]},
        repeated_case("triple at -0.5", [(-0.5, 0, 3)]),
        repeated_case("fourfold at 0.5", [(0.5, 0, 4)]),
        repeated_case("double pair on the unit circle", [(math.cos(1.0), math.sin(1.0), 2), (-1.0, 0, 2)]),
        repeated_case("double pair, triple, simple", [(0.6 * math.cos(1), 0.6 * math.sin(1), 2), (0.9, 0, 3), (-0.4, 0, 1)]),
        repeated_case("double next to a simple root", [(0.5, 0, 2), (0.51, 0, 1)]),
        repeated_case("distinct, 1e-4 apart", [(0.8, 0, 1), (0.8001, 0, 1)]),
        repeated_case("distinct pair, 1e-5 apart", [(0.3, 0.7, 1), (0.3, 0.70001, 1)]),
        repeated_case("eight double pairs", pairs),
    ]


PLAIN_PYTHON = Tol(rel=ULPS * EPS, abs=ULPS * EPS, why="plain Python arithmetic and libm sin/cos/tan: an ulp or two")


def fixtures():
    return {
        "roots_random": Fixture(
            roots_random(), tol=Tol(rel=0, why="seeded PCG64 coefficients; roots carry their own bounds")
        ),
        "roots_fir": Fixture(
            roots_fir(),
            tol=Tol(rel=ULPS * EPS, abs=ULPS * EPS * 1e-3, why="firwin: windowed sinc from np.sin/np.cos, ulps"),
        ),
        "roots_butterworth": Fixture(
            roots_butterworth(),
            tol=PLAIN_PYTHON,
            fields={"exactRoots.*": Tol(rel=1e-14, abs=1e-15, why="mpmath at 80 digits of the committed coefficients")},
            derive=exact_roots,
        ),
        "roots_repeated": Fixture(roots_repeated(), tol=PLAIN_PYTHON),
    }
