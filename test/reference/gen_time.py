"""Reference time responses and partial fractions from scipy.signal (lfilter, sosfilt, residuez).

Systems are built from poles and zeros chosen here (np.poly), so every case is our own; inputs are seeded
normal noise and impulses, stored in the fixture so the TypeScript side filters exactly the same samples.
"""
import numpy as np
from scipy import signal


def _pair(r, theta):
    """Conjugate pair r·e^{±jθ} as a list of two roots."""
    p = r * np.exp(1j * theta)
    return [p, np.conj(p)]


def _real_poly(roots):
    return np.real(np.poly(roots))


def _lfilter_cases(rng):
    x = rng.standard_normal(160)
    impulse = np.zeros(64)
    impulse[0] = 1.0
    systems = {
        "first_order": ([0.2], [1.0, -0.8]),
        "resonator": (
            list(0.05 * np.array([1.0, 0.0, -1.0])),
            list(_real_poly(_pair(0.95, 0.6))),
        ),
        "leading_a_not_one": ([2.0, 1.0, 0.5], [2.0, -1.2, 0.5]),
        "fir": ([0.25, 0.5, 0.25], [1.0]),
        "longer_numerator": ([1.0, 2.0, 3.0, 4.0, 5.0], [1.0, -0.5]),
        "order_six": (
            list(_real_poly([-1, -1] + _pair(1.0, 2.0) + [0.5, 0.2])),
            list(_real_poly(_pair(0.9, 0.3) + _pair(0.8, 1.1) + _pair(0.7, 2.4))),
        ),
        "triple_pole": ([1.0, 2.0], list(_real_poly([0.5] * 3))),
    }
    cases = []
    for name, (b, a) in systems.items():
        for input_name, sig in (("noise", x), ("impulse", impulse)):
            cases.append(
                {"name": f"{name}/{input_name}", "b": b, "a": a, "x": sig, "y": signal.lfilter(b, a, sig)}
            )
    return cases


def _state_case(rng):
    """lfilter with an initial state, then continued from its final state: the two pieces of one signal."""
    b = list(_real_poly([-1, 0.3]) * 0.1)
    a = list(_real_poly(_pair(0.85, 0.9)))
    x = rng.standard_normal(80)
    zi = rng.standard_normal(2)
    y1, zf1 = signal.lfilter(b, a, x[:50], zi=zi)
    y2, zf2 = signal.lfilter(b, a, x[50:], zi=zf1)
    return {"b": b, "a": a, "x": x, "zi": zi, "y1": y1, "zf1": zf1, "y2": y2, "zf2": zf2}


def _sections_case(rng):
    """Ten poles crowded near z = 1 (a narrow low-pass shape): sosfilt on the sections, lfilter on the product."""
    angles = [0.02, 0.05, 0.08, 0.1, 0.12]
    radii = [0.995, 0.99, 0.985, 0.98, 0.975]
    sos = []
    for r, th in zip(radii, angles):
        a = _real_poly(_pair(r, th))
        b = np.array([1.0, 2.0, 1.0]) * np.sum(a) / 4.0  # unit gain at DC per section
        sos.append(list(b) + list(a))
    sos = np.array(sos)
    b, a = signal.sos2tf(sos)
    x = rng.standard_normal(400)
    return {
        "sos": sos,
        "b": b,
        "a": a,
        "x": x,
        "y_sos": signal.sosfilt(sos, x),
        "y_tf": signal.lfilter(b, a, x),
    }


def _residuez_cases():
    systems = {
        "simple": ([1.0, 0.5], _real_poly([0.5, -0.3])),
        "triple": ([1.0, 2.0], _real_poly([0.5] * 3)),
        "complex_double": ([1.0, -0.2, 0.3], _real_poly(_pair(0.78, 0.7) * 2 + [-0.3])),
        "improper": ([1.0, 2.0, 3.0, 4.0, 5.0], [1.0, -0.5]),
        "improper_repeated": ([1.0, 0.0, 0.0, 0.0, 1.0, 2.0], _real_poly([0.9, 0.9, -0.4])),
        "leading_a_not_one": ([2.0, 1.0], [2.0, -1.4, 0.24]),
        "integrator_step": ([1.0], _real_poly([1.0, 1.0])),
        "quadruple": ([1.0, -1.0, 0.5], _real_poly([0.9] * 4)),
        "mixed": ([0.3, 0.1, -0.2, 0.05], _real_poly(_pair(0.9, 1.2) + [0.6, 0.6, -0.5])),
    }
    out = []
    for name, (b, a) in systems.items():
        r, p, k = signal.residuez(b, a)
        out.append({"name": name, "b": list(b), "a": list(a), "r": r, "p": p, "k": k})
    return out


def fixtures():
    rng = np.random.default_rng(20240611)
    return {
        "time_lfilter": {"source": "scipy.signal.lfilter", "cases": _lfilter_cases(rng)},
        "time_lfilter_state": _state_case(rng),
        "time_sosfilt": _sections_case(rng),
        "time_residuez": {"source": "scipy.signal.residuez", "cases": _residuez_cases()},
    }
