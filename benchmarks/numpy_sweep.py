#!/usr/bin/env python3
# Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
"""The 1 000-point, 3-layer sweep of PlanarSweepBenchmark, written with NumPy.

This is the alternative a practitioner would reach for: vectorised complex arrays over
all frequencies at once, the same chain-matrix formulas (Schelkunoff 1943; Ott 2009 ch. 6) as the library's
engine, and the same invented stack, field and band as Scenarios.java:
0.3 mm copper | 2 mm air | 0.5 mm 80 % nickel-iron (1.7 MS/m, µr = 50 000 relaxing with
a 2 kHz corner), in the magnetic near field of a loop 5 cm away (exact small-dipole
impedance), 1 000 log-spaced points from 10 Hz to 10 MHz.

Prints the points per second from the median of several timed repeats and, on its last line,
"points_per_second=N" for benchmarks/run.sh. Without NumPy it prints a skip message and
exits 0: nothing in the build depends on this script.
"""
import sys
import time

try:
    import numpy as np
except ImportError:
    print("numpy_sweep.py: NumPy is not installed; the NumPy comparison is skipped.")
    sys.exit(0)

MU_0 = 1.25663706212e-6  # H/m, CODATA 2018 (as PhysicalConstants.java)
EPSILON_0 = 8.8541878128e-12  # F/m, CODATA 2018
C = 299_792_458.0  # m/s, exact
ETA_0 = np.sqrt(MU_0 / EPSILON_0)

POINTS = 1000
REPEATS = 200


def relaxation(mu_dc, corner_hz):
    """First-order relaxation mu(f) = mu_dc / (1 + j f/fc), returned as (mu', mu'')."""
    def model(hz):
        x = hz / corner_hz
        return mu_dc / (1 + x * x), mu_dc * x / (1 + x * x)
    return model


def constant(mu):
    return lambda hz: (np.full_like(hz, mu), np.zeros_like(hz))


# (thickness m, sigma S/m, epsilon_r, permeability model): Scenarios.stack(3)
STACK = [
    (0.3e-3, 58.0e6, 1.0, constant(1.0)),
    (2e-3, 0.0, 1.0, constant(1.0)),
    (0.5e-3, 1.7e6, 1.0, relaxation(50_000, 2e3)),
]
R = 0.05  # loop distance, m


def wave_impedance(hz):
    """Exact small-dipole magnetic near-field impedance eta0*jkr(1+jkr)/((jkr)^2 + jkr + 1)."""
    jx = 1j * (2 * np.pi * hz / C * R)
    return ETA_0 * jx * (1 + jx) / (jx * jx + jx + 1)


def log_transmission(layers, hz, zw):
    """ln|T| of the stack between Zw on both sides, each layer scaled by e^{gamma t}/2."""
    w = 2 * np.pi * hz
    a = np.ones_like(zw)
    b = np.zeros_like(zw)
    c = np.zeros_like(zw)
    d = np.ones_like(zw)
    log_scale = np.zeros_like(hz)
    for t, sigma, eps, mu in layers:
        mu_r, mu_i = mu(hz)
        jwmu = 1j * w * MU_0 * (mu_r - 1j * mu_i)
        gamma = np.sqrt(jwmu * (sigma + 1j * w * EPSILON_0 * eps))
        eta = jwmu / gamma
        one_minus_e = -np.expm1(-2 * gamma * t)
        one_plus_e = 2 - one_minus_e
        lb = eta * one_minus_e
        lc = one_minus_e / eta
        a, b, c, d = (a * one_plus_e + b * lc, a * lb + b * one_plus_e,
                      c * one_plus_e + d * lc, c * lb + d * one_plus_e)
        log_scale += np.log(2) - gamma.real * t
    s = a + b / zw + c * zw + d
    return np.log(2) - np.log(np.abs(s)) + log_scale


def shielding_effectiveness_db(hz):
    zw = wave_impedance(hz)
    total = sum(layer[0] for layer in STACK)
    free = [(total, 0.0, 1.0, constant(1.0))]
    return 20 / np.log(10) * (log_transmission(free, hz, zw) - log_transmission(STACK, hz, zw))


def main():
    hz = np.exp(np.linspace(np.log(10.0), np.log(10e6), POINTS))
    se = shielding_effectiveness_db(hz)
    if not np.all(np.isfinite(se)):
        print("numpy_sweep.py: the NumPy sweep gave a non-finite SE", file=sys.stderr)
        return 1
    times = []
    for _ in range(REPEATS):
        start = time.perf_counter()
        shielding_effectiveness_db(hz)
        times.append(time.perf_counter() - start)
    median = sorted(times)[REPEATS // 2]
    pps = POINTS / median
    print(f"NumPy {np.__version__}, {POINTS}-point 3-layer sweep: median of {REPEATS} runs "
          f"{median * 1e3:.3f} ms, {pps:,.0f} points per second "
          f"(SE {se[0]:.2f} dB at 10 Hz, {se[POINTS // 2]:.2f} dB at 10 kHz, {se[-1]:.1f} dB at 10 MHz)")
    print(f"points_per_second={pps:.0f}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
