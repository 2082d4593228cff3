"""Reference stability cases: random real polynomials classified by the largest root radius (numpy.roots).

Roots are drawn away from the unit circle (|r| - 1 outside +-0.02) so rounding in the coefficients cannot
move a root across it; boundary cases are hand-made in the tests. Each largest radius carries the error bound of
numpy.roots for that root (conditioning.py); the trap's expanded denominator is too ill-conditioned for
numpy.roots to be a reference, so its largest root radius comes from mpmath on the committed coefficients.
"""
import numpy as np
from scipy import signal

from conditioning import EPS, ULPS, eigenvalue_root_error
from fixture import Fixture, Tol, Tolerated
from gen_response import exact_max_radius


def random_polys(rng, count):
    out = []
    while len(out) < count:
        deg = int(rng.integers(1, 13))
        roots = []
        while len(roots) < deg:
            r = rng.uniform(0.05, 1.4)
            if abs(r - 1) < 0.02:
                continue
            t = rng.uniform(0, np.pi)
            if deg - len(roots) >= 2 and rng.random() < 0.7:
                roots += [r * np.exp(1j * t), r * np.exp(-1j * t)]
            else:
                roots.append(r * (1 if rng.random() < 0.5 else -1))
        a = np.real(np.poly(roots)) * rng.uniform(0.5, 3)
        found = np.roots(a)
        radius = float(np.max(np.abs(found)))
        bound = float(ULPS * EPS * np.max(eigenvalue_root_error(a, found)))
        assert bound < 0.01, "a root this ill-conditioned could cross the circle on another machine"
        out.append(
            {
                "a": Tolerated(a, Tol(rel=1e-13, abs=1e-13 * float(np.max(np.abs(a))), why="np.poly of the roots: ulps of the largest coefficient")),
                "max_radius": Tolerated(radius, Tol(rel=0, abs=bound, why="numpy.roots: the eigenvalue error bound of its roots")),
                "stable": radius < 1,
            }
        )
    return out


def fixtures():
    rng = np.random.default_rng(7321)
    z, p, k = signal.butter(8, 10, fs=8000, output="zpk")
    _, a = signal.zpk2tf(z, p, k)
    return {
        "stability_random": Fixture(
            random_polys(rng, 240), tol=Tol(rel=0, why="every number carries its own tolerance")
        ),
        "stability_trap": Fixture(
            {"a": a, "true_max_radius": float(np.max(np.abs(p)))},
            tol=Tol(rel=1e-13, why="zpk2tf and scipy.signal.butter: a few ulps"),
            derive=lambda f: {"exact_max_radius": exact_max_radius(f["a"])},
        ),
    }
