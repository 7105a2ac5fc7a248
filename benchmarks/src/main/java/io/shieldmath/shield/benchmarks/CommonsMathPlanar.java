/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.benchmarks;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.PhysicalConstants;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.complex.ComplexField;
import org.apache.commons.math3.linear.Array2DRowFieldMatrix;
import org.apache.commons.math3.linear.FieldMatrix;
import org.apache.commons.math3.linear.MatrixUtils;

/**
 * The baseline a Java developer would write first: the chain-matrix formulas (Schelkunoff's
 * transmission-line model, as in H. W. Ott, Electromagnetic Compatibility Engineering, Wiley 2009, ch. 6)
 * typed in with Commons Math {@link Complex} and {@link FieldMatrix}, unscaled cosh and
 * sinh, and the free-space reference computed the same way. It allocates many small
 * objects per point and overflows for layers thicker than a few hundred nepers; the
 * benchmark stacks stay far below that.
 *
 * <p>Stateless and thread-safe.
 */
final class CommonsMathPlanar {

    private CommonsMathPlanar() {
    }

    /**
     * Insertion loss 20·log10|T_free / T| of a barrier in a field.
     *
     * @param barrier the barrier
     * @param field   the incident field
     * @param hz      the frequency in Hz
     * @return SE in dB
     */
    static double shieldingEffectivenessDb(Barrier barrier, IncidentField field, double hz) {
        io.shieldmath.shield.quantity.Complex z = field.waveImpedance(Frequency.ofHertz(hz));
        Complex zw = new Complex(z.real(), z.imaginary());
        Complex t = transmission(barrier, zw, hz);
        Complex free = transmission(Barrier.of(Layer.gap(barrier.totalThickness())), zw, hz);
        return 20 * Math.log10(free.abs() / t.abs());
    }

    /** T = 2 / (A + B/Z + C·Z + D) of the product of the layers' chain matrices. */
    private static Complex transmission(Barrier barrier, Complex zw, double hz) {
        double w = 2 * Math.PI * hz;
        FieldMatrix<Complex> m = MatrixUtils.createFieldIdentityMatrix(ComplexField.getInstance(), 2);
        for (Layer layer : barrier.layers()) {
            Medium medium = layer.medium();
            PermeabilityModel mu = medium.permeability();
            Complex jwmu = Complex.I.multiply(w * PhysicalConstants.MU_0)
                    .multiply(new Complex(mu.real(hz), -mu.loss(hz)));
            Complex admittance = new Complex(medium.conductivity().toSiemensPerMetre(),
                    w * PhysicalConstants.EPSILON_0 * medium.permittivity().value());
            Complex gamma = jwmu.multiply(admittance).sqrt();
            Complex eta = jwmu.divide(gamma);
            Complex gt = gamma.multiply(layer.thickness().toMetres());
            Complex cosh = gt.cosh();
            Complex sinh = gt.sinh();
            Complex[][] entries = {{cosh, eta.multiply(sinh)}, {sinh.divide(eta), cosh}};
            m = m.multiply(new Array2DRowFieldMatrix<>(entries, false));
        }
        Complex s = m.getEntry(0, 0).add(m.getEntry(0, 1).divide(zw)).add(m.getEntry(1, 0).multiply(zw))
                .add(m.getEntry(1, 1));
        return new Complex(2).divide(s);
    }
}
