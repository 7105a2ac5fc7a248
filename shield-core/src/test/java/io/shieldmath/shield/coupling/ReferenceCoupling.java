/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.coupling;

import io.shieldmath.shield.internal.Elliptic;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.special.BesselJ;

/**
 * An independent, straightforward implementation of the coupling integral for two thin
 * loops, for tests: Commons Math {@link BesselJ}, {@link Complex} arithmetic for the TE
 * chain matrix (no scaling, so it is only for stacks of moderate absorption), and the
 * adaptive {@link IterativeLegendreGaussIntegrator} on sub-intervals of the λ axis.
 */
final class ReferenceCoupling {

    private ReferenceCoupling() {
    }

    /** F(λ) = e^{λt}·T(λ) of the stack, by the textbook product with Complex entries. */
    static Complex transmission(Barrier barrier, double lambda, double hz) {
        double w = 2 * Math.PI * hz;
        Complex a = Complex.ONE;
        Complex b = Complex.ZERO;
        Complex c = Complex.ZERO;
        Complex d = Complex.ONE;
        double total = 0;
        for (Layer l : barrier.layers()) {
            double s = l.medium().conductivity().toSiemensPerMetre();
            double mr = l.medium().permeability().real(hz);
            double ml = l.medium().permeability().loss(hz);
            Complex mu = new Complex(mr, -ml);
            // γ² = λ² + jωµ0µrσ
            Complex gamma = new Complex(lambda * lambda).add(Complex.I.multiply(mu).multiply(w * PhysicalConstants.MU_0 * s))
                    .sqrt();
            // z = Z_i/Z0 = µr·λ/γ
            Complex z = mu.multiply(lambda).divide(gamma);
            double t = l.thickness().toMetres();
            total += t;
            Complex ch = gamma.multiply(t).cosh();
            Complex sh = gamma.multiply(t).sinh();
            Complex la = ch;
            Complex lb = z.multiply(sh);
            Complex lc = sh.divide(z);
            Complex ld = ch;
            Complex na = a.multiply(la).add(b.multiply(lc));
            Complex nb = a.multiply(lb).add(b.multiply(ld));
            Complex nc = c.multiply(la).add(d.multiply(lc));
            Complex nd = c.multiply(lb).add(d.multiply(ld));
            a = na;
            b = nb;
            c = nc;
            d = nd;
        }
        return new Complex(2).divide(a.add(b).add(c).add(d)).multiply(Math.exp(lambda * total));
    }

    /**
     * M of two thin loops (radii a, b; turns n1, n2; planes z apart) through the barrier,
     * or in free space if the barrier is null.
     */
    static Complex mutual(double a, double n1, double b, double n2, double z, Barrier barrier, double hz,
                          double relative) {
        double pre = PhysicalConstants.MU_0 * Math.PI * a * b * n1 * n2;
        UnivariateFunction kernel = l -> BesselJ.value(1, l * a) * BesselJ.value(1, l * b) * Math.exp(-l * z);
        double abs = relative * 1e-2 * Elliptic.maxwell(a, b, z) / (PhysicalConstants.MU_0 * Math.PI * a * b);
        if (barrier == null) {
            return new Complex(pre * axis(kernel, a, b, z, relative, abs), 0);
        }
        double re = axis(l -> kernel.value(l) * transmission(barrier, l, hz).getReal(), a, b, z, relative, abs);
        double im = axis(l -> kernel.value(l) * transmission(barrier, l, hz).getImaginary(), a, b, z, relative, abs);
        return new Complex(pre * re, pre * im);
    }

    /** ∫0^∞ J1(λa)·J1(λb)·e^{−λz}·λ^{−n} dλ. */
    static double moment(double a, double b, double z, int n) {
        UnivariateFunction f = l -> BesselJ.value(1, l * a) * BesselJ.value(1, l * b) * Math.exp(-l * z)
                * Math.pow(l, -n);
        double abs = 1e-16 * Elliptic.maxwell(a, b, z) / (PhysicalConstants.MU_0 * Math.PI * a * b)
                * Math.pow(Math.max(a, z), n);
        return axis(f, a, b, z, 1e-13, abs);
    }

    /** The λ axis cut into intervals: geometric up to the geometry's scale, then quarter periods. */
    private static double axis(UnivariateFunction f, double a, double b, double z, double relative, double abs) {
        double rho = Math.max(a, b);
        double scale = 1 / Math.max(rho, z);
        double top = 46 / z;
        double sum = 0;
        double lo = 0;
        double hi = scale * 1e-8;
        while (lo < top) {
            double x1 = Math.min(hi, top);
            sum += integrate(f, lo, x1, relative, abs);
            lo = x1;
            hi = x1 < scale ? x1 * 2 : x1 + Math.min(Math.PI / (2 * rho), 2 / z);
        }
        return sum;
    }

    private static double integrate(UnivariateFunction f, double lo, double hi, double relative, double abs) {
        IterativeLegendreGaussIntegrator g = new IterativeLegendreGaussIntegrator(8, relative, abs, 2, 64);
        return g.integrate(Integer.MAX_VALUE, f, lo, hi);
    }
}
