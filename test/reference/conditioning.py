"""Condition numbers the generators use to state their tolerances (see fixture.py).

Everything here is first-order perturbation theory: if each input (root, coefficient) moves by a relative
amount delta, an output moves by about delta times its condition number. The inputs of our fixtures differ
between machines by a few units in the last place (numpy's SIMD sin/cos/exp/log, OpenBLAS kernels, summation
order), so a tolerance of ULPS * EPS * condition, with ULPS a generous count of such units, holds on any
machine without hiding a real change.
"""
import math

import numpy as np

EPS = float(np.finfo(float).eps)  # 2.22e-16
ULPS = 64  # units in the last place an input may differ by between machines, with room to spare
DB_PER_NEPER = 20 / math.log(10)  # d(20 log10 |H|) = 8.69 d|H| / |H|


def as_complex(roots):
    """Roots as a complex array from numpy values, complex numbers or {re, im} dicts (stored form)."""
    out = []
    for r in roots:
        if isinstance(r, dict):
            out += [complex(r["re"], r["im"])] * int(r.get("multiplicity", 1))
        else:
            out.append(complex(r))
    return np.asarray(out, dtype=complex)


def product_form_condition(zeros, poles, omega):
    """Per frequency: how much a relative change delta of every root (and of e^{jw}) moves H, relative to |H|.

    H = k prod (e^{jw} - z) / prod (e^{jw} - p); a root r moved by delta |r| (and e^{jw} rounded) changes its
    factor by a relative delta (1 + |r|) / |e^{jw} - r|, and each of the n multiplications and divisions adds
    one rounding; the sum bounds the total (first order).
    """
    e = np.exp(1j * np.asarray(omega, dtype=float))[:, None]
    roots = np.concatenate([as_complex(zeros), as_complex(poles)])
    if roots.size == 0:
        return np.ones(len(omega))
    with np.errstate(divide="ignore"):
        return 1 + roots.size + np.sum((1 + np.abs(roots)[None, :]) / np.abs(e - roots[None, :]), axis=1)


def product_form_error(zeros, poles, gain, omega):
    """Per frequency: the absolute change of H per unit relative change of the roots; finite at a zero of H.

    The pole terms and the roundings scale |H|; a zero z_i contributes |k| (1 + |z_i|) times the other factors,
    which stays finite where e^{jw} = z_i and H itself is 0.
    """
    w = np.asarray(omega, dtype=float)
    e = np.exp(1j * w)[:, None]
    z, p = as_complex(zeros), as_complex(poles)
    dz = np.abs(e - z[None, :])
    with np.errstate(divide="ignore"):
        over_poles = abs(gain) / np.prod(np.abs(e - p[None, :]), axis=1) if p.size else abs(gain) * np.ones(len(w))
        h = over_poles * np.prod(dz, axis=1)
        pole_terms = np.sum((1 + np.abs(p)[None, :]) / np.abs(e - p[None, :]), axis=1) if p.size else 0
    zero_terms = np.zeros(len(w))
    for i in range(z.size):
        others = np.prod(np.delete(dz, i, axis=1), axis=1) if z.size > 1 else np.ones(len(w))
        zero_terms += (1 + abs(z[i])) * others
    return h * (1 + z.size + p.size + pole_terms) + over_poles * zero_terms


def polynomial_condition(coeffs, omega):
    """Per frequency: sum |c_k| / |C(e^{jw})|, the relative condition of evaluating C on the circle."""
    c = np.asarray(coeffs, dtype=float)
    e = np.exp(-1j * np.asarray(omega, dtype=float))
    value = np.polyval(c[::-1], e)
    with np.errstate(divide="ignore"):
        return np.sum(np.abs(c)) / np.abs(value)


def ratio_condition(b, a, omega):
    """Per frequency: relative condition of B(e^{jw}) / A(e^{jw}) under relative coefficient changes."""
    return 1 + polynomial_condition(b, omega) + polynomial_condition(a, omega)


def root_condition(coeffs, roots):
    """Per root: the absolute change of the root per unit relative change of every coefficient.

    For p(z) = sum c_k z^(n-k), a relative change delta of each c_k moves a simple root r by at most
    delta * sum |c_k| |r|^(n-k) / |p'(r)| (first order). Infinite for a repeated root.
    """
    c = np.asarray(coeffs, dtype=float)
    n = len(c) - 1
    r = as_complex(roots)
    powers = np.abs(r)[:, None] ** np.arange(n, -1, -1)[None, :]
    num = powers @ np.abs(c)
    der = np.abs(np.polyval(np.polyder(c), r)) if n > 0 else np.ones_like(np.abs(r))
    with np.errstate(divide="ignore"):
        return num / der


def eigenvalue_root_error(coeffs, roots):
    """Per root: the error bound of numpy.roots (eigenvalues of the companion matrix) per unit roundoff.

    The QR iteration is backward stable in norm: it returns the exact roots of coefficients changed by about
    n eps ||c||, not by eps per coefficient; so the bound uses the normwise condition
    ||c|| ||(r^n, ..., 1)|| / |p'(r)| times the degree n.
    """
    c = np.asarray(coeffs, dtype=float)
    n = len(c) - 1
    r = as_complex(roots)
    powers = np.abs(r)[:, None] ** np.arange(n, -1, -1)[None, :]
    with np.errstate(divide="ignore"):
        return n * np.linalg.norm(c) * np.linalg.norm(powers, axis=1) / np.abs(np.polyval(np.polyder(c), r))
