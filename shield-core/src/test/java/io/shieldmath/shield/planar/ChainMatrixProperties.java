/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.planar;

import io.shieldmath.shield.internal.ChainMatrix;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * Property tests of the engine's shortcuts, each against the plain computation it
 * replaces: the closed-form free-space reference against the Commons Math chain matrix of
 * a free-space slab, and {@code expm1Fast} against {@link Math#expm1}.
 */
class ChainMatrixProperties {

    // 10 000 tries in the normal suite; the mutation profile lowers it with -Dshield.tries.
    private static final int TRIES = Integer.getInteger("shield.tries", 10_000);

    @Test
    void closedFormFreeSpaceReferenceAgreesWithCommonsMathChainMatrix() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            IncidentField field = PlanarProperties.randomField(r);
            double hz = PlanarProperties.logUniform(r, 1e-3, 1e11);
            double t = PlanarProperties.logUniform(r, 1e-9, 1);
            Barrier slab = Barrier.of(Layer.gap(Length.ofMetres(t)));
            Complex ref = ReferenceChainMatrix.transmission(slab, field, hz);
            Complex z = io.shieldmath.shield.TestComplex.cm(field.waveImpedance(Frequency.ofHertz(hz)));
            double fast = ChainMatrix.logFreeSpaceTransmission(t, hz, z.getReal(), z.getImaginary());
            double lnRef = Math.log(ref.abs());
            assertEquals(lnRef, fast, 1e-10 * Math.max(1, Math.abs(lnRef)), () -> "seed " + seed + " " + field);
        });
    }

    @Test
    void planeWaveFreeSpaceReferenceIsExactlyOne() {
        // |T| = 1: a free-space slab between free-space impedances reflects nothing (Schelkunoff 1943).
        IncidentField plane = IncidentField.planeWave();
        for (double hz : new double[] {1e-6, 1, 1e4, 1e9, 1e13}) {
            assertEquals(0.0, ChainMatrix.logFreeSpaceTransmission(0.37, hz, plane.impedanceReal(hz),
                    plane.impedanceImaginary(hz)), 0.0);
        }
    }

    @Test
    void fastExpm1AgreesWithMathExpm1() {
        qt().withExamples(TRIES).forAll(longs().all()).checkAssert(seed -> {
            Random r = new Random(seed);
            // both sides of the cut-off, and far beyond it
            double x = r.nextBoolean() ? -2 * ChainMatrix.EXPM1_CUTOFF * r.nextDouble()
                    : -PlanarProperties.logUniform(r, 1e-300, 800);
            double exact = Math.expm1(x);
            assertEquals(exact, ChainMatrix.expm1Fast(x), 4e-16 * Math.abs(exact), () -> "x = " + x);
        });
        assertEquals(0.0, ChainMatrix.expm1Fast(0.0), 0.0);
    }
}
