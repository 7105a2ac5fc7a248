/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.numerics;

/**
 * A solved field of the first azimuthal mode per unit applied flux density B0 across the
 * axis (along φ = 0): B = (b_r·cos φ, b_φ·sin φ, b_z·cos φ)·B0. Two solvers make it: the
 * scalar potential of {@link TransverseSolve} (no current) and the vector potential of
 * {@link TransverseEddySolve} (eddy currents). Immutable and thread-safe; evaluation works on
 * primitives.
 */
public abstract class TransverseField {

    private final Mesh mesh;
    private final double residualBefore;
    private final double residualAfter;

    TransverseField(Mesh mesh, double before, double after) {
        this.mesh = mesh;
        this.residualBefore = before;
        this.residualAfter = after;
    }

    /**
     * The mesh this field lives on.
     *
     * @return the mesh
     */
    public final Mesh mesh() {
        return mesh;
    }

    /**
     * The relative residual ‖f − S·x‖/‖f‖ of the first solve, before refinement.
     *
     * @return the residual
     */
    public final double residualBeforeRefinement() {
        return residualBefore;
    }

    /**
     * The relative residual after one step of iterative refinement.
     *
     * @return the residual
     */
    public final double residualAfterRefinement() {
        return residualAfter;
    }

    /**
     * Evaluates the azimuthal amplitudes of B at a point inside the box, per unit B0.
     *
     * @param r   radius in m, 0 to the box radius
     * @param z   axial coordinate in m, within the box
     * @param out receives [b_r re, b_r im, b_φ re, b_φ im, b_z re, b_z im]
     */
    public abstract void evaluate(double r, double z, double[] out);
}
