"""Reference designs from scipy.signal: notch/peak/comb, classical IIR families and their order estimates,
plus audio-EQ cookbook biquads written out here from R. Bristow-Johnson's published formulas.

Roots are stored as full lists (conjugates included); responses as magnitude in dB and phase at a grid of
frequencies in Hz that includes the design edges. Frequencies and parameters are our own choices.

Tolerances (fixture.py, conditioning.py): roots and coefficients from closed-form designs move by a few ulps
between machines (numpy's SIMD sin/cos/tan); roots found by numpy.roots carry their eigenvalue error bound;
each response point carries the error bound of its evaluation next to the roots. A point whose bound exceeds
1e-6 of |H| (a frequency on top of a zero on the circle) is not a reliable reference and is stored as None.
"""
import warnings

import numpy as np
from scipy import signal

from conditioning import DB_PER_NEPER, EPS, ULPS, eigenvalue_root_error, product_form_condition, ratio_condition
from fixture import Fixture, Tol, Tolerated

DESIGNED = Tol(rel=1e-12, abs=1e-13, why="closed-form designs (prototypes, bilinear transform, band transforms): ulps")
# band-stop order estimates slide the pass-band edges with fminbound (xtol 1e-5): an ulp of the objective can
# change a comparison on its path and land elsewhere within xtol; the attenuation of the design follows
BANDSTOP_SEARCH = {
    "naturalHz": Tol(rel=1e-4, why="fminbound with xtol 1e-5 on tan-warped edges"),
    "naturalEdgesHz": Tol(rel=1e-4, why="fminbound with xtol 1e-5 on tan-warped edges"),
    "stopAttenuationDb": Tol(rel=0, abs=0.05, why="design at edges known to xtol 1e-5"),
}
UNRELIABLE = 1e-6  # relative error bound of |H| beyond which a response point is left out


def _curve(f, h, rel_bound):
    """magDb and phase with per-point tolerances; None where the bound says the value is not reliable."""
    mag, ph = [], []
    why = "response next to its roots: ulps times the evaluation's condition"
    with np.errstate(divide="ignore"):
        db = 20 * np.log10(np.abs(h))
    for d, p, e in zip(db, np.angle(h), rel_bound):
        if not np.isfinite(e) or e > UNRELIABLE or not np.isfinite(d):
            mag.append(None)
            ph.append(None)
            continue
        mag.append(Tolerated(float(d), Tol(rel=0, abs=DB_PER_NEPER * float(e), why=why)))
        ph.append(Tolerated(float(p), Tol(rel=0, abs=float(e), why=why, period=2 * np.pi)))
    return {"f": f, "magDb": mag, "phase": ph}


def _found_roots(c):
    """numpy.roots with each root's eigenvalue error bound."""
    r = np.roots(c)
    bound = ULPS * EPS * eigenvalue_root_error(c, r)
    return [Tolerated(x, Tol(rel=0, abs=float(e), why="numpy.roots: eigenvalue error bound")) for x, e in zip(r, bound)]

GRID_POINTS = 48


def _grid(fs, extra=()):
    """Frequencies in Hz: an even spread over (0, fs/2) plus the given edges and the ends."""
    f = np.linspace(0, fs / 2, GRID_POINTS)
    f = np.concatenate([f, np.asarray(extra, dtype=float)])
    return np.unique(f)


def _response_zpk(z, p, k, f, fs):
    w = 2 * np.pi * f / fs
    _, h = signal.freqz_zpk(z, p, k, worN=w)
    return _curve(f, h, ULPS * EPS * product_form_condition(z, p, w))


def _response_ba(b, a, f, fs):
    w = 2 * np.pi * f / fs
    _, h = signal.freqz(b, a, worN=w)
    # Horner's rounding grows with the degree: gamma_n = n eps on top of the coefficients' ulps
    return _curve(f, h, ULPS * EPS * (len(b) + len(a)) * ratio_condition(b, a, w))


def _ba_case(params, b, a, fs, extra=()):
    return {
        **params,
        "b": b,
        "a": a,
        "zeros": _found_roots(b),
        "poles": _found_roots(a),
        "curve": _response_ba(b, a, _grid(fs, extra), fs),
    }


def _notches():
    cases = []
    # (fs, f0, Q): mains hum, a narrow notch near DC, a wide one, one near Nyquist
    for fs, f0, q in [(1000, 50, 25), (2000, 5, 2), (48000, 1000, 0.7), (8000, 3900, 30), (1, 0.123, 10)]:
        for kind, fn in (("notch", signal.iirnotch), ("peak", signal.iirpeak)):
            b, a = fn(f0, q, fs=fs)
            bw = f0 / q
            cases.append(_ba_case({"kind": kind, "fs": fs, "f0": f0, "q": q}, b, a, fs, [f0, f0 - bw / 2, f0 + bw / 2]))
    return cases


