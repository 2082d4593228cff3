"""Reference norms of partial cascades of second-order sections, and cascade scaling, from numpy/scipy.

For each design (our own cases, built with scipy's designers or from chosen poles and zeros) the sections
come from scipy.signal.zpk2sos (pairing 'nearest'); for every partial cascade H1...Hi:
- l1 = sum |h[n]| of the impulse response from scipy.signal.sosfilt, run until the slowest pole has decayed
  by 1e-13;
- l2 = sqrt(sum h[n]^2) of the same response;
- linf = max |H| from scipy.signal.sosfreqz on 2^18 + 1 even points plus the pole angles.
`scaled_<norm>` applies cascade scaling with numpy: section i's numerator times s_i so that the scaled
partial cascade has norm 1 (s_i = 1 / (norm_i * prod_{j<i} s_j)).
"""
import numpy as np
from scipy import signal

from fixture import Fixture, Tol

DECAY = 1e-13


def _pairs(fs, freqs, r):
    out = []
    for f in freqs:
        p = r * np.exp(2j * np.pi * f / fs)
        out += [p, np.conj(p)]
    return np.array(out)


def _impulse(sos, radius):
    n = int(np.ceil(np.log(DECAY) / np.log(radius))) + 8 if radius > 0 else 8
    x = np.zeros(n)
    x[0] = 1.0
    return signal.sosfilt(sos, x)


def _peak(sos, poles):
    w = np.concatenate([np.linspace(0, np.pi, 2**18 + 1), np.abs(np.angle(poles))])
    _, h = signal.sosfreqz(sos, worN=np.sort(w))
    return float(np.max(np.abs(h)))


def _norms(sos, poles):
    radius = float(np.max(np.abs(poles))) if len(poles) else 0.0
    out = []
    for i in range(1, len(sos) + 1):
        part = sos[:i]
        h = _impulse(part, radius)
        out.append({"l1": float(np.sum(np.abs(h))), "l2": float(np.sqrt(np.sum(h * h))), "linf": _peak(part, poles)})
    return out


def _scaled(sos, norms, which):
    s = sos.copy()
    before = 1.0
    for i, n in enumerate(norms):
        si = 1.0 / (n[which] * before)
        s[i, :3] *= si
        before *= si
    return s


def _case(name, z, p, k):
    sos = signal.zpk2sos(z, p, k, pairing="nearest")
    norms = _norms(sos, np.asarray(p))
    case = {"name": name, "sos": sos, "norms": norms}
    for which in ("l1", "l2", "linf"):
        case[f"scaled_{which}"] = _scaled(sos, norms, which)
    return case


def fixtures():
    fs = 2000.0
    hum = [50.0, 150.0, 250.0]
    notch_z = _pairs(fs, hum, 1.0)
    # -3 dB widths of 4, 5 and 6 Hz: distinct radii, so the order by radius is well defined
    notch_p = np.concatenate([_pairs(fs, [f], 1 - w * np.pi / fs) for f, w in zip(hum, [4.0, 5.0, 6.0])])
    k = np.real(np.prod(1 - notch_p) / np.prod(1 - notch_z))
    cases = [
        _case("butter4_lowpass", *signal.butter(4, 0.12, output="zpk")),
        _case("ellip6_lowpass", *signal.ellip(6, 0.5, 60, 0.3, output="zpk")),
        _case("cheby1_5_highpass", *signal.cheby1(5, 1, 0.4, btype="highpass", output="zpk")),
        _case("hum_notches", notch_z, notch_p, k),
        _case("resonator", np.array([1.0, -1.0]), _pairs(8000.0, [1200.0], 0.98), 0.02),
    ]
    return {
        "fixed_norms": Fixture(
            cases,
            tol=Tol(rel=1e-12, abs=1e-14, why="zpk2sos sections of closed-form designs: ulps"),
            fields={
                "norms.*": Tol(
                    rel=1e-10,
                    why="norms of cascades with poles within 0.01 of the circle: a relative change d of a "
                    "coefficient moves them by at most d / (1 - r)^2 < 1e4 d",
                ),
                "scaled_*": Tol(rel=1e-10, abs=1e-14, why="sections times 1 / norm: as the norms"),
            },
        )
    }
