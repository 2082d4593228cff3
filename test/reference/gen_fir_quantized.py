"""The zeros and the magnitude response of FIR taps quantized to a fixed-point word, for the page's drawing of
an FIR's quantized taps (test/store/firQuantized.test.ts).

Each case takes taps designed by scipy.signal (our own scenarios), quantizes them the way a fixed-point target
stores them (common practice: the most fraction bits F with which every tap fits the W-bit word, each tap
rounded to the nearest code, a tie upwards), and gives, for the quantized taps code / 2^F:
- their zeros by numpy.roots (companion-matrix eigenvalues), with the per-root error bound of that method
  (conditioning.eigenvalue_root_error) stored beside them as "bound";
- their magnitude response by scipy.signal.freqz on the frequency view's default grid, pi i / 2047 for
  i = 0 .. 2047, with the error bound of Horner's rule, 2 L eps sum |c_k|, stored as "bound".

Codes, roots and magnitudes are derived from the committed taps, so a regeneration on another machine uses the
same bits; the roots may still move by numpy's own error bound (LAPACK kernels differ by CPU).
"""
import math

import numpy as np
from scipy import signal

from conditioning import EPS, ULPS, eigenvalue_root_error
from fixture import Fixture, Tol, pointwise

GRID_POINTS = 2048
REMEZ = Tol(rel=0, abs=1e-9, why="remez: its exchange can stop ~1e-8 of the largest tap short of the optimum")
CLOSED = Tol(rel=1e-13, abs=1e-15, why="firwin: a windowed sinc, a few ulps per tap")


def quantize(taps, word):
    """(F, codes): the most fraction bits that let every tap fit W bits; each tap to the nearest code, ties up."""
    lo, hi = -(2 ** (word - 1)), 2 ** (word - 1) - 1
    for f in range(word - 1, -1, -1):
        scaled = [t * 2.0**f for t in taps]
        codes = [math.floor(x) + (1 if x - math.floor(x) >= 0.5 else 0) for x in scaled]
        if all(lo <= c <= hi for c in codes):
            return f, codes
    raise ValueError("even F = 0 does not fit")


def derive(stored):
    out = []
    for case in stored:
        taps = [float(t) for t in case["taps"]]
        f, codes = quantize(taps, case["wordLength"])
        q = np.array(codes, dtype=float) * 2.0**-f
        r = np.roots(q)
        r = r[np.lexsort((r.imag, np.round(r.real, 9)))]
        bound = ULPS * EPS * eigenvalue_root_error(q[np.argmax(q != 0):], r)
        why = "numpy.roots: n eps ||c|| ||(r^n..1)|| / |p'(r)| per root (LAPACK differs by CPU kernel)"
        omega = np.array([math.pi * i / (GRID_POINTS - 1) for i in range(GRID_POINTS)])
        _, h = signal.freqz(q, worN=omega)
        horner = 2 * len(q) * EPS * float(np.sum(np.abs(q)))
        out.append({
            "fractionBits": f,
            "codes": codes,
            "zeros": {"re": pointwise(r.real, bound, why), "im": pointwise(r.imag, bound, why), "bound": bound},
            "magnitude": pointwise(np.abs(h), np.full(len(h), ULPS * horner), "freqz: Horner's rule, 2 L eps sum|c|"),
            "magnitudeBound": horner,
        })
    return out


def cases():
    # Anti-alias ahead of a decimation by 6 at 48 kHz: pass to 4 kHz, stop from 5 kHz; order 128 (129 taps).
    remez129 = signal.remez(129, [0, 4000, 5000, 24000], [1, 0], fs=48000)
    # Load-cell smoothing at 1 kHz: a Hamming-window low-pass to 120 Hz, 33 taps, stored in 8 bits, where the
    # small end taps round to 0 (a delay, zeros fewer, and zeros at the origin).
    hamming33 = signal.firwin(33, 120, window="hamming", fs=1000)
    # Rate of a pressure reading at 1 kHz: an equiripple differentiator to 200 Hz (antisymmetric taps), 12 bits.
    diff31 = signal.remez(31, [0, 200, 250, 500], [1, 0], type="differentiator", fs=1000)
    return [
        {"name": "equiripple low-pass, 129 taps, 16 bits", "taps": remez129, "wordLength": 16},
        {"name": "Hamming low-pass, 33 taps, 8 bits", "taps": hamming33, "wordLength": 8},
        {"name": "equiripple differentiator, 31 taps, 12 bits", "taps": diff31, "wordLength": 12},
    ]


def fixtures():
    return {
        "fir_quantized": Fixture(
            cases(),
            tol=REMEZ,
            fields={
                "taps": REMEZ,
                "fractionBits": Tol(rel=0, why="integers: equal"),
                "*bound": Tol(rel=1e-6, why="bounds: their size matters, not their last digits"),
                "*magnitudeBound": Tol(rel=1e-6, why="bounds: their size matters, not their last digits"),
            },
            derive=derive,
        )
    }
