"""Reference data for tone levels: least-squares fits of sinusoids at known frequencies by scipy.linalg.lstsq
(ordinary, and weighted by scipy.signal.get_window('hann', N), a periodic Hann window), and exact DFTs by
numpy.fft of records holding whole numbers of periods.

The records are formulas both sides can compute (sinusoids, an offset, a slow ramp and a chirp standing in
for broadband content), so no samples are stored. Scenarios are our own: hum harmonics on a load-cell signal.
"""
import numpy as np
from scipy import linalg, signal

from fixture import Fixture, Tol


def _record(case):
    n = np.arange(case["n"], dtype=float)
    fs = case["fs"]
    x = case["offset"] + case["ramp"] * n / case["n"] + case["chirp"] * np.sin(case["chirpRate"] * n * n)
    for t in case["tones"]:
        x = x + t["amplitude"] * np.cos(2 * np.pi * t["frequencyHz"] * n / fs + t["phase"])
    return x


def _fit(x, fs, freqs, weights):
    n = np.arange(len(x), dtype=float)
    cols = [np.ones_like(n)]
    for f in freqs:
        cols += [np.cos(2 * np.pi * f * n / fs), np.sin(2 * np.pi * f * n / fs)]
    a = np.column_stack(cols)
    sw = np.sqrt(weights)
    coef, *_ = linalg.lstsq(a * sw[:, None], x * sw)
    return [float(np.hypot(coef[1 + 2 * k], coef[2 + 2 * k])) for k in range(len(freqs))]


def fixtures():
    between = {
        "name": "hum harmonics between bins, offset, ramp and chirp",
        "fs": 2000.0,
        "n": 20000,
        "offset": 0.4,
        "ramp": 0.2,
        "chirp": 0.01,
        "chirpRate": 0.003,
        "tones": [
            {"frequencyHz": 50.037, "amplitude": 0.3, "phase": 0.7},
            {"frequencyHz": 150.11, "amplitude": 0.02, "phase": -1.1},
            {"frequencyHz": 250.4, "amplitude": 0.001, "phase": 2.0},
        ],
    }
    whole = {
        "name": "whole numbers of periods (exact DFT bins), with a chirp",
        "fs": 1000.0,
        "n": 4000,
        "offset": 0.0,
        "ramp": 0.0,
        "chirp": 0.002,
        "chirpRate": 0.0007,
        "tones": [
            {"frequencyHz": 50.0, "amplitude": 0.25, "phase": 0.3},
            {"frequencyHz": 125.25, "amplitude": 0.004, "phase": -2.2},
        ],
    }
    out = []
    for case in (between, whole):
        x = _record(case)
        freqs = [t["frequencyHz"] for t in case["tones"]]
        rect = _fit(x, case["fs"], freqs, np.ones(case["n"]))
        hann = _fit(x, case["fs"], freqs, signal.get_window("hann", case["n"]))
        entry = dict(case)
        entry["lstsq"] = rect
        entry["lstsqHann"] = hann
        spectrum = np.fft.rfft(x)
        bins = [f * case["n"] / case["fs"] for f in freqs]
        entry["exactDft"] = [
            float(2 * abs(spectrum[int(round(b))]) / case["n"]) if abs(b - round(b)) < 1e-9 else None
            for b in bins
        ]
        out.append(entry)
    return {
        "signal_levels": Fixture(
            {"cases": out},
            tol=Tol(rel=0, why="the record's parameters, written in the generator"),
            fields={
                "cases.lstsq*": Tol(
                    rel=1e-11,
                    why="lstsq of 2k+1 well separated sinusoid columns (condition below 10) over np.cos samples: "
                    "a few ulps per sample, summed over n",
                ),
                "cases.exactDft": Tol(
                    rel=1e-11,
                    abs=1e-15,
                    why="rfft of n points: eps log2(n) sum|x| / n on the bin, relative to the smallest tone",
                ),
            },
        )
    }
