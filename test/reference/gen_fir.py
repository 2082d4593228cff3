"""Reference FIR designs from scipy.signal: windows, Kaiser's beta and length (kaiser_beta, kaiserord), the
window method (firwin), least squares (firls), equiripple (remez, band, differentiator and Hilbert types), and
the least order meeting a requirement found by designing every order with scipy and measuring with freqz.

Frequencies are in Hz at our own sample rates (invented scenarios), passed to scipy with fs=. Tolerances:
- windows, Kaiser's formulas and the window method are closed forms: a few ulps per tap;
- least squares solves the normal equations Q a = b: taps move by ulps times cond(Q), computed here per case;
- remez aims at the unique minimax answer on its grid but its exchange can stop slightly short (a grid error up to
  ~2e-5 relative above the optimum on the 129-tap band-pass here); each case stores the grid error it reached,
  so a test can check that another answer is at least as near the optimum.
"""
import numpy as np
from scipy import signal

from conditioning import EPS, ULPS
from fixture import Fixture, Tol, Tolerated

CLOSED = Tol(rel=1e-13, abs=1e-15, why="closed forms (cosines, Bessel series, sincs): a few ulps per tap")
REMEZ = Tol(rel=0, abs=1e-9, why="remez: the program stops its exchange when the extremal set repeats, up to ~1e-8 "
            "of the largest tap short of the grid's minimax answer; a different rounding can stop it elsewhere")


def _windows():
    cases = []
    for n in (1, 2, 7, 32, 101):
        for w in ("hann", "hamming", "blackman", ("kaiser", 0.0), ("kaiser", 4.5), ("kaiser", 12.3)):
            name, beta = (w, 0.0) if isinstance(w, str) else w
            cases.append({"window": name, "beta": beta, "n": n, "w": signal.get_window(w, n, fftbins=False)})
    return cases


def _kaiser():
    beta = [{"attenuationDb": a, "beta": signal.kaiser_beta(a)} for a in (10, 21, 21.5, 30, 50, 50.5, 60, 96.3)]
    order = []
    # (attenuation dB, transition width Hz, fs Hz): the hopper scale, the data logger, an audio line input
    for a, width, fs in [(40, 30, 2000), (60, 100, 1000), (80, 400, 48000), (25, 0.05, 1), (96, 250, 44100)]:
        numtaps, b = signal.kaiserord(a, width / (fs / 2))
        order.append({"attenuationDb": a, "widthHz": width, "fs": fs, "taps": int(numtaps), "beta": b})
    return {"beta": beta, "order": order}


def _firwin():
    cases = []
    windows = ["hann", "hamming", "blackman", ("kaiser", 5.65), ("kaiser", 8.6)]
    shapes = [
        ("lowpass", [120], True, 1000),
        ("highpass", [400], False, 2000),
        ("bandpass", [100, 200], False, 1000),
        ("bandstop", [45, 55], True, 1000),
        ("lowpass", [3000], True, 25600),
    ]
    for w in windows:
        name, beta = (w, 0.0) if isinstance(w, str) else w
        for shape, cut, pass_zero, fs in shapes:
            for taps in (21, 65, 129):
                h = signal.firwin(taps, cut, window=w, pass_zero=pass_zero, fs=fs)
                cases.append({"window": name, "beta": beta, "response": shape, "cutoffsHz": cut, "fs": fs,
                              "taps": taps, "h": h})
            if shape in ("lowpass", "bandpass"):  # even taps: a zero at fs/2 is fine for these
                h = signal.firwin(40, cut, window=w, pass_zero=pass_zero, fs=fs)
                cases.append({"window": name, "beta": beta, "response": shape, "cutoffsHz": cut, "fs": fs,
                              "taps": 40, "h": h})
    return cases


