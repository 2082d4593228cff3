"""Reference data for real signals: WAV files written by Python's wave module and scipy.io.wavfile,
scipy.signal.sosfilt / lfilter on a hum-plus-noise recording, numpy.fft on assorted lengths,
scipy.signal.get_window samples, and scipy.signal.welch in several settings.

Signals and filters are our own scenarios (a 50 Hz hum with harmonics over noise, notches and low-passes
designed here); noise comes from numpy.random.default_rng with fixed seeds. WAV files are stored as base64
of the exact bytes each library wrote, so the TypeScript reader is tested on files it did not write.
"""
import base64
import io
import warnings
import wave

import numpy as np
from scipy import signal
from scipy.io import wavfile

from conditioning import EPS, ULPS
from fixture import Fixture, Tol, Tolerated

SAMPLES = Tol(rel=ULPS * EPS, abs=ULPS * EPS, why="seeded noise plus np.cos tones (SIMD cos: an ulp or two per machine)")


def _b64(data: bytes) -> str:
    return base64.b64encode(data).decode("ascii")


def _wave_bytes(ints, sampwidth, channels, rate):
    """A WAV file as the standard library's wave module writes it (integer PCM only)."""
    buf = io.BytesIO()
    with wave.open(buf, "wb") as w:
        w.setnchannels(channels)
        w.setsampwidth(sampwidth)
        w.setframerate(rate)
        if sampwidth == 1:
            raw = (np.asarray(ints) + 128).astype(np.uint8).tobytes()
        elif sampwidth == 3:
            v = np.asarray(ints, dtype=np.int32).astype("<i4").tobytes()
            raw = b"".join(v[i : i + 3] for i in range(0, len(v), 4))
        else:
            raw = np.asarray(ints).astype(f"<i{sampwidth}").tobytes()
        w.writeframes(raw)
    return buf.getvalue()


def _wav_cases(rng):
    frames = 120
    t = np.arange(frames) / 8000.0
    tone = 0.6 * np.sin(2 * np.pi * 440 * t)
    out = {}
    i16 = np.round(tone * 32767).astype(np.int64)
    i16[:2] = [-32768, 32767]  # the extremes of the format
    out["i16_mono_wave"] = {"bytes": _wave_bytes(i16, 2, 1, 8000), "ints": [i16], "rate": 8000, "format": "i16"}
    left = np.round(rng.uniform(-1, 1, frames) * 32767).astype(np.int64)
    right = np.round(tone * 20000).astype(np.int64)
    inter = np.column_stack([left, right]).ravel()
    out["i16_stereo_wave"] = {
        "bytes": _wave_bytes(inter, 2, 2, 44100),
        "ints": [left, right],
        "rate": 44100,
        "format": "i16",
    }
    u8 = np.round(tone * 127).astype(np.int64)
    u8[:2] = [-128, 127]
    out["u8_mono_wave"] = {"bytes": _wave_bytes(u8, 1, 1, 8000), "ints": [u8], "rate": 8000, "format": "u8"}
    i24 = np.round(tone * 8388607).astype(np.int64)
    i24[:2] = [-8388608, 8388607]
    out["i24_mono_wave"] = {"bytes": _wave_bytes(i24, 3, 1, 48000), "ints": [i24], "rate": 48000, "format": "i24"}
    f32 = tone.astype(np.float32)
    f32[:2] = [-1.0, 1.5]  # float files may exceed full scale
    buf = io.BytesIO()
    wavfile.write(buf, 22050, f32)
    out["f32_mono_scipy"] = {
        "bytes": buf.getvalue(),
        "floats": [f32.astype(np.float64)],
        "rate": 22050,
        "format": "f32",
    }
    stereo64 = np.column_stack([tone, -0.5 * tone]).astype(np.float64)
    buf = io.BytesIO()
    wavfile.write(buf, 16000, stereo64)
    out["f64_stereo_scipy"] = {
        "bytes": buf.getvalue(),
        "floats": [stereo64[:, 0], stereo64[:, 1]],
        "rate": 16000,
        "format": "f64",
    }
    i32 = np.round(tone * 2147483647).astype(np.int64)
    buf = io.BytesIO()
    wavfile.write(buf, 8000, i32.astype(np.int32))
    out["i32_mono_scipy"] = {"bytes": buf.getvalue(), "ints": [i32], "rate": 8000, "format": "i32"}
    return {name: {**case, "bytes": _b64(case["bytes"])} for name, case in out.items()}