def _combs():
    cases = []
    # notch comb passes nothing at DC (pass_zero False); peak comb peaks at DC (pass_zero True)
    for fs, f0, q in [(1000, 50, 30), (2000, 250, 5), (800, 200, 10), (48000, 2400, 100)]:
        for kind, pz in (("notch", False), ("peak", True)):
            b, a = signal.iircomb(f0, q, ftype=kind, fs=fs, pass_zero=pz)
            cases.append(_ba_case({"type": kind, "fs": fs, "f0": f0, "q": q}, b, a, fs, [f0, 2 * f0]))
    return cases


def _dc_blockers():
    """First-order Butterworth high-pass: the bilinear design our DC blocker uses."""
    out = []
    for fs, fc in [(1000, 0.5), (48000, 20), (100, 10), (1, 0.3)]:
        z, p, k = signal.butter(1, fc, "highpass", output="zpk", fs=fs)
        out.append({"fs": fs, "cutoffHz": fc, "zeros": z, "poles": p, "gain": k, "curve": _response_zpk(z, p, k, _grid(fs, [fc]), fs)})
    return out


def _cookbook(kind, fs, f0, gain_db, q=None, bw_oct=None, slope=None):
    """Audio EQ cookbook biquads (R. Bristow-Johnson), written out from the published formulas."""
    A = 10 ** (gain_db / 40)
    w0 = 2 * np.pi * f0 / fs
    cs, sn = np.cos(w0), np.sin(w0)
    if q is not None:
        alpha = sn / (2 * q)
    elif bw_oct is not None:
        alpha = sn * np.sinh(np.log(2) / 2 * bw_oct * w0 / sn)
    else:
        alpha = sn / 2 * np.sqrt((A + 1 / A) * (1 / slope - 1) + 2)
    sa = 2 * np.sqrt(A) * alpha
    if kind == "peakingEq":
        b = [1 + alpha * A, -2 * cs, 1 - alpha * A]
        a = [1 + alpha / A, -2 * cs, 1 - alpha / A]
    elif kind == "lowShelf":
        b = [A * ((A + 1) - (A - 1) * cs + sa), 2 * A * ((A - 1) - (A + 1) * cs), A * ((A + 1) - (A - 1) * cs - sa)]
        a = [(A + 1) + (A - 1) * cs + sa, -2 * ((A - 1) + (A + 1) * cs), (A + 1) + (A - 1) * cs - sa]
    else:
        b = [A * ((A + 1) + (A - 1) * cs + sa), -2 * A * ((A - 1) + (A + 1) * cs), A * ((A + 1) + (A - 1) * cs - sa)]
        a = [(A + 1) - (A - 1) * cs + sa, 2 * ((A - 1) - (A + 1) * cs), (A + 1) - (A - 1) * cs - sa]
    return np.array(b) / a[0], np.array(a) / a[0]


def _equalisers():
    specs = [
        ("peakingEq", 48000, 1000, 6, {"q": 1.4}),
        ("peakingEq", 48000, 120, -9.5, {"q": 4}),
        ("peakingEq", 44100, 8000, 3, {"bandwidthOctaves": 1}),
        ("peakingEq", 1000, 480, -20, {"bandwidthOctaves": 0.1}),
        ("lowShelf", 48000, 200, 6, {"slope": 1}),
        ("lowShelf", 48000, 80, -12, {"q": 0.707}),
        ("highShelf", 44100, 6000, 4.5, {"slope": 0.5}),
        ("highShelf", 1000, 300, -15, {"q": 2}),
    ]
    out = []
    for kind, fs, f0, g, width in specs:
        b, a = _cookbook(kind, fs, f0, g, q=width.get("q"), bw_oct=width.get("bandwidthOctaves"), slope=width.get("slope"))
        out.append(_ba_case({"kind": kind, "fs": fs, "f0": f0, "gainDb": g, **width}, b, a, fs, [f0]))
    return out


# (order, edges as fractions of fs) per band shape: orders 1..20 and edges near 0 and near Nyquist
_IIR_CASES = {
    "lowpass": [(1, 0.1), (2, 0.002), (3, 0.25), (5, 0.45), (8, 0.01), (12, 0.2), (20, 0.3), (16, 0.49)],
    "highpass": [(1, 0.3), (2, 0.49), (4, 0.005), (7, 0.2), (10, 0.45), (20, 0.15)],
    "bandpass": [(1, (0.1, 0.2)), (2, (0.002, 0.01)), (4, (0.3, 0.49)), (6, (0.01, 0.45)), (10, (0.2, 0.22))],
    "bandstop": [(1, (0.1, 0.3)), (3, (0.004, 0.02)), (5, (0.4, 0.48)), (8, (0.05, 0.4)), (10, (0.24, 0.26))],
}
_FAMILY_ARGS = {
    "butter": [()],
    "cheby1": [(0.1,), (1.0,), (3.0,)],
    "cheby2": [(30.0,), (60.0,), (90.0,)],
    "ellip": [(0.5, 40.0), (1.0, 70.0), (0.05, 90.0)],
}


