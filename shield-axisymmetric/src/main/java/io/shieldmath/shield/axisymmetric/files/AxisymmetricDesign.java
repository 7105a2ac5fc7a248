/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.AxialFieldShielding;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CoilCoupling;
import io.shieldmath.shield.axisymmetric.TransverseFieldShielding;
import io.shieldmath.shield.axisymmetric.WorstDirectionShielding;
import io.shieldmath.shield.coupling.AmplitudeMeasure;
import io.shieldmath.shield.coupling.CoilPair;
import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.materials.internal.Spelling;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.quantity.CurrentAmplitude;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A whole axisymmetric design: finite bodies of revolution on one axis, either between a
 * transmitter and a receiver coil or in a uniform applied field read over a sensor region
 * (along the axis, across it, or the worse of the two), the band and number of points to
 * evaluate, the mesh tolerance, and every source case the design must meet.
 *
 * <pre>{@code
 * Catalogue cat = Catalogue.builtIn();
 * AxisymmetricDesign d = AxisymmetricDesign.inUniformAxialField(
 *         List.of(DesignBody.can("can", cat.get("nickel-iron-80"), mm(20), mm(1), mm(60))
 *                 .withCapHole(CanEnd.UPPER, mm(3))),
 *         DesignSensor.cylinder(mm(5), mm(10)), FrequencyBand.parse("10 Hz to 1 kHz"), 5)
 *     .withTolerance(Decibels.of(0.1))
 *     .meeting(Requirement.none().plus(FrequencyBand.parse("49 Hz to 51 Hz"), uT(40), nT(100)))
 *     .withTitle("sensor can");
 * WholeDesignFile.write(WholeDesign.of(d), Path.of("can.json"));
 * double se = d.model().shieldingEffectivenessDb(50);           // the same number the batch prints
 * }</pre>
 *
 * <p>{@link #model()} is the evaluation behind the common contract: a {@link CoilCoupling}
 * (insertion loss between the coils), or the worst shielding over the sensor region in the
 * applied field's {@link DesignFieldDirection direction}: an {@link AxialFieldShielding}, a
 * {@link TransverseFieldShielding}, or a {@link WorstDirectionShielding} of both (use
 * {@link #inUniformField(List, DesignSensor, DesignFieldDirection, FrequencyBand, int)} with
 * {@link DesignFieldDirection#WORST} when the field's direction is not known). Results are
 * estimates for idealised geometry and must be verified by measurement.
 *
 * <p>Immutable and thread-safe; equality is by value, the texts a design read from a file gave
 * its quantities in included. The {@code with…} and {@code meeting} methods return a copy.
 */
public final class AxisymmetricDesign {

    /** The solver's default mesh fineness, which a design file need not state. */
    public static final double DEFAULT_FINENESS = 1;

    /** The most evaluation points. */
    public static final int MAX_POINTS = CoilCoupling.MAX_SWEEP_POINTS;

    private final String title;
    private final List<DesignBody> bodies;
    private final DesignCoil transmitter;
    private final DesignCoil receiver;
    private final Length separation;
    private final CoilPair coils;
    private final CurrentAmplitude drive;
    private final AmplitudeMeasure driveMeasure;
    private final DesignSensor sensor;
    private final DesignFieldDirection direction;
    private final MagneticFluxDensity applied;
    private final Decibels tolerance;
    private final double fineness;
    private final FrequencyBand band;
    private final int points;
    private final Requirement requirement;
    private final Spelling spelling;
    private final Arrangement arrangement;
    private final ShieldingModel<?> model;

    private AxisymmetricDesign(String title, List<DesignBody> bodies, DesignCoil transmitter, DesignCoil receiver,
                               Length separation, CurrentAmplitude drive,
                               AmplitudeMeasure driveMeasure, DesignSensor sensor, DesignFieldDirection direction,
                               MagneticFluxDensity applied,
                               Decibels tolerance, double fineness, FrequencyBand band, int points,
                               Requirement requirement,
                               Spelling spelling, Arrangement arrangement, CoilPair coils, ShieldingModel<?> model) {
        this.title = title;
        this.bodies = bodies;
        this.transmitter = transmitter;
        this.receiver = receiver;
        this.separation = separation;
        this.coils = coils != null || transmitter == null ? coils
                : CoilPair.coaxial(transmitter.coil(), receiver.coil(), separation);
        this.drive = drive;
        this.driveMeasure = driveMeasure;
        this.sensor = sensor;
        this.direction = direction;
        this.applied = applied;
        this.tolerance = tolerance;
        this.fineness = fineness;
        this.band = band;
        this.points = points;
        this.requirement = requirement;
        this.spelling = spelling;
        this.arrangement = arrangement;
        // A copy that changes only what the solver does not see keeps the model already built.
        this.model = model != null ? model : buildModel();
    }

    private ShieldingModel<?> buildModel() {
        if (coils != null) {
            CoilCoupling c = arrangement.between(coils);
            c = fineness == DEFAULT_FINENESS ? c : c.withFineness(fineness);
            return tolerance == null ? c : c.withTolerance(tolerance);
        }
        AxialFieldShielding axial = null;
        TransverseFieldShielding transverse = null;
        if (direction != DesignFieldDirection.TRANSVERSE) {
            axial = arrangement.inUniformAxialField().sensing(sensor.region());
            axial = fineness == DEFAULT_FINENESS ? axial : axial.withFineness(fineness);
            axial = tolerance == null ? axial : axial.withTolerance(tolerance);
        }
        if (direction != DesignFieldDirection.AXIAL) {
            transverse = arrangement.inUniformTransverseField().sensing(sensor.region());
            transverse = fineness == DEFAULT_FINENESS ? transverse : transverse.withFineness(fineness);
            transverse = tolerance == null ? transverse : transverse.withTolerance(tolerance);
        }
        return switch (direction) {
            case AXIAL -> axial;
            case TRANSVERSE -> transverse;
            case WORST -> WorstDirectionShielding.of(axial, transverse);
        };
    }

    private static Arrangement arrangementOf(List<DesignBody> bodies) {
        List<Body> list = new ArrayList<>(bodies.size());
        for (DesignBody b : bodies) {
            list.add(Require.nonNull("body", b).body());
        }
        return Arrangement.of(list);
    }

    private static AxisymmetricDesign checked(AxisymmetricDesign d) {
        FrequencyBand valid = d.model.validBand();
        Require.inRange("band lower frequency", d.band.low().toHertz(), valid.low().toHertz(), valid.high().toHertz(),
                "Hz");
        Require.inRange("band upper frequency", d.band.high().toHertz(), valid.low().toHertz(),
                valid.high().toHertz(), "Hz");
        Require.inRange("points", d.points, 1, MAX_POINTS, "points");
        return d;
    }

    /**
     * A design of bodies between a transmitter and a receiver coil: evaluated as the insertion
     * loss 20·log10|M0/M| of the coils' mutual inductance.
     *
     * @param bodies      the bodies, none null, with different names and not overlapping; none for free space
     * @param transmitter the driven coil, centred at z = −separation/2, not null
     * @param receiver    the receiving coil, centred at z = +separation/2, not null
     * @param separation  the distance between the coils' centre planes, not null
     * @param band        the band to evaluate, within the quasi-static limit of the geometry, not null
     * @param points      the number of log-spaced points, 1 to {@value #MAX_POINTS}
     * @return the design
     * @throws IllegalArgumentException if bodies share a name or overlap, a coil cuts a body, or the
     *                                  coils' windings come too close (see {@link CoilPair})
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the band or points are out of range
     */
    public static AxisymmetricDesign betweenCoils(List<DesignBody> bodies, DesignCoil transmitter,
                                                  DesignCoil receiver, Length separation, FrequencyBand band,
                                                  int points) {
        List<DesignBody> b = List.copyOf(Require.nonNull("bodies", bodies));
        return checked(new AxisymmetricDesign("", b, Require.nonNull("transmitter", transmitter),
                Require.nonNull("receiver", receiver), Require.nonNull("separation", separation), null, null, null,
                null, null, null, DEFAULT_FINENESS,
                Require.nonNull("band", band), points, Requirement.none(), Spelling.DEFAULT, arrangementOf(b), null, null));
    }

    /**
     * A design of bodies in a uniform axial applied field, evaluated as the worst shielding
     * over the sensor region: {@link #inUniformField(List, DesignSensor, DesignFieldDirection,
     * FrequencyBand, int)} with {@link DesignFieldDirection#AXIAL}.
     *
     * @param bodies the bodies, none null, with different names and not overlapping
     * @param sensor where the field is read, not null
     * @param band   the band to evaluate, within the quasi-static limit of the geometry, not null
     * @param points the number of log-spaced points, 1 to {@value #MAX_POINTS}
     * @return the design
     * @throws IllegalArgumentException if bodies share a name or overlap
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the band or points are out of range
     */
    public static AxisymmetricDesign inUniformAxialField(List<DesignBody> bodies, DesignSensor sensor,
                                                         FrequencyBand band, int points) {
        return inUniformField(bodies, sensor, DesignFieldDirection.AXIAL, band, points);
    }

    /**
     * A design of bodies in a uniform applied field of the given direction, evaluated as the
     * worst shielding over the sensor region: along the axis ({@link AxialFieldShielding}),
     * across it ({@link TransverseFieldShielding}), or the smaller of the two
     * ({@link WorstDirectionShielding}, both solved at each frequency, so it costs an axial and
     * a transverse solve; with eddy currents the transverse one is the dearer).
     *
     * @param bodies    the bodies, none null, with different names and not overlapping
     * @param sensor    where the field is read, not null
     * @param direction the applied field's direction, not null
     * @param band      the band to evaluate, within the quasi-static limit of the geometry, not null
     * @param points    the number of log-spaced points, 1 to {@value #MAX_POINTS}
     * @return the design
     * @throws IllegalArgumentException if bodies share a name or overlap
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the band or points are out of range
     */
    public static AxisymmetricDesign inUniformField(List<DesignBody> bodies, DesignSensor sensor,
                                                    DesignFieldDirection direction, FrequencyBand band, int points) {
        List<DesignBody> b = List.copyOf(Require.nonNull("bodies", bodies));
        return checked(new AxisymmetricDesign("", b, null, null, null, null, null, Require.nonNull("sensor", sensor),
                Require.nonNull("direction", direction), null, null, DEFAULT_FINENESS,
                Require.nonNull("band", band), points, Requirement.none(), Spelling.DEFAULT, arrangementOf(b), null, null));
    }

    private AxisymmetricDesign copy(String t, CurrentAmplitude dr, AmplitudeMeasure dm, MagneticFluxDensity ap,
                                    Decibels tol, Requirement req, Spelling sp) {
        return new AxisymmetricDesign(t, bodies, transmitter, receiver, separation, dr, dm, sensor, direction, ap, tol,
                fineness,
                band, points, req, sp, arrangement, coils, Objects.equals(tol, tolerance) ? model : null);
    }

    /**
     * A copy with a title.
     *
     * @param newTitle the title, at most 200 characters without control characters; empty for none
     * @return the new design; this one is unchanged
     * @throws IllegalArgumentException if the title is too long or holds control characters
     */
    public AxisymmetricDesign withTitle(String newTitle) {
        Require.nonNull("title", newTitle);
        String t = newTitle.isBlank() ? "" : Require.text("design title", newTitle, 200);
        return t.equals(title) ? this : copy(t, drive, driveMeasure, applied, tolerance, requirement, spelling);
    }

    /**
     * A copy with the source cases the design must meet.
     *
     * @param newRequirement the bands with incident and tolerated flux densities or required SEs, not null
     * @return the new design; this one is unchanged
     */
    public AxisymmetricDesign meeting(Requirement newRequirement) {
        Require.nonNull("requirement", newRequirement);
        return copy(title, drive, driveMeasure, applied, tolerance, newRequirement, spelling);
    }

    /**
     * A copy whose evaluation refines the mesh until two successive meshes agree within a
     * tolerance (see {@link CoilCoupling#withTolerance(Decibels)}).
     *
     * @param newTolerance the tolerance, 0.001 dB to 10 dB, not null
     * @return the new design; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the tolerance is out of range
     */
    public AxisymmetricDesign withTolerance(Decibels newTolerance) {
        Require.inRange("tolerance", Require.nonNull("tolerance", newTolerance).toDb(), 0.001, 10, "dB");
        return copy(title, drive, driveMeasure, applied, newTolerance, requirement, spelling);
    }

    /**
     * A copy whose evaluation starts from a finer or coarser mesh (see
     * {@link CoilCoupling#withFineness(double)}): a study that computed a design at another
     * fineness writes it here, so that the file evaluates to the numbers the study printed.
     *
     * @param q the fineness, 0.25 to 16 ({@value #DEFAULT_FINENESS} by default)
     * @return the new design; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if q is out of range
     */
    public AxisymmetricDesign withFineness(double q) {
        Require.inRange("mesh fineness", q, 0.25, 16, "(plain number)");
        return new AxisymmetricDesign(title, bodies, transmitter, receiver, separation, drive, driveMeasure, sensor,
                direction, applied, tolerance, q, band, points, requirement, spelling, arrangement, coils,
                q == fineness ? model : null);
    }

    /**
     * The mesh fineness the evaluation starts from.
     *
     * @return q, {@value #DEFAULT_FINENESS} unless {@link #withFineness(double)} said otherwise
     */
    public double fineness() {
        return fineness;
    }

    /**
     * A copy with the transmitter's drive level (kept with the design for the field and loss
     * figures; the insertion loss does not depend on it).
     *
     * @param current the current amplitude, not null
     * @param measure how the amplitude is measured, not null
     * @return the new design; this one is unchanged
     * @throws IllegalStateException if this design is not between coils
     */
    public AxisymmetricDesign drivenAt(CurrentAmplitude current, AmplitudeMeasure measure) {
        if (coils == null) {
            throw new IllegalStateException("a drive level belongs to a design between coils; this one is in an "
                    + "applied field (give its level with withAppliedField)");
        }
        return copy(title, Require.nonNull("current", current), Require.nonNull("measure", measure), applied,
                tolerance, requirement, spelling);
    }

    /**
     * A copy with the level of the applied field (kept with the design for the field figures;
     * the shielding does not depend on it in this linear model).
     *
     * @param level the flux density of the applied field, not null
     * @return the new design; this one is unchanged
     * @throws IllegalStateException if this design is between coils
     */
    public AxisymmetricDesign withAppliedField(MagneticFluxDensity level) {
        if (coils != null) {
            throw new IllegalStateException("an applied field level belongs to a design in an applied field; this "
                    + "one is between coils (give its drive with drivenAt)");
        }
        return copy(title, drive, driveMeasure, Require.nonNull("level", level), tolerance, requirement, spelling);
    }

    AxisymmetricDesign spelledAs(Spelling newSpelling) {
        return newSpelling.equals(spelling) ? this
                : copy(title, drive, driveMeasure, applied, tolerance, requirement, newSpelling);
    }

    Spelling spelling() {
        return spelling;
    }

    /**
     * The evaluation through the common contract: a {@link CoilCoupling} between the coils, or
     * over the sensor region an {@link AxialFieldShielding}, a {@link TransverseFieldShielding}
     * or a {@link WorstDirectionShielding} as {@link #fieldDirection()} says, with the tolerance
     * and fineness if given.
     * Equal designs give equal models, and equal models bit-identical results.
     *
     * @return the model
     */
    public ShieldingModel<?> model() {
        return model;
    }

    /**
     * The bodies for the solver.
     *
     * @return the arrangement
     */
    public Arrangement arrangement() {
        return arrangement;
    }

    /**
     * The title.
     *
     * @return the title, empty if none
     */
    public String title() {
        return title;
    }

    /**
     * The bodies as given.
     *
     * @return an unmodifiable list
     */
    public List<DesignBody> bodies() {
        return bodies;
    }

    /**
     * The coils, for a design between coils.
     *
     * @return the coils, or empty in an applied field
     */
    public Optional<CoilPair> coils() {
        return Optional.ofNullable(coils);
    }

    /**
     * The transmitter coil as given, for a design between coils.
     *
     * @return the coil, or empty in an applied field
     */
    public Optional<DesignCoil> transmitter() {
        return Optional.ofNullable(transmitter);
    }

    /**
     * The receiver coil as given, for a design between coils.
     *
     * @return the coil, or empty in an applied field
     */
    public Optional<DesignCoil> receiver() {
        return Optional.ofNullable(receiver);
    }

    /**
     * The distance between the coils' centre planes, for a design between coils.
     *
     * @return the separation, or empty in an applied field
     */
    public Optional<Length> separation() {
        return Optional.ofNullable(separation);
    }

    /**
     * The transmitter's drive current amplitude, if given.
     *
     * @return the amplitude, or empty
     */
    public Optional<CurrentAmplitude> drive() {
        return Optional.ofNullable(drive);
    }

    /**
     * How the drive amplitude is measured, if a drive is given.
     *
     * @return the measure, or empty
     */
    public Optional<AmplitudeMeasure> driveMeasure() {
        return Optional.ofNullable(driveMeasure);
    }

    /**
     * The sensor, for a design in an applied field.
     *
     * @return the sensor, or empty between coils
     */
    public Optional<DesignSensor> sensor() {
        return Optional.ofNullable(sensor);
    }

    /**
     * The applied field's direction, for a design in an applied field.
     *
     * @return the direction, or empty between coils
     */
    public Optional<DesignFieldDirection> fieldDirection() {
        return Optional.ofNullable(direction);
    }

    /**
     * The applied field's level, if given.
     *
     * @return the flux density, or empty
     */
    public Optional<MagneticFluxDensity> appliedField() {
        return Optional.ofNullable(applied);
    }

    /**
     * The mesh tolerance, if given.
     *
     * @return the tolerance, or empty for one solve on the default mesh
     */
    public Optional<Decibels> tolerance() {
        return Optional.ofNullable(tolerance);
    }

    /**
     * The band to evaluate.
     *
     * @return the band
     */
    public FrequencyBand band() {
        return band;
    }

    /**
     * The number of log-spaced points.
     *
     * @return 1 to {@value #MAX_POINTS}
     */
    public int points() {
        return points;
    }

    /**
     * The source cases the design must meet.
     *
     * @return the requirement, {@link Requirement#none()} if none is given
     */
    public Requirement requirement() {
        return requirement;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof AxisymmetricDesign d && d.title.equals(title) && d.bodies.equals(bodies)
                && Objects.equals(d.transmitter, transmitter) && Objects.equals(d.receiver, receiver)
                && Objects.equals(d.separation, separation) && Objects.equals(d.drive, drive) && d.driveMeasure == driveMeasure
                && Objects.equals(d.sensor, sensor) && d.direction == direction && Objects.equals(d.applied, applied)
                && Objects.equals(d.tolerance, tolerance) && Double.compare(d.fineness, fineness) == 0
                && d.band.equals(band) && d.points == points
                && d.requirement.equals(requirement) && d.spelling.equals(spelling);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, bodies, transmitter, receiver, separation, drive, driveMeasure, sensor, direction,
                applied, tolerance, fineness, band,
                points, requirement, spelling);
    }

    /** The applied field in words, as {@link #toString()} gives it. */
    private static String fieldWords(DesignFieldDirection d) {
        return switch (d) {
            case AXIAL -> "a uniform axial field";
            case TRANSVERSE -> "a uniform transverse field";
            case WORST -> "a uniform field, the worse of axial and transverse";
        };
    }

    @Override
    public String toString() {
        return (title.isEmpty() ? "axisymmetric design" : title) + ": " + bodies
                + (coils != null ? " between " + coils : " in " + fieldWords(direction) + ", " + sensor) + ", " + band + ", "
                + points + " points" + (tolerance == null ? "" : ", tolerance " + tolerance)
                + (fineness == DEFAULT_FINENESS ? "" : ", fineness " + fineness)
                + (requirement.entries().isEmpty() ? "" : ", " + requirement);
    }
}
