/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The radial transfer engine of closed shells, on primitives: no objects are created per
 * call, so it is the hot path of every shell evaluation.
 *
 * <p>Method: the quasi-static field of a sphere (vector potential A_φ = f(r)·sin θ) or of
 * a long cylinder (A_z = f(r)·sin φ across the axis; H_z = h(r) along it) is carried
 * outwards from the innermost cavity as a two-component state in the coordinate
 * u = ln r, matching at every boundary the two quantities that are continuous there:
 * <ul>
 *   <li>sphere: f and g = (f + r f')/µr (normal B and tangential H);</li>
 *   <li>cylinder, transverse: f and g = r f'/µr;</li>
 *   <li>cylinder, axial: h = H_z and ψ = ∫ µr·h·2r dr (tangential H and the enclosed flux,
 *       which fixes the tangential E by Faraday's law).</li>
 * </ul>
 * Air gaps are crossed exactly by the dipole (or uniform-field) solutions. Inside a wall
 * the radial equation, in u, is r² f'' + 2r f' − (2 + k²r²) f = 0 (sphere),
 * r² f'' + r f' − (1 + k²r²) f = 0 (cylinder, transverse) or r² h'' + r h' − k²r² h = 0
 * (axial), with k² = jωµ0µrσ; its solutions are modified (spherical) Bessel functions.
 * The wall is cut into sublayers no thicker than {@value #MAX_STEP} in ln r, and in each
 * sublayer k²r² is frozen at the sublayer's middle, which gives exponential solutions
 * e^{su} with s = −½ ± sqrt(9/4 + k²r²) (sphere), ±sqrt(1 + k²r²) (transverse) or ±k·r
 * (axial). This is exact for k = 0 (static fields, or σ = 0) for any wall thickness, and
 * for conducting walls it converges to the Bessel-function solution with an error of
 * order (step)² (checked against the closed-form Bessel solution of the sphere: below 1e-5 of ln S at the
 * step used); for a single thin wall it reduces to Kaden's thin-shell formulas.
 *
 * <p>Numerics: cosh and sinh of thick, well-conducting sublayers overflow, so each
 * sublayer's matrix is divided by e^{Re(s)·Δu} when Re(s)·Δu is large, and the state is
 * renormalised after each step; both scales are carried as a logarithm, so |S| stays
 * finite in dB for any thickness.
 */
public final class RadialChain {

    /** The largest sublayer thickness in ln r. */
    public static final double MAX_STEP = 0.001;
    /** The most sublayers in one wall. */
    public static final int MAX_SUBLAYERS = 1 << 15;

    /** Geometry code: a spherical shell. */
    public static final int SPHERE = 0;
    /** Geometry code: a long cylinder across the field. */
    public static final int CYLINDER_TRANSVERSE = 1;
    /** Geometry code: a long cylinder along the field. */
    public static final int CYLINDER_AXIAL = 2;

    private RadialChain() {
    }

    /**
     * ln |S| of a shell, with S = applied field over the field in the innermost cavity.
     *
     * @param geometry    one of the geometry codes
     * @param inner       inner radius of each layer, m, increasing
     * @param outer       outer radius of each layer, m (outer[i] ≤ inner[i + 1])
     * @param sigma       conductivity of each layer, S/m (ignored when staticField)
     * @param mu          permeability model of each layer, null for an air gap
     * @param hz          frequency in Hz (ignored when staticField)
     * @param staticField true for a static field: µr = µ'(0) and no eddy currents
     * @param out         null, or at least 1 slot receiving arg S in radians
     * @param wallLogFlux null, or one slot per layer receiving ln of the mean tangential
     *                    flux density in that layer over the applied flux density
     *                    (static only; gaps receive NaN)
     * @return ln |S|
     */
    public static double logShielding(int geometry, double[] inner, double[] outer, double[] sigma,
                               PermeabilityModel[] mu, double hz, boolean staticField, double[] out,
                               double[] wallLogFlux) {
        final double omega = 2 * Math.PI * hz;
        final int n = inner.length;
        double r = inner[0];
        // State (x, y), complex, and its log scale.
        double xr, xi = 0, yr, yi = 0;
        double logScale;
        if (geometry == SPHERE) {
            xr = 1;
            yr = 2;
            logScale = Math.log(r);
        } else if (geometry == CYLINDER_TRANSVERSE) {
            xr = 1;
            yr = 1;
            logScale = Math.log(r);
        } else {
            xr = 1;
            yr = r * r;
            logScale = 0;
        }
        for (int layer = 0; layer < n; layer++) {
            final double a = inner[layer];
            final double b = outer[layer];
            if (a > r) {
                // Air between the previous layer and this one.
                double[] g = GAP_SCRATCH.get();
                gap(geometry, r, a, xr, xi, yr, yi, logScale, g);
                xr = g[0];
                xi = g[1];
                yr = g[2];
                yi = g[3];
                logScale = g[4];
                r = a;
            }
            if (mu[layer] == null) {
                double[] g = GAP_SCRATCH.get();
                gap(geometry, a, b, xr, xi, yr, yi, logScale, g);
                xr = g[0];
                xi = g[1];
                yr = g[2];
                yi = g[3];
                logScale = g[4];
                r = b;
                if (wallLogFlux != null) {
                    wallLogFlux[layer] = Double.NaN;
                }
                continue;
            }
            // Complex relative permeability µ' − jµ''.
            final double mr = staticField ? mu[layer].staticValue() : mu[layer].real(hz);
            final double mi = staticField ? 0 : -mu[layer].loss(hz);
            if (Numerics.breaksContract(mr, -mi)) {
                return Double.NaN;      // a user model outside finite µ' > 0, µ'' ≥ 0: the caller names it
            }
            // kk = jωµ0σ (the k² per unit µr) and k² = kk·µr.
            final double kkI = staticField ? 0 : omega * PhysicalConstants.MU_0 * sigma[layer];
            final double k2r = -kkI * mi;
            final double k2i = kkI * mr;
            final double total = Math.log(b / a);
            int steps = (int) Math.ceil(total / MAX_STEP);
            steps = Math.max(1, Math.min(MAX_SUBLAYERS, steps));
            final double du = total / steps;
            double fluxSum = 0;
            double fluxRef = logScale;
            if (wallLogFlux != null) {
                fluxSum += tangentialFlux(geometry, r, mr, xr, xi, yr, yi);
            }
            for (int j = 0; j < steps; j++) {
                final double ra = a * Math.exp(j * du);
                final double rb = a * Math.exp((j + 1) * du);
                final double rm = Math.sqrt(ra * rb);
                // Exponent s (complex): p for the sphere, q otherwise, so that the pair is −½ ± p or ± q.
                double s2r, s2i, r2;
                if (geometry == CYLINDER_AXIAL) {
                    // Frozen r² chosen so that the static step is exact: (rb² − ra²)/(2Δu).
                    r2 = (rb * rb - ra * ra) / (2 * du);
                    s2r = k2r * r2;
                    s2i = k2i * r2;
                } else {
                    r2 = rm * rm;
                    s2r = (geometry == SPHERE ? 2.25 : 1) + k2r * r2;
                    s2i = k2i * r2;
                }
                // Principal square root p = sqrt(s2), Re p ≥ 0.
                final double mod = Math.hypot(s2r, s2i);
                double pr, pi;
                if (mod == 0) {
                    pr = 0;
                    pi = 0;
                } else if (s2r >= 0) {
                    // pr is 0 only when s2 is a subnormal (0.5·mod underflows): then p is 0 to within 1e-162.
                    pr = Math.sqrt(0.5 * (mod + s2r));
                    pi = pr > 0 ? s2i / (2 * pr) : 0;
                } else {
                    pi = Math.sqrt(0.5 * (mod - s2r));
                    pr = pi > 0 ? s2i / (2 * pi) : 0;
                    if (pr < 0) {
                        pi = -pi;
                        pr = -pr;
                    }
                }
                // z = p·Δu; c = cosh z, sh = sinh z, both divided by e^{zr} if zr is large.
                final double zr = pr * du;
                final double zi = pi * du;
                double cr, ci, shr, shi, stepLog;
                final double cy = Math.cos(zi);
                final double sy = Math.sin(zi);
                if (zr < 20) {
                    final double chx = Math.cosh(zr);
                    final double shx = Math.sinh(zr);
                    cr = chx * cy;
                    ci = shx * sy;
                    shr = shx * cy;
                    shi = chx * sy;
                    stepLog = 0;
                } else {
                    final double e = Math.exp(-2 * zr);
                    cr = 0.5 * (cy + e * cy);
                    ci = 0.5 * (sy - e * sy);
                    shr = 0.5 * (cy - e * cy);
                    shi = 0.5 * (sy + e * sy);
                    stepLog = zr;
                }
                // sinh(z)/z, for the axial case where p may be 0.
                double m00r, m00i, m01r, m01i, m10r, m10i, m11r, m11i;
                if (geometry == CYLINDER_AXIAL) {
                    double scr, sci;
                    if (Math.abs(zr) + Math.abs(zi) < 1e-4) {
                        // Series sinh(z)/z = 1 + z²/6 + z⁴/120 + …, the z⁴ term below 1e-18: the quotient
                        // below would lose |z|² to underflow (0/0 for |z| under 1e-154, a conductivity of
                        // 1e-300 S/m at 1 µHz, issue 15 item 11).
                        scr = 1 + (zr * zr - zi * zi) / 6;
                        sci = zr * zi / 3;
                    } else {
                        final double zz = zr * zr + zi * zi;
                        scr = (shr * zr + shi * zi) / zz;
                        sci = (shi * zr - shr * zi) / zz;
                    }
                    // [[c, (kk/2)·Δu·sc], [2µ·r²·Δu·sc, c]] with kk = j·kkI.
                    m00r = cr;
                    m00i = ci;
                    m11r = cr;
                    m11i = ci;
                    final double h = 0.5 * kkI * du;
                    m01r = -h * sci;
                    m01i = h * scr;
                    final double w = 2 * r2 * du;
                    m10r = w * (mr * scr - mi * sci);
                    m10i = w * (mr * sci + mi * scr);
                } else {
                    // sh/p and p·sh
                    final double pp = pr * pr + pi * pi;
                    final double sopR = (shr * pr + shi * pi) / pp;
                    final double sopI = (shi * pr - shr * pi) / pp;
                    // µ·sh/p
                    m01r = mr * sopR - mi * sopI;
                    m01i = mr * sopI + mi * sopR;
                    final double mm = mr * mr + mi * mi;
                    if (geometry == SPHERE) {
                        // (p² − 1/4)·(sh/p)/µ, c ∓ (sh/p)/2, all times e^{−Δu/2} (folded into the log).
                        final double qr = s2r - 0.25;
                        final double qi = s2i;
                        final double tr = qr * sopR - qi * sopI;
                        final double ti = qr * sopI + qi * sopR;
                        m10r = (tr * mr + ti * mi) / mm;
                        m10i = (ti * mr - tr * mi) / mm;
                        m00r = cr - 0.5 * sopR;
                        m00i = ci - 0.5 * sopI;
                        m11r = cr + 0.5 * sopR;
                        m11i = ci + 0.5 * sopI;
                        stepLog -= 0.5 * du;
                    } else {
                        // p·sh/µ
                        final double tr = pr * shr - pi * shi;
                        final double ti = pr * shi + pi * shr;
                        m10r = (tr * mr + ti * mi) / mm;
                        m10i = (ti * mr - tr * mi) / mm;
                        m00r = cr;
                        m00i = ci;
                        m11r = cr;
                        m11i = ci;
                    }
                }
                final double nxr = m00r * xr - m00i * xi + m01r * yr - m01i * yi;
                final double nxi = m00r * xi + m00i * xr + m01r * yi + m01i * yr;
                final double nyr = m10r * xr - m10i * xi + m11r * yr - m11i * yi;
                final double nyi = m10r * xi + m10i * xr + m11r * yi + m11i * yr;
                final double norm = Math.max(Math.max(Math.abs(nxr), Math.abs(nxi)),
                        Math.max(Math.abs(nyr), Math.abs(nyi)));
                xr = nxr / norm;
                xi = nxi / norm;
                yr = nyr / norm;
                yi = nyi / norm;
                logScale += stepLog + Math.log(norm);
                if (wallLogFlux != null) {
                    fluxSum += tangentialFlux(geometry, rb, mr, xr, xi, yr, yi) * Math.exp(logScale - fluxRef);
                }
            }
            if (wallLogFlux != null) {
                wallLogFlux[layer] = fluxRef + Math.log(fluxSum / (steps + 1));
            }
            r = b;
        }
        // The applied-field coefficient outside.
        double sr, si;
        if (geometry == SPHERE) {
            sr = (xr + yr) / (3 * r);
            si = (xi + yi) / (3 * r);
        } else if (geometry == CYLINDER_TRANSVERSE) {
            sr = (xr + yr) / (2 * r);
            si = (xi + yi) / (2 * r);
        } else {
            sr = xr;
            si = xi;
        }
        final double logS = logScale + 0.5 * Math.log(sr * sr + si * si);
        if (out != null) {
            out[0] = Math.atan2(si, sr);
        }
        if (wallLogFlux != null) {
            // Applied flux density: 2α (sphere), α (transverse), µ0·h (axial), in the same units as tangentialFlux.
            double applied = logS + (geometry == SPHERE ? Math.log(2) : 0);
            for (int i = 0; i < n; i++) {
                wallLogFlux[i] -= applied;
            }
        }
        return logS;
    }

    /** |B_t|/µ0 in the state's units: µr·|g|/r (sphere and transverse) or µr·|h| (axial). */
    private static double tangentialFlux(int geometry, double r, double mr, double xr, double xi,
                                         double yr, double yi) {
        if (geometry == CYLINDER_AXIAL) {
            return mr * Math.hypot(xr, xi);
        }
        return mr * Math.hypot(yr, yi) / r;
    }

    private static final ThreadLocal<double[]> GAP_SCRATCH = ThreadLocal.withInitial(() -> new double[5]);

    /** Carries the state exactly across air from r1 to r2; writes x, y (re, im) and the log scale. */
    private static void gap(int geometry, double r1, double r2, double xr, double xi, double yr, double yi,
                            double logScale, double[] res) {
        double nxr, nxi, nyr, nyi;
        if (geometry == CYLINDER_AXIAL) {
            final double d = r2 * r2 - r1 * r1;
            nxr = xr;
            nxi = xi;
            nyr = yr + d * xr;
            nyi = yi + d * xi;
        } else if (geometry == SPHERE) {
            // f = αr + β/r², g = 2αr − β/r²
            final double ar = (xr + yr) / (3 * r1);
            final double ai = (xi + yi) / (3 * r1);
            final double q = r1 * r1 / 3;
            final double br = (2 * xr - yr) * q;
            final double bi = (2 * xi - yi) * q;
            final double inv = 1 / (r2 * r2);
            nxr = ar * r2 + br * inv;
            nxi = ai * r2 + bi * inv;
            nyr = 2 * ar * r2 - br * inv;
            nyi = 2 * ai * r2 - bi * inv;
        } else {
            // f = αr + β/r, g = αr − β/r
            final double ar = (xr + yr) / (2 * r1);
            final double ai = (xi + yi) / (2 * r1);
            final double br = (xr - yr) * r1 / 2;
            final double bi = (xi - yi) * r1 / 2;
            nxr = ar * r2 + br / r2;
            nxi = ai * r2 + bi / r2;
            nyr = ar * r2 - br / r2;
            nyi = ai * r2 - bi / r2;
        }
        final double norm = Math.max(Math.max(Math.abs(nxr), Math.abs(nxi)), Math.max(Math.abs(nyr), Math.abs(nyi)));
        res[0] = nxr / norm;
        res[1] = nxi / norm;
        res[2] = nyr / norm;
        res[3] = nyi / norm;
        res[4] = logScale + Math.log(norm);
    }
}
