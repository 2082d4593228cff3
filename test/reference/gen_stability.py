"""Reference stability cases: random real polynomials classified by the largest root radius (numpy.roots).

Roots are drawn away from the unit circle (|r| - 1 outside +-0.02) so rounding in the coefficients cannot
move a root across it; boundary cases are hand-made in the tests.
"""
import numpy as np
from scipy import signal


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
        radius = float(np.max(np.abs(np.roots(a))))
        out.append({"a": a, "max_radius": radius, "stable": radius < 1})
    return out


def fixtures():
    rng = np.random.default_rng(7321)
    z, p, k = signal.butter(8, 10, fs=8000, output="zpk")
    _, a = signal.zpk2tf(z, p, k)
    return {
        "stability_random": random_polys(rng, 240),
        "stability_trap": {
            "a": a,
            "true_max_radius": float(np.max(np.abs(p))),
            "numpy_roots_max_radius": float(np.max(np.abs(np.roots(a)))),
        },
    }