def _iir(family):
    out = []
    fs_list = [1000.0, 48000.0, 1.0]
    i = 0
    for response, cases in _IIR_CASES.items():
        for order, edges in cases:
            args = _FAMILY_ARGS[family][i % len(_FAMILY_ARGS[family])]
            fs = fs_list[i % len(fs_list)]
            i += 1
            wn = np.atleast_1d(edges) * fs
            z, p, k = getattr(signal, family)(order, *args, wn if len(wn) > 1 else wn[0], response, output="zpk", fs=fs)
            params = {"response": response, "order": order, "edgesHz": wn, "fs": fs}
            if family in ("cheby1", "ellip"):
                params["rippleDb"] = args[0]
            if family == "cheby2":
                params["attenuationDb"] = args[0]
            if family == "ellip":
                params["attenuationDb"] = args[1]
            out.append({**params, "zeros": z, "poles": p, "gain": k, "curve": _response_zpk(z, p, k, _grid(fs, wn), fs)})
    return out


_ORD = {"butterworth": ("buttord", "butter"), "chebyshev1": ("cheb1ord", "cheby1"), "chebyshev2": ("cheb2ord", "cheby2"), "elliptic": ("ellipord", "ellip")}
# (response, pass edges, stop edges, ripple dB, attenuation dB, fs): our own requirements
_REQUIREMENTS = [
    ("lowpass", [120], [400], 1, 60, 1000),
    ("lowpass", [20], [30], 0.5, 40, 48000),
    ("lowpass", [0.4], [0.45], 0.1, 80, 1),
    ("highpass", [300], [200], 1, 40, 1000),
    ("highpass", [45], [10], 3, 50, 2000),
    ("bandpass", [100, 200], [50, 300], 1, 40, 1000),
    ("bandpass", [950, 1050], [800, 1300], 0.5, 60, 8000),
    ("bandstop", [40, 60], [48, 52], 1, 30, 1000),
    ("bandstop", [100, 400], [180, 250], 2, 50, 1000),
]


def _orders():
    out = []
    dense = 20001
    for response, wp, ws, rp, rs, fs in _REQUIREMENTS:
        for fam, (ordfn, design) in _ORD.items():
            wp_ = wp if len(wp) > 1 else wp[0]
            ws_ = ws if len(ws) > 1 else ws[0]
            n, wn = getattr(signal, ordfn)(wp_, ws_, rp, rs, fs=fs)
            args = {"butter": (), "cheby1": (rp,), "cheby2": (rs,), "ellip": (rp, rs)}[design]
            z, p, k = getattr(signal, design)(n, *args, wn, response, output="zpk", fs=fs)
            # worst stop-band attenuation of scipy's own design, on a dense grid over each stop region
            nyq = fs / 2
            regions = {
                "lowpass": lambda: [(ws[0], nyq)],
                "highpass": lambda: [(0, ws[0])],
                "bandpass": lambda: [(0, ws[0]), (ws[1], nyq)],
                "bandstop": lambda: [(ws[0], ws[1])],
            }[response]()
            worst = np.inf
            for lo, hi in regions:
                f = np.linspace(lo, hi, dense)
                _, h = signal.freqz_zpk(z, p, k, worN=2 * np.pi * f / fs)
                with np.errstate(divide="ignore"):
                    worst = min(worst, np.min(-20 * np.log10(np.abs(h))))
            # the minimum sits on a stop-band ripple peak or an edge, away from the zeros: well conditioned
            if response != "bandstop":
                worst = Tolerated(worst, Tol(rel=1e-11, abs=1e-11, why="least attenuation on a ripple peak, away from zeros"))
            case = {"family": fam, "response": response, "passbandHz": wp, "stopbandHz": ws, "rippleDb": rp, "attenuationDb": rs, "fs": fs, "order": n, "naturalHz": np.atleast_1d(wn), "stopAttenuationDb": worst}
            out.append(Tolerated(case, fields=BANDSTOP_SEARCH) if response == "bandstop" else case)
    return out


def fixtures():
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        return {
            "design_notch": Fixture({"notches": _notches(), "combs": _combs(), "dcBlockers": _dc_blockers()}, tol=DESIGNED),
            "design_eq": Fixture(_equalisers(), tol=DESIGNED),
            "design_butter": Fixture(_iir("butter"), tol=DESIGNED),
            "design_cheby1": Fixture(_iir("cheby1"), tol=DESIGNED),
            "design_cheby2": Fixture(_iir("cheby2"), tol=DESIGNED),
            "design_ellip": Fixture(_iir("ellip"), tol=DESIGNED),
            "design_order": Fixture(
                _orders(),
                tol=Tol(rel=1e-12, why="order formulas and natural edges: closed forms (ellipord: a bracketed root)"),
            ),
        }