def _ls_gram(taps, bands, weights, fs):
    """cond(Q) of firls' normal equations (symmetric odd taps, cos(k w) basis), for the tolerance."""
    k = np.arange((taps + 1) // 2)
    q = np.zeros((k.size, k.size))
    for (lo, hi), w in zip(bands, weights):
        w1, w2 = 2 * np.pi * lo / fs, 2 * np.pi * hi / fs
        for i in k:
            for j in k:
                for v in (i - j, i + j):
                    q[i, j] += w * 0.5 * ((w2 - w1) if v == 0 else (np.sin(v * w2) - np.sin(v * w1)) / v)
    return float(np.linalg.cond(q))


def _firls():
    cases = []
    # (taps, band edges Hz, desired at each edge, weights, fs)
    for taps, edges, desired, weights, fs in [
        (31, [0, 100, 150, 500], [1, 1, 0, 0], [1, 1], 1000),
        (61, [0, 100, 150, 500], [1, 1, 0, 0], [1, 20], 1000),
        (45, [0, 50, 80, 200, 240, 1000], [0, 0, 1, 1, 0, 0], [10, 1, 10], 2000),
        (101, [0, 3000, 3400, 12800], [1, 1, 0, 0], [1, 100], 25600),
        (33, [0, 1000, 2000, 6000, 7000, 24000], [1, 1, 0, 0, 1, 1], [1, 5, 1], 48000),
        (25, [0, 300, 350, 500], [0, 1, 0, 0], [1, 1], 1000),  # a ramp (sloped desired) then a stop band
        (129, [0, 120, 180, 500], [1, 1, 0, 0], [1, 1], 1000),
    ]:
        h = signal.firls(taps, edges, desired, weight=weights, fs=fs)
        bands = [(edges[i], edges[i + 1]) for i in range(0, len(edges), 2)]
        cond = _ls_gram(taps, bands, weights, fs)
        tol = Tol(rel=0, abs=ULPS * EPS * cond * float(np.max(np.abs(h))),
                  why="firls: ulps times cond(Q) of the normal equations")
        cases.append(Tolerated({"taps": taps, "edgesHz": edges, "desired": desired, "weights": weights, "fs": fs,
                                "condition": cond, "h": h}, tol,
                               {"condition": Tol(rel=1e-6, why="numpy.linalg.cond: an SVD, well within 1e-6")}))
    return cases


def _remez_grid_error(kind, taps, edges, desired, weights, fs, h):
    """The largest weighted error of taps h on the Parks-McClellan program's grid (density 16), as it builds it."""
    neg = kind != "bands"
    odd = taps % 2 == 1
    nf = (taps + 1) // 2 if not neg and odd else taps // 2 if (not neg or not odd) else (taps - 1) // 2
    delf = 0.5 / (16 * nf)
    f, d, w = [], [], []
    for b in range(len(desired)):
        lo, hi = edges[2 * b] / fs, edges[2 * b + 1] / fs
        t = delf if (b == 0 and neg and lo < delf) else lo
        start = len(f)
        while t <= hi:
            f.append(t)
            t += delf
        f[-1] = hi
        for x in f[start:]:
            d.append(desired[b] * x if kind == "differentiator" else desired[b])
            w.append(weights[b] / x if kind == "differentiator" and desired[b] > 1e-4 else weights[b])
    f, d, w = np.array(f), np.array(d), np.array(w)
    if neg == odd and f[-1] > 0.5 - delf:
        f, d, w = f[:-1], d[:-1], w[:-1]
    _, hh = signal.freqz(h, worN=2 * np.pi * f)
    rot = hh * np.exp(1j * np.pi * f * (taps - 1))
    amp = rot.imag if neg else rot.real
    return float(np.max(np.abs(w * (d - amp))))


def _remez():
    cases = []
    for kind, taps, edges, desired, weights, fs in [
        ("bands", 31, [0, 100, 150, 500], [1, 0], [1, 1], 1000),
        ("bands", 30, [0, 100, 150, 500], [1, 0], [1, 10], 1000),
        ("bands", 51, [0, 300, 400, 1000], [0, 1], [10, 1], 2000),
        ("bands", 65, [0, 80, 100, 200, 220, 500], [0, 1, 0], [1, 1, 1], 1000),
        ("bands", 41, [0, 40, 45, 55, 60, 500], [1, 0, 1], [1, 10, 1], 1000),
        ("bands", 129, [0, 2000, 2400, 12800], [1, 0], [1, 30], 25600),
        ("bands", 129, [0, 1000, 1100, 2000, 2100, 4000], [0, 1, 0], [1, 1, 1], 8000),
        # five and nine taps: the program's first reference gives δ = 0 (no alternation to start from)
        ("bands", 5, [0, 14, 28, 32, 52, 100], [1, 0, 1], [1, 10, 1], 200),
        ("bands", 9, [0, 14, 28, 32, 52, 100], [1, 0, 1], [1, 10, 1], 200),
        ("hilbert", 31, [20, 480], [1], [1], 1000),
        ("hilbert", 30, [20, 500], [1], [1], 1000),
        ("differentiator", 30, [0, 400], [1], [1], 1000),
        ("differentiator", 31, [0, 400], [1], [1], 1000),
        ("differentiator", 40, [0, 250, 300, 500], [1, 0], [1, 1], 1000),
    ]:
        t = "bandpass" if kind == "bands" else kind
        h = signal.remez(taps, edges, desired, weight=weights, type=t, fs=fs)
        cases.append({"kind": kind, "taps": taps, "edgesHz": edges, "desired": desired, "weights": weights,
                      "fs": fs, "h": h, "gridError": _remez_grid_error(kind, taps, edges, desired, weights, fs, h)})
    return cases


def _meets(h, req, points=8192):
    """Whether taps meet a requirement on a dense freqz grid of every band, and the worst margin in dB."""
    fs = req["fs"]
    p, s = req["passbandHz"], req["stopbandHz"]
    nyq = fs / 2
    regions = {
        "lowpass": lambda: ([(0, p[0])], [(s[0], nyq)]),
        "highpass": lambda: ([(p[0], nyq)], [(0, s[0])]),
        "bandpass": lambda: ([(p[0], p[1])], [(0, s[0]), (s[1], nyq)]),
        "bandstop": lambda: ([(0, p[0]), (p[1], nyq)], [(s[0], s[1])]),
    }[req["response"]]()
    worst = np.inf
    for kind, bands in zip(("pass", "stop"), regions):
        for lo, hi in bands:
            _, hh = signal.freqz(h, worN=np.linspace(lo, hi, points), fs=fs)
            db = 20 * np.log10(np.abs(hh))
            m = (db + req["rippleDb"]).min() if kind == "pass" else (-db - req["attenuationDb"]).min()
            worst = min(worst, m)
    return worst


def _design(method, req, order):
    fs, r = req["fs"], req["response"]
    p, s = req["passbandHz"], req["stopbandHz"]
    dp = 1 - 10 ** (-req["rippleDb"] / 20)
    ds = 10 ** (-req["attenuationDb"] / 20)
    if method in ("equiripple", "leastsquares"):
        layout = {
            "lowpass": lambda: ([0, p[0], s[0], fs / 2], [1, 0], [1, dp / ds]),
            "highpass": lambda: ([0, s[0], p[0], fs / 2], [0, 1], [dp / ds, 1]),
            "bandpass": lambda: ([0, s[0], p[0], p[1], s[1], fs / 2], [0, 1, 0], [dp / ds, 1, dp / ds]),
            "bandstop": lambda: ([0, p[0], s[0], s[1], p[1], fs / 2], [1, 0, 1], [1, dp / ds, 1]),
        }[r]
        edges, gains, w = layout()
        if method == "equiripple":
            return signal.remez(order + 1, edges, gains, weight=w, fs=fs)
        return signal.firls(order + 1, edges, np.repeat(gains, 2), weight=w, fs=fs)
    a = -20 * np.log10(min(dp, ds))
    cut = [(pi + si) / 2 for pi, si in zip(p, s)]
    window = ("kaiser", signal.kaiser_beta(a)) if method == "kaiser" else method
    return signal.firwin(order + 1, cut, window=window, pass_zero=r in ("lowpass", "bandstop"), fs=fs)


def _least_orders():
    """For each requirement and method, scipy's least order that meets it, by designing every allowed order."""
    cases = []
    reqs = [
        # the data logger's anti-alias filter, a hopper scale smoother, a pump skid band, a 50 Hz band-stop
        {"response": "lowpass", "passbandHz": [100], "stopbandHz": [150], "rippleDb": 1, "attenuationDb": 60, "fs": 1000},
        {"response": "lowpass", "passbandHz": [20], "stopbandHz": [60], "rippleDb": 0.1, "attenuationDb": 40, "fs": 2000},
        {"response": "highpass", "passbandHz": [400], "stopbandHz": [300], "rippleDb": 0.5, "attenuationDb": 50, "fs": 2000},
        {"response": "bandpass", "passbandHz": [1000, 10000], "stopbandHz": [500, 11000], "rippleDb": 1, "attenuationDb": 40, "fs": 25600},
        {"response": "bandstop", "passbandHz": [30, 80], "stopbandHz": [45, 55], "rippleDb": 1, "attenuationDb": 30, "fs": 1000},
    ]
    for req in reqs:
        even_only = req["response"] in ("highpass", "bandstop")
        for method in ("equiripple", "leastsquares", "kaiser", "hamming", "blackman"):
            if method == "hamming" and req["attenuationDb"] > 50:
                continue
            found, margin = None, None
            for order in range(2, 400):
                if (even_only or method == "leastsquares") and order % 2:
                    continue
                try:
                    h = _design(method, req, order)
                    # a failure at any point of a coarse grid already fails: the dense grid only when needed
                    m = _meets(h, req, 256)
                    if m >= 0:
                        m = _meets(h, req)
                except ValueError:  # remez does not converge at orders far too low
                    continue
                if m >= 0:
                    found, margin = order, m
                    break
            assert found is not None, (req, method)
            # a case decided by a hair is not a reference for a least order: keep clear cases only
            below = found - (2 if even_only or method == "leastsquares" else 1)
            try:
                below_margin = _meets(_design(method, req, below), req)
            except ValueError:  # scipy cannot design the order below: no clear reference
                continue
            if margin < 1e-3 or below_margin > -1e-3:
                continue
            cases.append({**req, "method": method, "order": found, "marginDb": margin, "belowMarginDb": below_margin})
    return cases


def fixtures():
    return {
        "fir_windows": Fixture(_windows(), tol=CLOSED),
        "fir_kaiser": Fixture(_kaiser(), tol=CLOSED),
        "fir_firwin": Fixture(_firwin(), tol=CLOSED),
        "fir_firls": Fixture(_firls(), tol=Tol(rel=0, abs=1e-12, why="firls: see each case's own tolerance")),
        "fir_remez": Fixture(_remez(), tol=REMEZ, fields={"gridError": Tol(rel=1e-9, why="freqz of the taps on the grid")}),
        "fir_least_order": Fixture(
            _least_orders(),
            tol=Tol(rel=0, abs=1e-6, why="margins in dB from freqz on a dense grid of designs"),
            fields={"*Hz": Tol(rel=0, why="typed requirement"), "*Db": Tol(rel=0, abs=1e-6, why="freqz in dB")},
        ),
    }
