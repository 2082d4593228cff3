"""Reference frequency responses (scipy.signal.freqz_zpk, sosfreqz, group_delay) from product forms.

Group delays of high-order filters come from summing scipy.signal.group_delay over the second-order
sections of scipy's own zpk2sos: group delay adds over a cascade, and per section it is well conditioned,
while group_delay on the expanded b/a of a 30th-order filter is not.

Tolerances follow each frequency's conditioning (conditioning.py): next to a root on or near the unit circle the
response loses digits, far from the roots it is accurate to a few ulps. Values scipy cannot compute reliably
(its group delay within 1e-5 of a zero on the circle, numpy.roots of the expanded trap denominator) are not
stored; the truth there comes from mpmath.
"""
import warnings

import numpy as np
from scipy import signal

from conditioning import DB_PER_NEPER, EPS, ULPS, product_form_condition, product_form_error
from fixture import Fixture, Tol, Tolerated, pointwise
from gen_system import stored, unstored

ROOTS = Tol(rel=1e-13, abs=1e-14, why="scipy designs: closed-form prototypes and the bilinear transform, a few ulps")
GRID = Tol(rel=ULPS * EPS, why="frequency grids from linspace/geomspace")


def group_delay_condition(b, a, w):
    """Absolute error of scipy.signal.group_delay((b, a), w) per unit relative change of b and a.

    scipy forms c = b * reversed(a), then gd = Re(N / C) - (len(a) - 1) with N = sum k c_k z^-k and
    C = sum c_k z^-k; rounding c by delta relative moves N / C by delta (sum |k c_k| + |N / C| sum |c_k|) / |C|.
    Next to a zero of C, N / C is large and nearly imaginary, so the real part loses digits like 1 / |C|^2.
    """
    c = np.convolve(b, np.asarray(a)[::-1])
    k = np.arange(len(c))
    # Horner's rounding grows with the degree (gamma_n = n eps), on top of the coefficients' own ulps
    z = np.exp(-1j * np.asarray(w))
    den = np.polyval(c[::-1], z)
    num = np.polyval((k * c)[::-1], z)
    with np.errstate(divide="ignore", invalid="ignore"):
        return len(c) * (np.sum(np.abs(k * c)) + np.abs(num / den) * np.sum(np.abs(c))) / np.abs(den)


def sections_group_delay(sos, w):
    total = np.zeros_like(w)
    for s in sos:
        with warnings.catch_warnings():
            warnings.simplefilter("ignore")
            total += signal.group_delay((s[:3], s[3:]), w=w, fs=2 * np.pi)[1]
    return total


def filter_case(name, z, p, k, n=200):
    w = np.linspace(0, np.pi, n, endpoint=False) + np.pi / (2 * n)
    _, h = signal.freqz_zpk(z, p, k, worN=w)
    sos = signal.zpk2sos(z, p, k)
    _, hs = signal.sosfreqz(sos, worN=w)
    # unwrap on a grid 64 times finer, then subsample, so the unwrap itself is reliable
    fine = np.linspace(0, np.pi, 64 * n, endpoint=False) + np.pi / (2 * n)
    _, hf = signal.freqz_zpk(z, p, k, worN=fine)
    # relative change of H per ulp of every root: the budget of each value below
    cond = ULPS * EPS * product_form_condition(z, p, w)
    sos_cond = ULPS * EPS * sum(1 + product_form_condition(np.roots(s[:3]), np.roots(s[3:]), w) for s in sos)
    gd_cond = ULPS * EPS * sum(group_delay_condition(s[:3], s[3:], w) for s in sos)
    why = "product form next to its roots: ulps times sum (1 + |r|) / |e^jw - r|"
    return Tolerated(
        {
            "name": name,
            "zeros": stored(z),
            "poles": stored(p),
            "gain": float(k),
            "omega": w,
            "re": pointwise(h.real, ULPS * EPS * product_form_error(z, p, k, w), why),
            "im": pointwise(h.imag, ULPS * EPS * product_form_error(z, p, k, w), why),
            "magnitude_db": pointwise(20 * np.log10(np.abs(h)), DB_PER_NEPER * cond, why),
            "phase": pointwise(np.angle(h), cond, why, period=2 * np.pi),
            "phase_unwrapped": pointwise(np.unwrap(np.angle(hf))[::64], cond, why),
            "sos_magnitude": pointwise(np.abs(hs), sos_cond * np.abs(hs), "sections next to their roots"),
            "group_delay": pointwise(sections_group_delay(sos, w), gd_cond, "group_delay of each section: its polynomial's condition"),
            "max_pole_radius": float(np.max(np.abs(p))),
        },
        ROOTS,
        {"omega": GRID},
    )


def trap():
    """8th-order Butterworth at 10 Hz, fs 8 kHz: the expanded denominator re-roots outside the circle."""
    z, p, k = signal.butter(8, 10, fs=8000, output="zpk")
    b, a = signal.zpk2tf(z, p, k)
    case = filter_case("butter8_10Hz_8kHz", z, p, k, n=256)
    case.value["tf_a"] = a
    case.value["tf_b"] = b
    lw = np.geomspace(2 * np.pi * 1 / 8000, 2 * np.pi * 100 / 8000, 64)
    _, hl = signal.freqz_zpk(z, p, k, worN=lw)
    case.value["log_omega"] = lw
    cond = ULPS * EPS * product_form_condition(z, p, lw)
    case.value["log_magnitude_db"] = pointwise(20 * np.log10(np.abs(hl)), DB_PER_NEPER * cond, "product form")
    return Fixture(
        case,
        tol=ROOTS,
        fields={"tf_*": Tol(rel=1e-13, why="zpk2tf: np.poly of eight poles near z = 1, all terms of one sign")},
        derive=lambda f: {"exact_max_radius": exact_max_radius(f["tf_a"])},
    )


