"""Least orders and natural edges from scipy.signal buttord/cheb1ord/cheb2ord/ellipord for a few requirements
of our own (the anti-alias low-pass of scenario 4 among them), for the `polewright design --order auto` tests.
"""
import numpy as np
from scipy import signal

from fixture import Fixture, Tol, Tolerated
from gen_design import BANDSTOP_SEARCH

REQUIREMENTS = [
    # scenario 4: low-pass at 120 Hz on a 1 kHz channel, at least 60 dB down by 400 Hz, 1 dB ripple
    {"response": "lowpass", "fs": 1000, "passband": [120], "stopband": [400], "ripple": 1, "attenuation": 60},
    {"response": "highpass", "fs": 2000, "passband": [300], "stopband": [200], "ripple": 0.5, "attenuation": 45},
    {"response": "bandpass", "fs": 1000, "passband": [150, 250], "stopband": [100, 320], "ripple": 1, "attenuation": 40},
    {"response": "bandstop", "fs": 1000, "passband": [100, 320], "stopband": [150, 250], "ripple": 1, "attenuation": 40},
]

ORDER_FUNCTIONS = {
    "butterworth": signal.buttord,
    "chebyshev1": signal.cheb1ord,
    "chebyshev2": signal.cheb2ord,
    "elliptic": signal.ellipord,
}


def _edge(v):
    return np.atleast_1d(np.asarray(v, dtype=float))


def fixtures():
    cases = []
    for req in REQUIREMENTS:
        wp = req["passband"][0] if len(req["passband"]) == 1 else req["passband"]
        ws = req["stopband"][0] if len(req["stopband"]) == 1 else req["stopband"]
        families = {}
        for name, fn in ORDER_FUNCTIONS.items():
            order, wn = fn(wp, ws, req["ripple"], req["attenuation"], fs=req["fs"])
            families[name] = {"order": int(order), "naturalEdgesHz": _edge(wn)}
        case = {**req, "families": families}
        cases.append(Tolerated(case, fields={f"*.{k}": t for k, t in BANDSTOP_SEARCH.items()}) if req["response"] == "bandstop" else case)
    return {
        "mask_orders": Fixture(
            cases, tol=Tol(rel=1e-12, why="order formulas and natural edges in closed form; orders are integers")
        )
    }