def _hum_recording(rng, n, fs):
    t = np.arange(n) / fs
    hum = 0.3 * np.cos(2 * np.pi * 50 * t) + 0.1 * np.cos(2 * np.pi * 150 * t + 0.4)
    return hum + 0.05 * rng.standard_normal(n)


def _filter_cases(rng):
    fs = 1000.0
    x = _hum_recording(rng, 800, fs)
    b_notch, a_notch = signal.iirnotch(50.0, 30.0, fs=fs)
    cases = {
        "notch": signal.tf2sos(b_notch, a_notch),
        "butter6_low": signal.butter(6, 120.0, fs=fs, output="sos"),
        "ellip4_high": signal.ellip(4, 0.5, 60, 30.0, btype="high", fs=fs, output="sos"),
    }
    out = []
    for name, sos in cases.items():
        b, a = signal.sos2tf(sos)
        out.append({"name": name, "sos": sos, "b": b, "a": a})
    return {"source": "scipy.signal.sosfilt / lfilter", "fs": fs, "x": x, "cases": out}


def _filter_outputs(f):
    """sosfilt and lfilter on the committed sections, b, a and samples: sos2tf's BLAS dot products differ by an
    ulp between CPU kernels, which the expanded 12th-order low-pass amplifies ~1e5 times; from the committed bits
    both filters run the same operations everywhere."""
    out = []
    for c in f["cases"]:
        y_sos = np.asarray(signal.sosfilt(c["sos"], f["x"]))
        y_tf = np.asarray(signal.lfilter(c["b"], c["a"], f["x"]))
        peak = float(np.max(np.abs(y_sos)))
        out.append({
            "y_sos": Tolerated(y_sos, Tol(rel=1e-12, abs=1e-13 * peak, why="sosfilt on committed inputs")),
            "y_tf": Tolerated(y_tf, Tol(rel=1e-9, abs=1e-9 * peak, why="lfilter on committed b, a: a 12th-order recursion")),
        })
    return {"cases": out}


def _fft_cases(rng):
    out = []
    for n in [1, 2, 3, 5, 8, 12, 97, 128, 360]:
        x = rng.standard_normal(n) + 1j * rng.standard_normal(n)
        # an FFT's rounding error is ~eps log2(n) times the input's size, in every output
        size = float(np.sum(np.abs(x)))
        tol = Tol(rel=0, abs=ULPS * EPS * (1 + np.log2(n)) * size, why=f"FFT of {n} points: eps log2(n) sum|x|")
        out.append({"n": n, "x": x, "X": Tolerated(np.fft.fft(x), tol)})
    return {"source": "numpy.fft.fft", "cases": out}


def fft_test_signal(n):
    """The long-transform test signal, also built in test/core/signal/fft.test.ts: tones, a chirp and a step."""
    j = np.arange(n, dtype=float)
    re = np.sin(0.37 * j) + 0.25 * np.cos(1.3 * j + 1e-3 * (j % 97) ** 2) + (j < n / 3)
    im = np.cos(0.21 * j) - 0.5 * np.sin(2.9 * j)
    return re + 1j * im


