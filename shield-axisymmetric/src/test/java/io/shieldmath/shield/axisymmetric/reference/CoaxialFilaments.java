/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.PhysicalConstants;

/**
 * The mutual inductance of two coaxial circular filaments by Maxwell's closed form
 * (J. C. Maxwell, <i>A Treatise on Electricity and Magnetism</i>, art. 701; F. W. Grover,
 * <i>Inductance Calculations</i>, 1946):
 * M = µ0·sqrt(ab)·[(2/k − k)·K(k) − (2/k)·E(k)], k² = 4ab/((a + b)² + d²).
 *
 * <p>Evaluated as M = µ0·sqrt(ab)·(K(k)/k)·Σ_{n≥1} 2^n·c_n² (the bracket in the
 * cancellation-free form of {@link EllipticAgm#maxwellBracket}), with D = sqrt((a + b)² + d²),
 * k = 2·sqrt(ab)/D and k′ = sqrt((a − b)² + d²)/D formed directly, so it keeps full relative precision both for far
 * circles (k → 0, where the textbook bracket cancels) and for close ones (k → 1).
 *
 * <p>Stateless and thread-safe; allocation-free apart from the AGM's two-element result.
 */
public final class CoaxialFilaments {

    private static final double MU0 = PhysicalConstants.MU_0;

    private CoaxialFilaments() {
    }

    /**
     * Maxwell's mutual inductance of two coaxial circles.
     *
     * @param a  the first radius in m, 0 or more and finite (0 gives 0)
     * @param b  the second radius in m, 0 or more and finite (0 gives 0)
     * @param dz the axial distance between the circles' planes in m, finite, either sign
     * @return M in henries, 0 or more
     * @throws InvalidQuantityException if a value is negative or not finite, or if the two
     *                                  circles coincide (a = b &gt; 0 and dz = 0: M is infinite)
     */
    public static double mutualInductance(double a, double b, double dz) {
        if (!(a >= 0 && a < Double.POSITIVE_INFINITY)) {
            throw new InvalidQuantityException("filament radius a", a + " m", "finite and 0 m or more");
        }
        if (!(b >= 0 && b < Double.POSITIVE_INFINITY)) {
            throw new InvalidQuantityException("filament radius b", b + " m", "finite and 0 m or more");
        }
        if (!Double.isFinite(dz)) {
            throw new InvalidQuantityException("filament spacing", dz + " m", "finite");
        }
        if (a == 0 || b == 0) {
            return 0;
        }
        double rho = Math.hypot(a - b, dz);
        if (rho == 0) {
            throw new InvalidQuantityException("filament spacing", "0 m between two circles of radius " + a + " m",
                    "distinct circles (the mutual inductance of a circle with itself is infinite)");
        }
        return unchecked(a, b, dz, rho);
    }

    /** The same without argument checks, for the assembly loops; ρ = sqrt((a − b)² + dz²) &gt; 0. */
    static double unchecked(double a, double b, double dz, double rho) {
        double d = Math.hypot(a + b, dz);
        double k = 2 * Math.sqrt(a * b) / d;
        double kp = rho / d;
        if (k >= 1) {
            // Only by rounding when ρ/D is below 1e-16; the bracket's limit is then ln(4/k′) − 2.
            k = Math.nextDown(1.0);
        }
        return MU0 * Math.sqrt(a * b) * EllipticAgm.maxwellBracket(k, kp);
    }
}
