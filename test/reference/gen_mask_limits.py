"""Two-sided requirement masks against scipy.signal: designs of least order from buttord/cheb1ord/cheb2ord/
ellipord meet the requirement they were estimated for, so a mask built from that requirement (pass band between
+ripple and -ripple dB, stop band below -attenuation dB) must pass them; a bump of our own above the pass band
must fail it at the bump.

For each case: scipy's order, natural edges, zeros/poles/gain of the design, and the extremes of 20 log10|H| on a
dense grid over each region (scipy.signal.freqz_zpk), which the mask's worst margins are compared with.
Requirements are our own (the anti-alias low-pass of scenario 4 among them).
"""
import numpy as np
from scipy import signal

from fixture import Fixture, Tol

REQUIREMENTS = [
    # (response, pass edges, stop edges, ripple dB, attenuation dB, fs)
    ("lowpass", [120], [200], 0.5, 40, 1000),
    ("lowpass", [120], [400], 1, 60, 1000),
    ("highpass", [300], [200], 0.5, 45, 2000),
    ("bandpass", [150, 250], [100, 320], 1, 40, 1000),
]
ORD = {
    "butterworth": ("buttord", "butter"),
    "chebyshev1": ("cheb1ord", "cheby1"),
    "chebyshev2": ("cheb2ord", "cheby2"),
    "elliptic": ("ellipord", "ellip"),
}
DENSE = 20001


def _regions(response, wp, ws, nyq):
    """(kind, from, to) of each region, as the mask lays them out."""
    if response == "lowpass":
        return [("pass", 0, wp[0]), ("stop", ws[0], nyq)]
    if response == "highpass":
        return [("stop", 0, ws[0]), ("pass", wp[0], nyq)]
    return [("stop", 0, ws[0]), ("pass", wp[0], wp[1]), ("stop", ws[1], nyq)]


def _extremes(z, p, k, lo, hi, fs, with_min=True):
    """Largest 20 log10|H| and where; the smallest too in a pass band (a stop band's depth next to its zeros on
    the circle is rounding noise, and no limit reads it)."""
    f = np.linspace(lo, hi, DENSE)
    _, h = signal.freqz_zpk(z, p, k, worN=2 * np.pi * f / fs)
    with np.errstate(divide="ignore"):
        db = 20 * np.log10(np.abs(h))
    out = {"maxDb": float(np.max(db))}
    if with_min:
        out["minDb"] = float(np.min(db))
    return out


def _designs():
    out = []
    for response, wp, ws, rp, rs, fs in REQUIREMENTS:
        for fam, (ordfn, design) in ORD.items():
            n, wn = getattr(signal, ordfn)(wp if len(wp) > 1 else wp[0], ws if len(ws) > 1 else ws[0], rp, rs, fs=fs)
            args = {"butter": (), "cheby1": (rp,), "cheby2": (rs,), "ellip": (rp, rs)}[design]
            z, p, k = getattr(signal, design)(n, *args, wn, response, output="zpk", fs=fs)
            regions = [
                {"kind": kind, "fromHz": lo, "toHz": hi, **_extremes(z, p, k, lo, hi, fs, kind == "pass")}
                for kind, lo, hi in _regions(response, wp, ws, fs / 2)
            ]
            out.append({"family": fam, "response": response, "passbandHz": wp, "stopbandHz": ws, "rippleDb": rp,
                        "attenuationDb": rs, "fs": fs, "order": int(n), "zeros": z, "poles": p, "gain": k,
                        "regions": regions})
    return out


def _peaking(fs, f0, gain_db, q):
    """A peaking biquad from R. Bristow-Johnson's published audio-EQ formulas."""
    a = 10 ** (gain_db / 40)
    w0 = 2 * np.pi * f0 / fs
    alpha = np.sin(w0) / (2 * q)
    b = [1 + alpha * a, -2 * np.cos(w0), 1 - alpha * a]
    den = [1 + alpha / a, -2 * np.cos(w0), 1 - alpha / a]
    return signal.tf2zpk(b, den)


def _bump():
    """Scenario-4-like low-pass (0.5 dB to 120 Hz, 40 dB from 200 Hz, fs 1 kHz) with a +2.6 dB bump at 82 Hz."""
    fs = 1000
    n, wn = signal.buttord(120, 200, 0.5, 40, fs=fs)
    z, p, k = signal.butter(n, wn, "lowpass", output="zpk", fs=fs)
    bz, bp, bk = _peaking(fs, 82, 2.6, 2)
    z, p, k = np.concatenate([z, bz]), np.concatenate([p, bp]), k * bk
    return {"fs": fs, "rippleDb": 0.5, "attenuationDb": 40, "passbandHz": [120], "stopbandHz": [200],
            "zeros": z, "poles": p, "gain": k, "pass": _extremes(z, p, k, 0, 120, fs),
            # one peak, so its place on the grid is well defined (equiripple designs have several equal ones)
            "peakAtHz": float(np.linspace(0, 120, DENSE)[np.argmax(np.abs(signal.freqz_zpk(z, p, k, worN=2 * np.pi * np.linspace(0, 120, DENSE) / fs)[1]))])}


def fixtures():
    tol = Tol(rel=1e-10, abs=1e-10, why="closed-form designs (ulps) read on a grid away from zeros on the circle")
    fields = {
        "*peakAtHz": Tol(rel=0, abs=0.01, why="grid point of the maximum; a tie between neighbours may flip"),
    }
    return {
        "mask_limits": Fixture({"designs": _designs(), "bump": _bump()}, tol=tol, fields=fields),
    }
