"""Reference frequency responses (scipy.signal.freqz_zpk, sosfreqz, group_delay) from product forms.

Group delays of high-order filters come from summing scipy.signal.group_delay over the second-order
sections of scipy's own zpk2sos: group delay adds over a cascade, and per section it is well conditioned,
while group_delay on the expanded b/a of a 30th-order filter is not.
"""
import warnings

import numpy as np
from scipy import signal

from gen_system import stored


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
    return {
        "name": name,
        "zeros": stored(z),
        "poles": stored(p),
        "gain": float(k),
        "omega": w,
        "re": h.real,
        "im": h.imag,
        "magnitude_db": 20 * np.log10(np.abs(h)),
        "phase": np.angle(h),
        "phase_unwrapped": np.unwrap(np.angle(hf))[::64],
        "sos_magnitude": np.abs(hs),
        "group_delay": sections_group_delay(sos, w),
        "max_pole_radius": float(np.max(np.abs(p))),
    }


def trap():
    """8th-order Butterworth at 10 Hz, fs 8 kHz: the expanded denominator re-roots outside the circle."""
    z, p, k = signal.butter(8, 10, fs=8000, output="zpk")
    b, a = signal.zpk2tf(z, p, k)
    case = filter_case("butter8_10Hz_8kHz", z, p, k, n=256)
    case["tf_a"] = a
    case["tf_b"] = b
    case["numpy_roots_max_radius"] = float(np.max(np.abs(np.roots(a))))
    lw = np.geomspace(2 * np.pi * 1 / 8000, 2 * np.pi * 100 / 8000, 64)
    _, hl = signal.freqz_zpk(z, p, k, worN=lw)
    case["log_omega"] = lw
    case["log_magnitude_db"] = 20 * np.log10(np.abs(hl))
    return case


def on_circle():
    """Zeros exactly on the circle, a pole pair 1e-5 inside it; group delay from the low-order tf."""
    t = np.pi / 4
    z = np.array([np.exp(1j * t), np.exp(-1j * t), -1.0])
    p = np.array([0.9 * np.exp(1j * t), 0.9 * np.exp(-1j * t), 0.99999 * np.exp(0.3j), 0.99999 * np.exp(-0.3j)])
    k = 0.05
    w = np.array([t - 1e-3, t - 1e-6, t, t + 1e-6, t + 1e-3, 0.3 - 1e-5, 0.3, 0.3 + 1e-5, 1.0, 2.0, np.pi - 1e-6, np.pi])
    b, a = signal.zpk2tf(z, p, k)
    b = np.concatenate([np.zeros(len(a) - len(b)), b])  # one more pole than zeros: a one-sample delay
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        gd = signal.group_delay((b, a), w=w, fs=2 * np.pi)[1]
        _, h = signal.freqz_zpk(z, p, k, worN=w)
    return {
        "zeros": stored(z),
        "poles": stored(p),
        "gain": k,
        "omega": w,
        "re": h.real,
        "im": h.imag,
        "group_delay": gd,
        "group_delay_mp": [mp_group_delay(z, p, x) for x in w],
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
    return {"response_trap": trap(), "response_filters": cases, "response_on_circle": on_circle()}
