#!/usr/bin/env python3
"""Times scipy.signal.sosfilt and scipy.signal.welch for bench/kernels.ts, interleaved with our runs.

Usage: python3 bench/scipy_kernels.py SIGNAL.f64 SECTIONS.json, then one request per line on standard input:
"sos NAME N" filters the first N samples with the cascade NAME once; "welch NPERSEG N" runs welch (Hann, half
overlap, 'spectrum' scaling, constant detrend) on the first N samples at 48 kHz once; each answers
"THREAD WALL": the seconds of processor time of this thread, time.thread_time(), and the wall seconds,
time.perf_counter(); "quit" ends. Thread time is steadier than wall time on a shared machine and is what
bench/kernels.ts reads for ours (threadCpuMs). sosfilt and welch (pocketfft) run on the calling thread only;
every request checks that, and reports process time beyond thread time on standard error. A long-lived
process lets the caller alternate our runs with scipy's.
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
        p0 = time.process_time()
        w0 = time.perf_counter()
        t0 = time.thread_time()
        if parts[0] == "sos":
            signal.sosfilt(cascades[parts[1]], x[:n])
        else:
            nperseg = int(parts[1])
            signal.welch(x[:n], 48000.0, window="hann", nperseg=nperseg, scaling="spectrum")
        t1 = time.thread_time()
        w1 = time.perf_counter()
        p1 = time.process_time()
        # Another thread's work (a threaded BLAS or FFT) would show as process time beyond thread time.
        if (p1 - p0) - (t1 - t0) > 0.05 * (t1 - t0) + 1e-3:
            print(f"scipy_kernels: {line.strip()} used other threads: process {p1 - p0:.4f} s, thread {t1 - t0:.4f} s",
                  file=sys.stderr)
        print(f"{t1 - t0!r} {w1 - w0!r}", flush=True)


if __name__ == "__main__":
    main()
