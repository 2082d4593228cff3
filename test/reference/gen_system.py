"""Reference conversions between zeros/poles/gain, b/a and second-order sections (scipy.signal).

Roots are written in the engine's stored form (one entry per conjugate pair, im >= 0, multiplicity 1 per
listed copy). scipy's tf2zpk left-aligns b/a of different lengths, so the b/a cases are padded with trailing
zeros to equal length before calling it (that is the reading in z the engine uses).

The b/a cases have repeated roots (a double zero at -1, a double pole at 0.9, a fourfold zero at -1) that any
eigenvalue solver splits by sqrt(eps) to eps^(1/4), differently for each LAPACK build, even into a different
number of real roots. So their roots are the exact roots of the committed coefficients from mpmath (80 digits),
and the generator checks that scipy.signal.tf2zpk agrees with them to that splitting.
"""
import warnings

import numpy as np
from scipy import signal

from conditioning import EPS, ULPS, product_form_error
from fixture import Fixture, Tol, pointwise

DESIGNED = Tol(rel=1e-12, abs=1e-14, why="scipy designs and np.poly products of their roots: a few ulps, mild cancellation")


def stored(roots):
    """Roots as [{re, im, multiplicity}] with im >= 0 (scipy's own real/complex split, tolerance 100 eps)."""
    roots = np.atleast_1d(np.asarray(roots, dtype=complex))
    if roots.size == 0:
        return []
    zc, zr = signal._filter_design._cplxreal(roots)
    out = [{"re": float(r), "im": 0.0, "multiplicity": 1} for r in zr]
    out += [{"re": float(c.real), "im": float(c.imag), "multiplicity": 1} for c in zc]
    return out


def unstored(roots):
    """The full root array of the stored form: each entry with im > 0 brings its conjugate."""
    out = []
    for r in roots:
        c = complex(r["re"], r["im"])
        out += [c] * r["multiplicity"]
        if r["im"] != 0:
            out += [c.conjugate()] * r["multiplicity"]
    return np.asarray(out, dtype=complex)


def zpk_case(name, z, p, k):
    z, p = np.asarray(z, dtype=complex), np.asarray(p, dtype=complex)
    case = {"name": name, "zeros": stored(z), "poles": stored(p), "gain": float(k)}
    b, a = signal.zpk2tf(z, p, k)
    case["zpk2tf"] = {"b": np.real(b), "a": np.real(a)}
    case["zpk2sos_nearest"] = signal.zpk2sos(z, p, k, pairing="nearest")
    try:
        case["zpk2sos_keep_odd"] = signal.zpk2sos(z, p, k, pairing="keep_odd")
    except IndexError:  # scipy runs out of real zeros to pair with (keep_odd, more zeros than poles)
        case["zpk2sos_keep_odd"] = None
    case["sos2tf"] = dict(zip(("b", "a"), signal.sos2tf(case["zpk2sos_nearest"])))
    w = np.linspace(0.01, 3.1, 7)
    _, h = signal.freqz_zpk(z, p, k, worN=w)
    case["omega"] = w
    err = ULPS * EPS * product_form_error(z, p, k, w)
    why = "product form next to its roots"
    case["freqz_zpk"] = {"re": pointwise(h.real, err, why), "im": pointwise(h.imag, err, why)}
    # freqz of scipy's own zpk2tf arrays: equals freqz_zpk only when there are as many zeros as poles.
    _, h2 = signal.freqz(b, a, worN=w)
    case["scipy_tf_matches_zpk"] = bool(np.allclose(h, h2, rtol=1e-9))
    return case


