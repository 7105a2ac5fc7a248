/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import java.util.Objects;

/**
 * The worse of an axial and a transverse uniform field for the same bodies and sensor
 * region: the model to hand to the design tools when the field's direction is not known.
 *
 * <pre>{@code
 * Arrangement can = Arrangement.of(Body.can("can", alloy, mm(20), mm(1), mm(42)));
 * SensorRegion sensor = SensorRegion.cylinder(mm(5), mm(10));
 * WorstDirectionShielding either = WorstDirectionShielding.of(
 *         can.inUniformAxialField().sensing(sensor), can.inUniformTransverseField().sensing(sensor));
 * MarginReport m = need.marginOf(either);       // the margin against the worse direction
 * either.at(Hz(50)).worstDirection();           // AXIAL or TRANSVERSE
 * }</pre>
 *
 * <p>A field at an angle θ to the axis is cos θ times the axial case plus sin θ times the
 * transverse one, so at every point |B| ≤ |cos θ|·|B_axial| + |sin θ|·|B_transverse| ≤
 * √2·max(|B_axial|, |B_transverse|): its worst factor over the sensor region is at least the
 * smaller of the two divided by √2 (3 dB less), since the two parts can add at a point. This
 * model reports the smaller of the two worst factors, the usual design figure, not that bound.
 *
 * <p>Its shielding effectiveness is the smaller of the two, in dB; each evaluation keeps its
 * own options (tolerance, fineness). Each frequency costs an axial and a transverse solve
 * (with eddy currents, the transverse one is the dearer).
 *
 * <p>Design tools take it as any {@link ShieldingModel}. {@code Requirement.marginOf(either)}
 * gives each entry's margin against the worse direction: for an entry at one frequency exactly
 * the smaller of the lines of {@code marginOf(either.axial())} and
 * {@code marginOf(either.transverse())}; for a band, the band search runs on the smaller SE,
 * so the line is the lowest of the two directions over the band. {@code BandSearch} and
 * {@code ThicknessSolver} likewise size a design for whichever direction is worse. A whole
 * design file holds this model as the applied field's {@code "direction": "worst"}
 * ({@link io.shieldmath.shield.axisymmetric.files.DesignFieldDirection#WORST}).
 *
 * <p>Immutable and thread-safe.
 */
public final class WorstDirectionShielding implements ShieldingModel<WorstDirectionSolution> {

    private final AxialFieldShielding axial;
    private final TransverseFieldShielding transverse;

    private WorstDirectionShielding(AxialFieldShielding axial, TransverseFieldShielding transverse) {
        this.axial = axial;
        this.transverse = transverse;
    }

    /**
     * Both directions of the same bodies and sensor region.
     *
     * @param axial      the axial evaluation, not null
     * @param transverse the transverse evaluation, not null
     * @return the model
     * @throws IllegalArgumentException if the two differ in arrangement or sensor region
     */
    public static WorstDirectionShielding of(AxialFieldShielding axial, TransverseFieldShielding transverse) {
        Require.nonNull("axial evaluation", axial);
        Require.nonNull("transverse evaluation", transverse);
        if (!axial.arrangement().equals(transverse.arrangement()) || !axial.sensor().equals(transverse.sensor())) {
            throw new IllegalArgumentException("the axial evaluation (" + axial + ") and the transverse one ("
                    + transverse + ") must have the same arrangement and sensor region");
        }
        return new WorstDirectionShielding(axial, transverse);
    }

    /**
     * The axial evaluation.
     *
     * @return it
     */
    public AxialFieldShielding axial() {
        return axial;
    }

    /**
     * The transverse evaluation.
     *
     * @return it
     */
    public TransverseFieldShielding transverse() {
        return transverse;
    }

    /**
     * The frequencies both evaluations accept (they share the quasi-static limit).
     *
     * @return the band
     */
    @Override
    public FrequencyBand validBand() {
        return transverse.validBand();
    }

    /**
     * Both results in an alternating field.
     *
     * @param frequency the frequency, within {@link #validBand()}, not null
     * @return both results
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is outside the valid band
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public WorstDirectionSolution at(Frequency frequency) {
        return new WorstDirectionSolution(axial.at(frequency), transverse.at(frequency));
    }

    /**
     * Both results in a static field.
     *
     * @return both results
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    public WorstDirectionSolution magnetostatic() {
        return new WorstDirectionSolution(axial.magnetostatic(), transverse.magnetostatic());
    }

    /**
     * The smaller of the two worst shielding factors, in dB; besides the valid band it
     * accepts 0 Hz, the static case.
     *
     * @param hertz the frequency in Hz, 0 up to the quasi-static limit
     * @return SE in dB, finite
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     * @throws MeshTooLargeException if a mesh would exceed the size cap
     * @throws ToleranceNotReachedException if a tolerance is set and cannot be met
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        return Math.min(axial.shieldingEffectivenessDb(hertz), transverse.shieldingEffectivenessDb(hertz));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WorstDirectionShielding w && w.axial.equals(axial) && w.transverse.equals(transverse);
    }

    @Override
    public int hashCode() {
        return Objects.hash(axial, transverse);
    }

    @Override
    public String toString() {
        return transverse.arrangement() + " in a uniform field of either direction, " + axial.sensor();
    }
}
