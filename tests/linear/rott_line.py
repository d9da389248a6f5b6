#!/usr/bin/python3
"""Lossy transmission line (a circular duct) closed by an adiabatic buffer: the pressure
ratio p(l)/p(0) across the duct from Rott's functions (physics reference §6.2, §6.6;
N. Rott, Z. Angew. Math. Phys. 20, 230, 1969; G. W. Swift, J. Acoust. Soc. Am. 84, 1145,
1988), with SciPy's complex Bessel functions.

usage: rott_line.py r0 length buffer_volume p_m rho mu k cp gamma frequency
prints: real and imaginary part of p(l)/p(0)
"""
import sys

import numpy as np
from scipy.special import jv


def rott_circular(r0, delta):
    z = (1j - 1) * r0 / delta
    return 2 * jv(1, z) / (z * jv(0, z))


def ratio(r0, length, vb, pm, rho, mu, k, cp, gamma, f):
    w = 2 * np.pi * f
    area = np.pi * r0 ** 2
    f_nu = rott_circular(r0, np.sqrt(2 * mu / (rho * w)))
    f_kappa = rott_circular(r0, np.sqrt(2 * k / (rho * cp * w)))
    z_series = 1j * w * rho / (area * (1 - f_nu))
    y_shunt = 1j * w * area * (1 + (gamma - 1) * f_kappa) / (gamma * pm)
    zc = np.sqrt(z_series / y_shunt)
    kl = np.sqrt(z_series * y_shunt) * length
    y_buffer = 1j * w * vb / (gamma * pm)
    return 1.0 / (np.cosh(kl) + zc * y_buffer * np.sinh(kl))


if __name__ == "__main__":
    args = [float(a) for a in sys.argv[1:11]]
    r = ratio(*args)
    print(f"{r.real:.12e} {r.imag:.12e}")
