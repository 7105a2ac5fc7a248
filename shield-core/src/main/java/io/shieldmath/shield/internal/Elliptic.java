/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * Complete elliptic integrals by the arithmetic-geometric mean, and Maxwell's closed form
 * for the mutual inductance of two coaxial circles built on them. Stateless and thread-safe.
 *
 * <p>With a0 = 1, b0 = k' = sqrt(1 − k²), c0 = k and a_{n+1} = (a_n + b_n)/2,
 * b_{n+1} = sqrt(a_n·b_n), c_{n+1} = (a_n − b_n)/2:
 * K(k) = π / (2·a_∞) and E(k) = K(k)·(1 − Σ_{n≥0} 2^{n−1}·c_n²) (DLMF 19.8.1, 19.8.6; the
 * modulus convention K(k) = ∫0^{π/2} dθ / sqrt(1 − k²·sin²θ)). The c_n are computed as
 * c_{n+1} = c_n² / (4·a_{n+1}), which has no cancellation.
 */
public final class Elliptic {

    private Elliptic() {
    }

    /**
     * K(k) and the sum Σ_{n≥1} 2^{n−1}·c_n², from k² and k'² = 1 − k² given separately
     * (so that nearly touching circles lose no digits).
     *
     * @param k2  k², in [0, 1)
     * @param kc2 k'² = 1 − k², in (0, 1]
     * @param out receives [0] K(k), [1] Σ_{n≥1} 2^{n−1}·c_n²
     */
    public static void agm(double k2, double kc2, double[] out) {
        double a = 1;
        double b = Math.sqrt(kc2);
        double c = Math.sqrt(k2);
        double sum = 0;
        double pow = 0.5;
        for (int n = 0; n < 40; n++) {
            double an = 0.5 * (a + b);
            double bn = Math.sqrt(a * b);
            c = c * c / (4 * an);
            pow *= 2;
            double term = pow * c * c;
            sum += term;
            a = an;
            b = bn;
            if (term <= 1e-17 * sum || c == 0) {
                break;
            }
        }
        out[0] = Math.PI / (2 * a);
        out[1] = sum;
    }

    /**
     * K(k), the complete elliptic integral of the first kind.
     *
     * @param k the modulus, in [0, 1)
     * @return K(k)
     */
    public static double firstKind(double k) {
        double[] r = new double[2];
        agm(k * k, (1 - k) * (1 + k), r);
        return r[0];
    }

    /**
     * E(k), the complete elliptic integral of the second kind.
     *
     * @param k the modulus, in [0, 1)
     * @return E(k)
     */
    public static double secondKind(double k) {
        double[] r = new double[2];
        double k2 = k * k;
        agm(k2, (1 - k) * (1 + k), r);
        // E = K·(1 − k²/2 − Σ_{n≥1} 2^{n−1} c_n²)
        return r[0] * (1 - 0.5 * k2 - r[1]);
    }

    /**
     * Maxwell's mutual inductance of two coaxial circles of radii a and b whose planes are
     * z apart: M = µ0·sqrt(ab)·[(2/k − k)·K(k) − (2/k)·E(k)], k² = 4ab/((a+b)² + z²)
     * (J. C. Maxwell, <i>A Treatise on Electricity and Magnetism</i>, 1873, art. 701;
     * F. W. Grover, <i>Inductance Calculations</i>, 1946). The bracket is evaluated as
     * (2/k)·K·Σ_{n≥1} 2^{n−1}·c_n², the same quantity with the cancelling k²/2 terms removed,
     * so distant circles (small k) keep full precision.
     *
     * @param a the first radius in m, greater than 0
     * @param b the second radius in m, greater than 0
     * @param z the plane separation in m, 0 or more (not 0 if a = b)
     * @return M in henries, greater than 0
     */
    public static double maxwell(double a, double b, double z) {
        double den = (a + b) * (a + b) + z * z;
        double k2 = 4 * a * b / den;
        double kc2 = ((a - b) * (a - b) + z * z) / den;
        double[] r = new double[2];
        agm(k2, kc2, r);
        double k = Math.sqrt(k2);
        return PhysicalConstants.MU_0 * Math.sqrt(a * b) * (2 / k) * r[0] * r[1];
    }
}
