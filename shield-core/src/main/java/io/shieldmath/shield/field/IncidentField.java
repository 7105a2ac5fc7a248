/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.field;

import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.internal.Require;
import java.util.Objects;
import io.shieldmath.shield.quantity.Complex;

/**
 * The field that falls on a barrier, described by its wave impedance Zw = E/H at the
 * barrier: a plane wave (Zw = η0), or the near field of a magnetic (loop) or electric
 * (rod) source at a distance r, with the impedance form chosen explicitly.
 *
 * <pre>{@code
 * IncidentField far = IncidentField.planeWave();
 * IncidentField loop = IncidentField.magneticNearField(Length.ofCentimetres(5), ImpedanceForm.TEXTBOOK);
 * }</pre>
 *
 * <p>Near-field source distance: {@value #MIN_DISTANCE_METRES} m to
 * {@value #MAX_DISTANCE_METRES} m (1 µm to 1000 km), refused outside it where the field is
 * made, so that the wave impedance and every evaluation of a barrier in the field are
 * finite at every frequency the models accept. A dipole source closer than its own size is
 * outside the near-field forms anyway (common practice, no source).
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class IncidentField {

    /** The smallest near-field source distance, in metres (1 µm). */
    public static final double MIN_DISTANCE_METRES = 1e-6;
    /** The largest near-field source distance, in metres (1000 km). */
    public static final double MAX_DISTANCE_METRES = 1e6;

    private static final IncidentField PLANE_WAVE = new IncidentField(FieldKind.PLANE_WAVE, null, null);

    private final FieldKind kind;
    private final Length distance;
    private final ImpedanceForm form;

    private IncidentField(FieldKind kind, Length distance, ImpedanceForm form) {
        this.kind = kind;
        this.distance = distance;
        this.form = form;
    }

    /**
     * A far-field plane wave, Zw = η0 ≈ 376.73 Ω.
     *
     * @return the plane wave
     */
    public static IncidentField planeWave() {
        return PLANE_WAVE;
    }

    /**
     * The near field of a magnetic (loop) source at distance r from the barrier.
     *
     * @param distance the source-to-barrier distance r, from 1 µm to 1000 km, not null
     * @param form     which wave impedance to use, not null
     * @return the field
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     */
    public static IncidentField magneticNearField(Length distance, ImpedanceForm form) {
        return new IncidentField(FieldKind.MAGNETIC_NEAR_FIELD, checked(distance),
                Require.nonNull("impedance form", form));
    }

    /**
     * The near field of an electric (rod) source at distance r from the barrier.
     *
     * @param distance the source-to-barrier distance r, from 1 µm to 1000 km, not null
     * @param form     which wave impedance to use, not null
     * @return the field
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is out of range
     */
    public static IncidentField electricNearField(Length distance, ImpedanceForm form) {
        return new IncidentField(FieldKind.ELECTRIC_NEAR_FIELD, checked(distance),
                Require.nonNull("impedance form", form));
    }

    private static Length checked(Length distance) {
        Require.inRange("near-field source distance", Require.nonNull("distance", distance).toMetres(),
                MIN_DISTANCE_METRES, MAX_DISTANCE_METRES, "m");
        return distance;
    }

    /**
     * The kind of source.
     *
     * @return the kind
     */
    public FieldKind kind() {
        return kind;
    }

    /**
     * The source distance, for near fields.
     *
     * @return r, or null for a plane wave
     */
    public Length distance() {
        return distance;
    }

    /**
     * The impedance form, for near fields.
     *
     * @return the form, or null for a plane wave
     */
    public ImpedanceForm form() {
        return form;
    }

    /**
     * The wave impedance Zw at a frequency.
     *
     * @param frequency the frequency, not null
     * @return Zw in ohms
     */
    public Complex waveImpedance(Frequency frequency) {
        double f = Require.nonNull("frequency", frequency).toHertz();
        return Complex.ofCartesian(impedanceReal(f), impedanceImaginary(f));
    }

    /**
     * The real part of Zw in ohms, without allocation (for hot paths).
     *
     * @param hertz the frequency in Hz, greater than 0
     * @return Re Zw
     */
    public double impedanceReal(double hertz) {
        switch (kind) {
            case PLANE_WAVE:
                return PhysicalConstants.ETA_0;
            case MAGNETIC_NEAR_FIELD: {
                double r = distance.toMetres();
                if (form == ImpedanceForm.TEXTBOOK) {
                    return 2 * Math.PI * hertz * PhysicalConstants.MU_0 * r;
                }
                double x = kr(hertz, r);
                double x2 = x * x;
                double x4 = x2 * x2;
                return PhysicalConstants.ETA_0 * x4 / (1 - x2 + x4);
            }
            default: {
                double r = distance.toMetres();
                if (form == ImpedanceForm.TEXTBOOK) {
                    return 1 / (2 * Math.PI * hertz * PhysicalConstants.EPSILON_0 * r);
                }
                double x = kr(hertz, r);
                double x2 = x * x;
                return PhysicalConstants.ETA_0 * x2 / (x2 + 1);
            }
        }
    }

    /**
     * The imaginary part of Zw in ohms, without allocation (for hot paths).
     *
     * @param hertz the frequency in Hz, greater than 0
     * @return Im Zw
     */
    public double impedanceImaginary(double hertz) {
        if (kind == FieldKind.PLANE_WAVE || form == ImpedanceForm.TEXTBOOK) {
            return 0;
        }
        double x = kr(hertz, distance.toMetres());
        double x2 = x * x;
        if (kind == FieldKind.MAGNETIC_NEAR_FIELD) {
            return PhysicalConstants.ETA_0 * x / (1 - x2 + x2 * x2);
        }
        // η0·(−jx)/(x⁴ + x²) = −j·η0/(x·(x² + 1)), written so that it cannot overflow for small x.
        return -PhysicalConstants.ETA_0 / (x * (x2 + 1));
    }

    private static double kr(double hertz, double r) {
        return 2 * Math.PI * hertz / PhysicalConstants.SPEED_OF_LIGHT * r;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof IncidentField f && f.kind == kind && Objects.equals(f.distance, distance)
                && f.form == form;
    }

    @Override
    public int hashCode() {
        return Objects.hash(kind, distance, form);
    }

    @Override
    public String toString() {
        switch (kind) {
            case PLANE_WAVE:
                return "plane wave";
            case MAGNETIC_NEAR_FIELD:
                return "magnetic near field at " + distance + " (" + formName() + ")";
            default:
                return "electric near field at " + distance + " (" + formName() + ")";
        }
    }

    private String formName() {
        return form == ImpedanceForm.TEXTBOOK ? "textbook impedance" : "exact dipole impedance";
    }
}
