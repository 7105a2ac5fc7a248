/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.quantity.PhysicalConstants;
import org.apache.commons.math3.complex.Complex;

/**
 * The closed-form thin-shell factors of a single wall (H. Kaden, Wirbelströme und
 * Schirmung in der Nachrichtentechnik, Springer 1959), with
 * k = sqrt(jωµ0µrσ) (= (1+j)/δ for real µr), R the wall's mean radius, t its thickness:
 * <ul>
 *   <li>sphere: S = cosh(kt) + ⅓(kR/µr + 2µr/(kR))·sinh(kt);</li>
 *   <li>cylinder, transverse: S = cosh(kt) + ½(kR/µr + µr/(kR))·sinh(kt);</li>
 *   <li>cylinder, axial: S = cosh(kt) + (kR/(2µr))·sinh(kt).</li>
 * </ul>
 * Written as S = cosh(kt) + (c1·k²Rt/µr + c2·µr·t/R)·sinh(kt)/(kt), which is the same
 * and stays finite at k = 0, where it gives the static thin-shell factors
 * 1 + (2/3)µr·t/R and 1 + µr·t/(2R). For |Re kt| &gt; 20 it is evaluated in log form.
 * Valid for t ≪ R and R much smaller than the free-space wavelength.
 */
final class Kaden {

    private Kaden() {
    }

    /** c1 (eddy-current term) and c2 (flux-guiding term) of each geometry. */
    static double eddyCoefficient(ShellGeometry g) {
        return g == ShellGeometry.SPHERE ? 1.0 / 3 : 0.5;
    }

    static double guideCoefficient(ShellGeometry g) {
        switch (g) {
            case SPHERE:
                return 2.0 / 3;
            case CYLINDER_TRANSVERSE:
                return 0.5;
            default:
                return 0;
        }
    }

    /** The static thin-shell factor 1 + c2·µr·t/R. */
    static double staticFactor(ShellGeometry g, double mu, double r, double t) {
        return 1 + guideCoefficient(g) * mu * t / r;
    }

    /**
     * ln S (complex: real part ln|S|, imaginary part arg S).
     *
     * @param mu µr = µ' − jµ'' as a complex number (imaginary part −µ'')
     */
    static Complex logFactor(ShellGeometry g, Complex mu, double sigma, double omega, double r, double t) {
        Complex k2 = new Complex(0, omega * PhysicalConstants.MU_0 * sigma).multiply(mu);
        Complex k = k2.sqrt();
        Complex x = k.multiply(t);
        Complex p = k2.multiply(eddyCoefficient(g) * r * t).divide(mu).add(mu.multiply(guideCoefficient(g) * t / r));
        if (x.getReal() < 20) {
            Complex sinhc = x.abs() < 1e-8 ? Complex.ONE.add(x.multiply(x).divide(6)) : x.sinh().divide(x);
            return x.cosh().add(p.multiply(sinhc)).log();
        }
        Complex e = x.multiply(-2).exp();
        Complex bracket = Complex.ONE.add(e).add(p.multiply(Complex.ONE.subtract(e)).divide(x));
        return x.subtract(Math.log(2)).add(bracket.log());
    }
}
