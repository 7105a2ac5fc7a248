/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.FieldMatrix;

/**
 * The straightforward way to compute a planar stack, written independently of the fast
 * path with Commons Math {@link Complex} and {@link FieldMatrix}: unscaled cosh and sinh
 * (so it overflows for thick layers; use it only below a few hundred nepers), the
 * textbook formulas of Schelkunoff 1943 and Ott 2009 ch. 6 typed in as they stand.
 */
final class ReferenceChainMatrix {

    private ReferenceChainMatrix() {
    }

    /** T of the barrier between the field's wave impedance on both sides. */
    static Complex transmission(Barrier barrier, IncidentField field, double hz) {
        return transmission(barrier, io.shieldmath.shield.TestComplex.cm(
                field.waveImpedance(io.shieldmath.shield.quantity.Frequency.ofHertz(hz))), hz);
    }

    /** Insertion loss in dB, 20·log10|T_free/T|, between a wave impedance of the caller's on both sides. */
    static double shieldingEffectivenessDb(Barrier barrier, Complex zw, double hz) {
        Complex free = transmission(Barrier.of(Layer.gap(barrier.totalThickness())), zw, hz);
        return 20 * Math.log10(free.abs() / transmission(barrier, zw, hz).abs());
    }

    /** T of the barrier between a wave impedance zw (Ω) on both sides. */
    static Complex transmission(Barrier barrier, Complex zw, double hz) {
        double w = 2 * Math.PI * hz;
        FieldMatrix<Complex> m = identity();
        for (Layer layer : barrier.layers()) {
            m = m.multiply(layerMatrix(layer, w, hz));
        }
        Complex a = m.getEntry(0, 0);
        Complex b = m.getEntry(0, 1);
        Complex c = m.getEntry(1, 0);
        Complex d = m.getEntry(1, 1);
        return new Complex(2).divide(a.add(b.divide(zw)).add(c.multiply(zw)).add(d));
    }

    /** T of free space of the barrier's total thickness. */
    static Complex freeSpaceTransmission(Barrier barrier, IncidentField field, double hz) {
        return transmission(Barrier.of(Layer.gap(barrier.totalThickness())), field, hz);
    }

    /** Insertion loss in dB, 20·log10|T_free/T|. */
    static double shieldingEffectivenessDb(Barrier barrier, IncidentField field, double hz) {
        return 20 * Math.log10(freeSpaceTransmission(barrier, field, hz).abs() / transmission(barrier, field, hz).abs());
    }

    static Complex gamma(Layer layer, double w, double hz) {
        Complex mu = new Complex(layer.medium().permeability().real(hz), -layer.medium().permeability().loss(hz))
                .multiply(PhysicalConstants.MU_0);
        Complex jwmu = Complex.I.multiply(w).multiply(mu);
        Complex admittance = new Complex(layer.medium().conductivity().toSiemensPerMetre(),
                w * PhysicalConstants.EPSILON_0 * layer.medium().permittivity().value());
        return jwmu.multiply(admittance).sqrt();
    }

    static Complex eta(Layer layer, double w, double hz) {
        Complex mu = new Complex(layer.medium().permeability().real(hz), -layer.medium().permeability().loss(hz))
                .multiply(PhysicalConstants.MU_0);
        return Complex.I.multiply(w).multiply(mu).divide(gamma(layer, w, hz));
    }

    private static FieldMatrix<Complex> layerMatrix(Layer layer, double w, double hz) {
        Complex gt = gamma(layer, w, hz).multiply(layer.thickness().toMetres());
        Complex eta = eta(layer, w, hz);
        Complex[][] e = {
            {gt.cosh(), eta.multiply(gt.sinh())},
            {gt.sinh().divide(eta), gt.cosh()}
        };
        return new Array2DRowFieldMatrix<>(e, false);
    }

    private static FieldMatrix<Complex> identity() {
        Complex[][] e = {{Complex.ONE, Complex.ZERO}, {Complex.ZERO, Complex.ONE}};
        return new Array2DRowFieldMatrix<>(ComplexField.getInstance(), 2, 2).add(
                new Array2DRowFieldMatrix<>(e, false));
    }
}
