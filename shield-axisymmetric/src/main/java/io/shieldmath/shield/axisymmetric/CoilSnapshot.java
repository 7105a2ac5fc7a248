/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.axisymmetric.numerics.Field;
import io.shieldmath.shield.axisymmetric.numerics.HarmonicSolve;
import io.shieldmath.shield.axisymmetric.numerics.Mesh;
import io.shieldmath.shield.internal.Text;

/**
 * Everything one mesh gives at one frequency for a coil pair, per ampere (peak) of
 * transmitter current: the mutual inductance with and without the bodies, the reverse
 * mutual inductance (receiver driven), the transmitter's self flux linkage, and the
 * transmitter's field for post-processing. The factorisation itself is not kept.
 */
final class CoilSnapshot {

    final double hertz;
    final double m0;
    final double mRe;
    final double mIm;
    final double revRe;
    final double revIm;
    final double selfRe;
    final double selfIm;
    final Field field;
    final int unknowns;
    final int bandwidth;
    final double residual;

    private CoilSnapshot(double hertz, double m0, double[] m, double[] rev, double[] self, Field field, Mesh mesh,
                         double residual) {
        this.hertz = hertz;
        this.m0 = m0;
        this.mRe = m[0];
        this.mIm = m[1];
        this.revRe = rev[0];
        this.revIm = rev[1];
        this.selfRe = self[0];
        this.selfIm = self[1];
        this.field = field;
        this.unknowns = mesh.unknowns();
        this.bandwidth = mesh.bandwidth();
        this.residual = residual;
    }

    /** The free-space mutual inductance on a mesh (bodies set to air), the reference of the insertion loss. */
    static double freeSpace(Mesh mesh) {
        double[] out = new double[2];
        new HarmonicSolve(mesh, 0, true).coilField(0).linkage(1, out);
        return out[0];
    }

    static CoilSnapshot solve(Mesh mesh, double m0, double hertz) {
        HarmonicSolve s = new HarmonicSolve(mesh, hertz, false);
        Field tx = s.coilField(0);
        Field rx = s.coilField(1);
        double[] m = new double[2];
        double[] rev = new double[2];
        double[] self = new double[2];
        tx.linkage(1, m);
        rx.linkage(0, rev);
        tx.linkage(0, self);
        double res = Math.max(tx.residualAfterRefinement(), rx.residualAfterRefinement());
        return new CoilSnapshot(hertz, m0, m, rev, self, tx, mesh, res);
    }

    double insertionLossDb(String what) {
        double mod = Math.hypot(mRe, mIm);
        double db = 20 * Math.log10(Math.abs(m0) / mod);
        if (!Double.isFinite(db)) {
            // Name the cause from the values, and clip the description (issue 15 item 13).
            String cause = !(Double.isFinite(mRe) && Double.isFinite(mIm))
                    ? "the solved mutual inductance is not finite (a body's permeability model may return a value "
                    + "outside finite µ' > 0 and µ'' >= 0)"
                    : mod == 0 ? "the shielded mutual inductance underflowed to 0 H (the bodies screen the coils by far "
                    + "more than the solver can resolve)"
                    : "the free-space mutual inductance is " + Text.number(m0) + " H";
            throw new ArithmeticException("the insertion loss of " + Text.clip(what) + " at " + Text.number(hertz)
                    + " Hz is not finite: " + cause + " (M = " + Text.number(mRe) + " + j" + Text.number(mIm)
                    + " H, M0 = " + Text.number(m0) + " H)");
        }
        return db;
    }
}