def _fft_long_cases():
    """Transforms too long to store whole: every length the page or command line may use for a segment (powers
    of two, audio rates, lengths with factors 3, 5 and 7, primes), stored as 48 spread bins and the energy."""
    out = []
    for n in [4096, 65536, 6000, 44100, 48000, 1000, 2310, 12288, 10007, 8191, 4999 * 2]:
        X = np.fft.fft(fft_test_signal(n))
        bins = sorted(set(int(k) for k in np.linspace(0, n - 1, 48).round()) | {1, n // 2})
        out.append({"n": n, "bins": bins, "X": X[bins], "energy": float(np.sum(np.abs(X) ** 2))})
    return {"source": "numpy.fft.fft", "cases": out}


def _window_cases():
    names = {"rectangular": "boxcar", "hann": "hann", "hamming": "hamming", "blackman": "blackman",
             "flattop": "flattop"}
    out = []
    for ours, theirs in names.items():
        for n in [8, 9, 64]:
            out.append({"name": ours, "n": n, "symmetric": False, "w": signal.get_window(theirs, n)})
        out.append({"name": ours, "n": 9, "symmetric": True, "w": signal.get_window(theirs, 9, fftbins=False)})
        w = signal.get_window(theirs, 4096)
        n = len(w)
        k = np.arange(n)
        half = abs(np.sum(w * np.exp(-1j * np.pi * k / n)))
        out.append({
            "name": ours, "n": n, "figures": True,
            "coherentGain": np.sum(w) / n,
            "enbwBins": n * np.sum(w ** 2) / np.sum(w) ** 2,
            "scallopingLossDb": -20 * np.log10(half / np.sum(w)),
        })
    return {"source": "scipy.signal.get_window", "cases": out}


def _power_tol(p):
    """Averaged |FFT|^2 of windowed segments: each bin is accurate to ~eps log2(n) of the largest power (the
    bins far below the peak share the FFT's absolute error), so the bound is relative to the peak."""
    return Tol(rel=1e-12, abs=1e-12 * float(np.max(p)), why="Welch power: FFT rounding relative to the peak bin")


def _welch_cases(rng):
    fs = 1000.0
    x = _hum_recording(rng, 2400, fs) + 0.2
    settings = [
        {"window": "hann", "nperseg": 256, "noverlap": None, "scaling": "density", "detrend": "constant", "nfft": None},
        {"window": "hamming", "nperseg": 200, "noverlap": 50, "scaling": "spectrum", "detrend": "constant", "nfft": None},
        {"window": "blackman", "nperseg": 512, "noverlap": 384, "scaling": "density", "detrend": False, "nfft": None},
        {"window": "flattop", "nperseg": 255, "noverlap": 100, "scaling": "spectrum", "detrend": "constant", "nfft": None},
        {"window": "boxcar", "nperseg": 128, "noverlap": 0, "scaling": "density", "detrend": False, "nfft": 300},
        {"window": "hann", "nperseg": 1024, "noverlap": 1000, "scaling": "spectrum", "detrend": False, "nfft": None},
    ]
    ours = {"boxcar": "rectangular"}
    out = []
    for s in settings:
        f, p = signal.welch(x, fs=fs, window=s["window"], nperseg=s["nperseg"], noverlap=s["noverlap"],
                            nfft=s["nfft"], scaling=s["scaling"], detrend=s["detrend"])
        out.append({**s, "window": ours.get(s["window"], s["window"]),
                    "detrend": "none" if s["detrend"] is False else s["detrend"], "f": f,
                    "p": Tolerated(p, _power_tol(p))})
    short = x[:100]
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")  # scipy says it shortens nperseg to the signal; that is the case tested
        f, p = signal.welch(short, fs=fs, nperseg=256)
    out.append({"window": "hann", "nperseg": 256, "noverlap": None, "scaling": "density", "detrend": "constant",
                "nfft": None, "short": True, "f": f, "p": Tolerated(p, _power_tol(p))})
    return {"source": "scipy.signal.welch", "fs": fs, "x": x, "cases": out}


def fixtures():
    rng = np.random.default_rng(20260507)
    return {
        "signal_wav": Fixture(
            {"source": "Python wave module / scipy.io.wavfile.write", "cases": _wav_cases(rng)},
            tol=Tol(rel=0, why="bytes and integer samples are exact; the float samples are float32 roundings of "
                    "np.sin, which an ulp of sin would change only across a rounding boundary (chance ~1e-8 each)"),
        ),
        "signal_filter": Fixture(
            _filter_cases(rng),
            tol=Tol(rel=1e-13, abs=1e-16, why="designed sections and sos2tf: a few ulps"),
            fields={"x": SAMPLES},
            derive=_filter_outputs,
        ),
        "signal_fft": Fixture(_fft_cases(rng), tol=Tol(rel=0, why="seeded PCG64 normal samples: the same bits everywhere")),
        "signal_fft_long": Fixture(
            _fft_long_cases(),
            tol=Tol(rel=1e-12, abs=1e-9, why="numpy.fft of a signal built from np.sin/np.cos: the transform's and "
                    "sin's rounding over up to 65 536 terms"),
        ),
        "signal_windows": Fixture(
            _window_cases(),
            tol=Tol(rel=ULPS * EPS, abs=ULPS * EPS, why="sums of np.cos terms bounded by 1: a few ulps of 1"),
            fields={"cases.scallopingLossDb": Tol(rel=1e-12, abs=1e-13, why="log of a ratio of sums of 4096 window samples")},
        ),
        "signal_welch": Fixture(
            _welch_cases(rng),
            tol=Tol(rel=ULPS * EPS, why="frequencies k fs / nfft and the settings"),
            fields={"x": SAMPLES},
        ),
    }
