#!/usr/bin/env python3
"""Times scipy.signal.sosfilt and scipy.signal.welch for bench/kernels.ts, interleaved with our runs.

Usage: python3 bench/scipy_kernels.py SIGNAL.f64 SECTIONS.json, then one request per line on standard input:
"sos NAME N" filters the first N samples with the cascade NAME once and answers the seconds it took;
"welch NPERSEG N" runs welch (Hann, half overlap, 'spectrum' scaling, constant detrend) on the first N
samples at 48 kHz once and answers the seconds; "quit" ends. Times are the process's CPU time (steadier than
wall time on a shared machine). A long-lived process lets the caller alternate our runs with scipy's.
"""
import json
import sys
import time

import numpy as np
import scipy
from scipy import signal


def main():
    x = np.fromfile(sys.argv[1], dtype="<f8")
    with open(sys.argv[2], encoding="utf8") as f:
        cascades = {k: np.asarray(v, dtype=float) for k, v in json.load(f).items()}
    for sos in cascades.values():
        signal.sosfilt(sos, x[:1000])
    signal.welch(x[:4096], 48000.0, nperseg=256)
    print(f"ready scipy {scipy.__version__} numpy {np.__version__}", flush=True)
    for line in sys.stdin:
        parts = line.split()
        if not parts or parts[0] == "quit":
            break
        n = int(parts[2])
        if parts[0] == "sos":
            sos = cascades[parts[1]]
            t0 = time.process_time()
            signal.sosfilt(sos, x[:n])
        else:
            nperseg = int(parts[1])
            t0 = time.process_time()
            signal.welch(x[:n], 48000.0, window="hann", nperseg=nperseg, scaling="spectrum")
        print(repr(time.process_time() - t0), flush=True)


if __name__ == "__main__":
    main()
