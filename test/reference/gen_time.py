"""Reference time responses and partial fractions from scipy.signal (lfilter, sosfilt, residuez).

Systems are built from poles and zeros chosen here (np.poly), so every case is our own; inputs are seeded
normal noise and impulses, stored in the fixture so the TypeScript side filters exactly the same samples.

Tolerances (fixture.py): the coefficients come from np.poly of roots made with np.exp, a few units in the last
place apart between machines; the filter outputs are computed from the committed coefficients and samples
(derive), by lfilter's and sosfilt's plain loops, so they are the same bits on every machine up to the
compiler's choice of fused multiply-adds, which the recursion of these stable filters amplifies by at most its
noise gain.
"""
import numpy as np
from scipy import signal

from fixture import Fixture, Tol, Tolerated

COEFFICIENTS = Tol(rel=1e-13, abs=1e-15, why="np.poly of roots from np.exp: a few ulps, no cancellation to speak of")
SAMPLES = Tol(rel=0, why="seeded PCG64 normal samples and impulses: the same bits on every machine")


def _replayed(y, why):
    """Output of a filter run on committed inputs: rounding-level agreement, relative to the output's peak."""
    y = np.asarray(y)
    peak = float(np.max(np.abs(y))) if y.size else 0.0
    return Tolerated(y, Tol(rel=1e-12, abs=1e-13 * peak, why=why))


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
            cases.append({"name": f"{name}/{input_name}", "b": b, "a": a, "x": sig})
    return cases


def _lfilter_outputs(stored):
    why = "lfilter on the committed b, a, x; noise gain of these systems below 100"
    return {"cases": [{"y": _replayed(signal.lfilter(c["b"], c["a"], c["x"]), why)} for c in stored["cases"]]}


def _state_case(rng):
    """lfilter with an initial state, then continued from its final state: the two pieces of one signal."""
    b = list(_real_poly([-1, 0.3]) * 0.1)
    a = list(_real_poly(_pair(0.85, 0.9)))
    x = rng.standard_normal(80)
    zi = rng.standard_normal(2)
    return {"b": b, "a": a, "x": x, "zi": zi}


def _state_outputs(f):
    why = "lfilter with zi on the committed b, a, x, zi (a pole pair at radius 0.85)"
    y1, zf1 = signal.lfilter(f["b"], f["a"], f["x"][:50], zi=f["zi"])
    y2, zf2 = signal.lfilter(f["b"], f["a"], f["x"][50:], zi=zf1)
    return {k: _replayed(v, why) for k, v in {"y1": y1, "zf1": zf1, "y2": y2, "zf2": zf2}.items()}


def _sections_case(rng):
    """Ten poles crowded near z = 1 (a narrow low-pass shape): sosfilt on the sections, lfilter on the product.

    The expanded b, a is where machines differ: sos2tf multiplies the sections out with BLAS dot products whose
    summation order depends on the CPU kernel (and even on memory alignment), and a 1e-16 change in a moves
    lfilter's output by up to 0.6 relative after 100 samples (poles within 0.025 of z = 1, condition ~1e15).
    So y_tf is computed from the committed b, a (derive), never from this machine's sos2tf.
    """
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
    return {"sos": sos, "b": b, "a": a, "x": x}


def _sections_outputs(f):
    return {
        "y_sos": _replayed(signal.sosfilt(f["sos"], f["x"]), "sosfilt on the committed sections and samples"),
        # lfilter runs the expanded recursion whose rounding errors grow like the condition of a (~1e15 relative
        # to a's entries): the same bits only because it runs the same operations on the same committed bits.
        "y_tf": Tolerated(
            signal.lfilter(f["b"], f["a"], f["x"]),
            Tol(rel=1e-9, abs=1e-9, why="lfilter on the committed b, a: its own rounding, amplified ~1e6 by the pole cluster"),
        ),
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
        out.append({"name": name, "b": list(b), "a": list(a)})
    return out


def _residuez_outputs(stored):
    """residuez of the committed b, a. The poles come from np.roots (LAPACK, so they differ between CPU
    kernels); a repeated pole comes out split by ~eps^(1/m), but scipy averages roots within 1e-3 of each other,
    which brings poles and residues back to ~1e-14 relative: perturbing a by 1e-15 relative moves them by at
    most 4e-14 (measured on these cases)."""
    tol = Tol(rel=1e-11, abs=1e-13, why="residuez: averaged repeated poles, 4e-14 per 1e-15 change of a")
    out = []
    for c in stored["cases"]:
        r, p, k = signal.residuez(c["b"], c["a"])
        # the order of the poles (which of a conjugate pair comes first) is LAPACK's; a stable sort by value
        # makes it canonical and keeps a repeated pole's residues in order of power
        order = sorted(range(len(p)), key=lambda i: (round(p[i].real, 9), round(p[i].imag, 9)))
        out.append(Tolerated({"r": r[order], "p": p[order], "k": k}, tol))
    return {"cases": out}


def fixtures():
    rng = np.random.default_rng(20240611)
    inputs = {"b": COEFFICIENTS, "a": COEFFICIENTS, "x": SAMPLES, "zi": SAMPLES}
    return {
        "time_lfilter": Fixture(
            {"source": "scipy.signal.lfilter", "cases": _lfilter_cases(rng)},
            tol=COEFFICIENTS,
            fields={"cases.x": SAMPLES},
            derive=_lfilter_outputs,
        ),
        "time_lfilter_state": Fixture(_state_case(rng), tol=COEFFICIENTS, fields=inputs, derive=_state_outputs),
        "time_sosfilt": Fixture(
            _sections_case(rng),
            tol=COEFFICIENTS,
            fields={
                "sos": Tol(rel=1e-14, abs=1e-16, why="np.poly of one conjugate pair from np.exp: an ulp or two"),
                "a": Tol(rel=1e-13, why="sos2tf: BLAS dot products, a few ulps apart between CPU kernels"),
                "x": SAMPLES,
            },
            derive=_sections_outputs,
        ),
        "time_residuez": Fixture(
            {"source": "scipy.signal.residuez", "cases": _residuez_cases()},
            tol=Tol(rel=1e-14, abs=1e-16, why="coefficients typed here or from np.poly of typed roots"),
            derive=_residuez_outputs,
        ),
    }
