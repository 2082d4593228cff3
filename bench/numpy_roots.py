#!/usr/bin/env python3
"""Times numpy.roots for bench/roots.ts on the polynomials it wrote to a JSON file.

Usage: python3 bench/numpy_roots.py POLYS.json, then one request per line on standard input:
"INDEX INNER" runs numpy.roots INNER times on polynomial INDEX and answers one line with the mean seconds
per call of wall time and of this thread's processor time (time.thread_time), separated by a space;
"roots INDEX" answers numpy.roots of polynomial INDEX as JSON {"re": [...], "im": [...]}; "quit" ends. A long-lived process lets the caller interleave our runs with numpy's.
The caller starts this with OPENBLAS_NUM_THREADS=1 so that LAPACK's eigenvalue solver runs on this thread
(the ready line gives the process's thread count before the version); the thread time then holds all of numpy.roots' work.
"""
import json
import os
import sys
import time

import numpy as np


def main():
    with open(sys.argv[1], encoding="utf8") as f:
        polys = [np.asarray(p, dtype=float) for p in json.load(f)]
    np.roots(polys[0])  # warm up LAPACK and numpy's dispatch
    threads = len(os.listdir("/proc/self/task")) if os.path.isdir("/proc/self/task") else -1
    print(f"ready {threads} numpy {np.__version__}", flush=True)
    for line in sys.stdin:
        parts = line.split()
        if not parts or parts[0] == "quit":
            break
        if parts[0] == "roots":
            r = np.roots(polys[int(parts[1])])
            print(json.dumps({"re": r.real.tolist(), "im": r.imag.tolist()}), flush=True)
            continue
        p = polys[int(parts[0])]
        inner = int(parts[1])
        t0 = time.perf_counter()
        h0 = time.thread_time()
        for _ in range(inner):
            np.roots(p)
        wall = (time.perf_counter() - t0) / inner
        thread = (time.thread_time() - h0) / inner
        print(f"{wall!r} {thread!r}", flush=True)


if __name__ == "__main__":
    main()