def exact_max_radius(a):
    """Largest root radius of the stored (rounded) coefficients, from mpmath.polyroots at 80 digits.

    The expanded denominator of a narrow low-pass is so ill-conditioned that rounding its coefficients to
    doubles moves roots by ~1e-2; numpy.roots then adds an error of the same size that depends on the LAPACK
    build, so it is not a reference. mpmath on the committed coefficients is: the same number on every machine.
    """
    import mpmath

    mpmath.mp.dps = 80
    roots = mpmath.polyroots([mpmath.mpf(c) for c in a], maxsteps=800, extraprec=600)
    return Tolerated(float(max(abs(r) for r in roots)), Tol(rel=1e-14, why="mpmath at 80 digits of the committed a"))


def on_circle():
    """Zeros exactly on the circle, a pole pair 1e-5 inside it; scipy's group delay from the low-order tf where
    it is reliable, and a 60-digit mpmath truth everywhere (both from the committed roots)."""
    t = np.pi / 4
    z = np.array([np.exp(1j * t), np.exp(-1j * t), -1.0])
    p = np.array([0.9 * np.exp(1j * t), 0.9 * np.exp(-1j * t), 0.99999 * np.exp(0.3j), 0.99999 * np.exp(-0.3j)])
    k = 0.05
    w = np.array([t - 1e-3, t - 1e-6, t, t + 1e-6, t + 1e-3, 0.3 - 1e-5, 0.3, 0.3 + 1e-5, 1.0, 2.0, np.pi - 1e-6, np.pi])
    return Fixture(
        {"zeros": stored(z), "poles": stored(p), "gain": k, "omega": w},
        tol=Tol(rel=ULPS * EPS, abs=ULPS * EPS, why="np.exp of the chosen angles: an ulp or two"),
        derive=_on_circle_outputs,
    )


def _on_circle_outputs(f):
    z, p, k, w = unstored(f["zeros"]), unstored(f["poles"]), f["gain"], np.asarray(f["omega"])
    b, a = signal.zpk2tf(z, p, k)
    b = np.concatenate([np.zeros(len(a) - len(b)), b])  # one more pole than zeros: a one-sample delay
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        gd = signal.group_delay((b, a), w=w, fs=2 * np.pi)[1]
        _, h = signal.freqz_zpk(z, p, k, worN=w)
    # scipy's error bound per point (ulps of b and a through its formula): within 1e-6 of the zeros on the circle
    # it cannot promise even 4 digits (it is off by 2e-4 there, and returns 1e13..1e15 at the zeros); those
    # points are left out (None) and only the mpmath truth speaks for them
    bound = ULPS * EPS * group_delay_condition(b, a, w)
    reliable = bound < 1e-4 * np.abs(gd)
    why = "product form next to its roots"
    return {
        "re": pointwise(h.real, ULPS * EPS * product_form_error(z, p, k, w), why),
        "im": pointwise(h.imag, ULPS * EPS * product_form_error(z, p, k, w), why),
        "group_delay": [
            Tolerated(float(g), Tol(rel=0, abs=float(e), why="scipy group_delay: its error bound")) if ok else None
            for g, e, ok in zip(gd, bound, reliable)
        ],
        "group_delay_mp": Tolerated(
            [mp_group_delay(z, p, x) for x in w],
            Tol(rel=1e-12, why="mpmath at 60 digits of the committed roots: correct to the last digit"),
        ),
    }


def mp_group_delay(z, p, w):
    """-d(arg H)/dw of the product form at the float roots, by a 60-digit central difference (mpmath).

    Roots within 1e-15 of radius 1 are put exactly on the circle (the engine's documented snap). At an exact
    zero on the circle the phase jumps by pi; the one-sided limits agree there, so the value is taken as the
    mean of the derivatives at w -+ 1e-20.
    """
    import mpmath

    mpmath.mp.dps = 60

    def snap(r):
        r = mpmath.mpc(complex(r))
        return r / abs(r) if abs(abs(r) - 1) < mpmath.mpf("1e-15") else r

    zs, ps = [snap(r) for r in z], [snap(r) for r in p]

    def phase(x):
        e = mpmath.exp(1j * x)
        return sum(mpmath.arg(e - r) for r in zs) - sum(mpmath.arg(e - r) for r in ps)

    def slope(x):
        h = mpmath.mpf("1e-25")
        return -(phase(x + h) - phase(x - h)) / (2 * h)

    x = mpmath.mpf(float(w))
    if min(abs(mpmath.exp(1j * x) - r) for r in zs) < mpmath.mpf("1e-15"):
        return float((slope(x - mpmath.mpf("1e-20")) + slope(x + mpmath.mpf("1e-20"))) / 2)
    return float(slope(x))


def fixtures():
    cases = [
        filter_case("butter20", *signal.butter(20, 0.15, output="zpk")),
        filter_case("butter40", *signal.butter(40, 0.3, output="zpk")),
        filter_case("ellip24", *signal.ellip(24, 0.1, 90, 0.4, output="zpk")),
        filter_case("cheby2_30_highpass", *signal.cheby2(30, 80, 0.5, btype="highpass", output="zpk")),
        filter_case("cheby1_9_bandstop", *signal.cheby1(9, 0.5, [0.3, 0.5], btype="bandstop", output="zpk")),
    ]
    return {
        "response_trap": trap(),
        "response_filters": Fixture(cases, tol=ROOTS),
        "response_on_circle": on_circle(),
    }