def zpk_cases():
    cases = []
    for name, (z, p, k) in {
        "butter4": signal.butter(4, 0.2, output="zpk"),
        "cheby1_5": signal.cheby1(5, 1, 0.3, output="zpk"),
        "ellip6_highpass": signal.ellip(6, 0.5, 60, 0.25, btype="highpass", output="zpk"),
        "ellip9": signal.ellip(9, 0.2, 70, 0.4, output="zpk"),
        "cheby2_7_bandpass": signal.cheby2(7, 50, [0.2, 0.35], btype="bandpass", output="zpk"),
    }.items():
        cases.append(zpk_case(name, z, p, k))
    cases.append(zpk_case("all_pole_3", [], [0.5, 0.6 + 0.6j, 0.6 - 0.6j], 0.25))
    cases.append(zpk_case("one_zero_three_poles", [0.5], [-0.3, 0.2 + 0.7j, 0.2 - 0.7j], 2.0))
    cases.append(zpk_case("more_zeros_than_poles", [1.2, -0.5 + 0.5j, -0.5 - 0.5j], [0.7], -1.5))
    cases.append(zpk_case("fir_only", [0.9j, -0.9j, -1.0, 0.3], [], 0.5))
    cases.append(zpk_case("repeated_real", [-1, -1, -1], [0.8, 0.8, 0.3], 0.01))
    cases.append(zpk_case("gain_only", [], [], 3.0))
    return cases


def tf_cases():
    cases = []
    tfs = {
        "biquad": ([1, 2, 1], [1, -0.5, 0.25]),
        "delay2": ([0, 0, 1], [1]),
        "delayed_first_order": ([0, 0.5, 0.25], [1, -0.9]),
        "shorter_b": ([1, -1], [1, -1.8, 0.81]),
        "unnormalised": ([2, 0.5], [4, 1, 0.5]),
        "longer_b": ([1, 0.2, 0.3, 0.4], [1, -0.5]),
        "cheby1_4": signal.cheby1(4, 2, 0.3),
    }
    for name, (b, a) in tfs.items():
        b, a = np.asarray(b, float), np.asarray(a, float)
        n = max(len(b), len(a))
        bp = np.concatenate([b, np.zeros(n - len(b))])
        ap = np.concatenate([a, np.zeros(n - len(a))])
        cases.append({"name": name, "b": b, "a": a})
    return cases


def exact_roots(coefficients):
    """Roots of the polynomial with these (double) coefficients, exact to double precision (mpmath, 80 digits)."""
    import mpmath

    mpmath.mp.dps = 80
    c = np.trim_zeros(np.asarray(coefficients, dtype=float), "f")
    if len(c) < 2:
        return np.zeros(0, dtype=complex)
    roots = mpmath.polyroots([mpmath.mpf(float(x)) for x in c], maxsteps=2000, extraprec=800)
    return np.array([complex(r) for r in roots])


def _tf_outputs(stored_inputs):
    out = []
    for case in stored_inputs:
        b, a = np.asarray(case["b"], float), np.asarray(case["a"], float)
        n = max(len(b), len(a))
        bp = np.concatenate([b, np.zeros(n - len(b))])
        ap = np.concatenate([a, np.zeros(n - len(a))])
        with warnings.catch_warnings():
            warnings.simplefilter("ignore")  # scipy warns about the leading zeros of the padded b; they are meant
            z_s, p_s, k = signal.tf2zpk(bp, ap)
        z, p = exact_roots(bp), exact_roots(ap)
        for ours, theirs in ((z, z_s), (p, p_s)):  # scipy agrees up to the splitting of repeated roots
            assert len(ours) == len(theirs)
            for r in theirs:
                assert np.min(np.abs(ours - r)) < 1e-3, f"{case['name']}: tf2zpk root {r} far from the exact roots"
        out.append({"zeros": stored(z), "poles": stored(p), "gain": float(k)})
    return out


def fixtures():
    return {
        "system_zpk": Fixture(zpk_cases(), tol=DESIGNED),
        "system_tf": Fixture(
            tf_cases(),
            tol=Tol(rel=1e-14, abs=1e-16, why="typed coefficients, and cheby1's: a few ulps"),
            fields={
                "zeros.*": Tol(rel=1e-14, abs=1e-15, why="mpmath at 80 digits of the committed coefficients"),
                "poles.*": Tol(rel=1e-14, abs=1e-15, why="mpmath at 80 digits of the committed coefficients"),
                "gain": Tol(rel=1e-14, why="b[0] / a[0] after leading zeros"),
            },
            derive=_tf_outputs,
        ),
    }
