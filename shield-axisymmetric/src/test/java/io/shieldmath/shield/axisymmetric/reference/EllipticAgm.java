/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import io.shieldmath.shield.internal.Require;

/**
 * Complete elliptic integrals of the first and second kind, K(k) and E(k), by the
 * arithmetic-geometric mean (AGM), written for this reference model independently of the
 * copy in shield-core.
 *
 * <p>The AGM scheme (Abramowitz &amp; Stegun, <i>Handbook of Mathematical Functions</i>, §17.6):
 * a0 = 1, b0 = k′ = sqrt(1 − k²), c0 = k; a_{n+1} = (a_n + b_n)/2, b_{n+1} = sqrt(a_n·b_n),
 * c_{n+1} = (a_n − b_n)/2. Then K = π/(2·a_∞) and E = K·(1 − Σ_{n≥0} 2^{n−1}·c_n²).
 * Departures from the textbook scheme: c_{n+1} is computed as c_n²/(4·a_{n+1}), never as the
 * difference (a_n − b_n)/2 (the same value: c_n² = a_n² − b_n² holds for every n, so
 * a_n − b_n = c_n²/(a_n + b_n)), and no digits are lost when k is small; k′ may be given
 * directly, so nothing is lost when k is close to 1 either.
 *
 * <p>Stateless and thread-safe.
 */
public final class EllipticAgm {

    /** Enough for full double precision: the AGM converges quadratically (5–7 steps in practice). */
    private static final int MAX_STEPS = 60;

    private EllipticAgm() {
    }

    /**
     * The complete elliptic integral of the first kind K(k) = ∫0^{π/2} dθ/sqrt(1 − k²·sin²θ).
     *
     * @param k the modulus, 0 ≤ k &lt; 1
     * @return K(k), π/2 at k = 0, growing without bound as k → 1
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if k is outside [0, 1)
     */
    public static double completeK(double k) {
        check(k);
        return run(k, Math.sqrt((1 - k) * (1 + k)))[0];
    }

    /**
     * The complete elliptic integral of the second kind E(k) = ∫0^{π/2} sqrt(1 − k²·sin²θ) dθ.
     *
     * @param k the modulus, 0 ≤ k &lt; 1
     * @return E(k), from π/2 at k = 0 down towards 1 as k → 1
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if k is outside [0, 1)
     */
    public static double completeE(double k) {
        check(k);
        double[] r = run(k, Math.sqrt((1 - k) * (1 + k)));
        // E = K·(1 − k²/2 − Σ_{n≥1} 2^{n−1}·c_n²), and r[1] = Σ_{n≥1} 2^n·c_n².
        return r[0] * (1 - 0.5 * k * k - 0.5 * r[1]);
    }

    /**
     * The bracket of Maxwell's formula for coaxial circles, (2/k − k)·K(k) − (2/k)·E(k), in the
     * cancellation-free form derived here from the AGM relations above:
     * (2 − k²)·K − 2E = K·Σ_{n≥1} 2^n·c_n², so the bracket is (K/k)·Σ_{n≥1} 2^n·c_n².
     * (Proof: 2E = 2K − K·Σ_{n≥0} 2^n·c_n² with c0² = k²; subtract.) For small k the sum is
     * k⁴/8·(1 + O(k²)), so the bracket is π·k³/16·(1 + O(k²)) without the loss of digits the
     * textbook difference suffers.
     *
     * @param k      the modulus, 0 ≤ k &lt; 1 (0 gives 0)
     * @param kPrime the complementary modulus sqrt(1 − k²), given separately so that it can be
     *               formed without cancellation when k is near 1; 0 &lt; kPrime ≤ 1
     * @return the bracket, 0 or more
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if k or kPrime is out of range
     */
    public static double maxwellBracket(double k, double kPrime) {
        check(k);
        Require.inRange("complementary modulus k'", kPrime, Double.MIN_NORMAL, 1, "");
        if (k == 0) {
            return 0;
        }
        double[] r = run(k, kPrime);
        return r[0] / k * r[1];
    }

    /** {K, Σ_{n≥1} 2^n·c_n²} for modulus k and complementary modulus kp. */
    private static double[] run(double k, double kp) {
        double a = 1;
        double b = kp;
        double c = k;
        double sum = 0;
        double pow = 1;
        for (int n = 0; n < MAX_STEPS; n++) {
            double a1 = 0.5 * (a + b);
            double b1 = Math.sqrt(a * b);
            // c_{n+1} = (a_n − b_n)/2 = (a_n² − b_n²)/(2(a_n + b_n)) = c_n²/(4·a_{n+1}).
            double c1 = c * c / (4 * a1);
            pow *= 2;
            sum += pow * c1 * c1;
            a = a1;
            b = b1;
            c = c1;
            if (c <= 1e-17 * a) {
                break;
            }
        }
        return new double[] {Math.PI / (2 * a), sum};
    }

    private static void check(double k) {
        if (!(k >= 0 && k < 1)) {
            throw new io.shieldmath.shield.quantity.InvalidQuantityException("elliptic modulus k",
                    Double.toString(k), "0 or more and less than 1");
        }
    }
}
