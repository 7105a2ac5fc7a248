/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Which way round to put a conductive layer and a high-permeability layer: both orders
 * are evaluated against a requirement, with the saturation check of the high-µ layer.
 *
 * <p>What decides it. In the planar transmission-line model both orders give the same
 * SE: a passive stack between equal wave impedances transmits the same both ways
 * (reciprocity). The order matters for the high-µ layer's flux density: facing the
 * source it carries the full field; behind the conductor it sees the field already
 * reduced by the conductor's shielding factor S_c(f), which is large at high frequency
 * and near 1 at mains frequency. The wall flux density is estimated with the thin
 * cylindrical shell in a transverse field, B ≈ µ0·H·D/t (the flux the shell gathers over its cross-section flowing along the wall, an order-of-magnitude
 * rule; the shell's diameter D is the caller's), at the low end of each band, where the
 * conductor helps least. A warning is raised above {@value #WARNING_FRACTION} of the
 * saturation flux density.
 *
 * <p>Saturated high-µ material loses its permeability and its shielding: treat a
 * warning as a design problem, and verify by measurement. Stateless and thread-safe.
 *
 * <p>What is optimised: the model's own result. For a planar barrier that is an infinite
 * sheet, and for a shell a closed shell without seams; real plates lose field round their
 * edges and real enclosures through seams and holes, so a design found here is an upper
 * estimate until it is checked with a finite-geometry model (the axisymmetric module, an
 * enclosure with its openings) or by measurement.
 */
public final class TwoLayerAdvice {

    /** The fraction of the saturation flux density above which a warning is raised. */
    public static final double WARNING_FRACTION = io.shieldmath.shield.internal.Numerics.SATURATION_WARNING_FRACTION;

    private TwoLayerAdvice() {
    }

    /**
     * Starts the comparison of a conductive layer and a high-permeability layer:
     *
     * <pre>{@code
     * TwoLayerAdvice.Advice a = TwoLayerAdvice.of(Layer.of(copper, mm(0.5)), Layer.of(nickelIron, mm(0.5)))
     *         .facing(loop).meeting(need).saturatingAt(mT(750)).inShellOfDiameter(cm(5));
     * }</pre>
     *
     * @param conductor the conductive layer, not null
     * @param magnetic  the high-permeability layer, not null
     * @return the question, to be given the field, the requirement, the saturation and the shell size
     * @throws NullPointerException if a layer is null
     */
    public static Question of(Layer conductor, Layer magnetic) {
        return new Question(Require.nonNull("conductive layer", conductor),
                Require.nonNull("high-permeability layer", magnetic), null, null, null);
    }

    /**
     * Which order, asked a step at a time: {@link #facing(IncidentField)},
     * {@link #meeting(Requirement)}, {@link #saturatingAt(MagneticFluxDensity)}, then
     * {@link #inShellOfDiameter(Length)} answers. Immutable; each step returns a new question.
     */
    public static final class Question {
        private final Layer conductor;
        private final Layer magnetic;
        private final IncidentField field;
        private final Requirement requirement;
        private final MagneticFluxDensity saturation;

        private Question(Layer conductor, Layer magnetic, IncidentField field, Requirement requirement,
                         MagneticFluxDensity saturation) {
            this.conductor = conductor;
            this.magnetic = magnetic;
            this.field = field;
            this.requirement = requirement;
            this.saturation = saturation;
        }

        /**
         * The incident field.
         *
         * @param incident the field, not null
         * @return the question with this field
         * @throws NullPointerException if the field is null
         */
        public Question facing(IncidentField incident) {
            return new Question(conductor, magnetic, Require.nonNull("field", incident), requirement, saturation);
        }

        /**
         * The requirement both orders are measured against. Every entry must give the
         * incident flux density (the wall flux estimate needs it), so none may be a
         * required SE given directly.
         *
         * @param need the requirement, not null, not empty, no entry given as a required SE alone
         * @return the question with this requirement
         * @throws NullPointerException     if the requirement is null
         * @throws IllegalArgumentException if an entry gives only a required SE
         */
        public Question meeting(Requirement need) {
            return new Question(conductor, magnetic, field, withIncident(Require.nonNull("requirement", need)),
                    saturation);
        }

        /**
         * The high-permeability layer's saturation flux density.
         *
         * @param bs greater than 0, not null
         * @return the question with this saturation
         * @throws NullPointerException if the saturation is null
         */
        public Question saturatingAt(MagneticFluxDensity bs) {
            return new Question(conductor, magnetic, field, requirement, Require.nonNull("saturation", bs));
        }

        /**
         * Answers for layers that form an enclosure of this diameter (for the wall flux estimate).
         *
         * @param diameter the enclosure's diameter, not null
         * @return the advice
         * @throws IllegalStateException if the field, the requirement or the saturation has not been given
         */
        public Advice inShellOfDiameter(Length diameter) {
            if (field == null || requirement == null || saturation == null) {
                throw new IllegalStateException("the two-layer question needs "
                        + (field == null ? "facing(field)" : requirement == null ? "meeting(requirement)"
                        : "saturatingAt(flux density)") + " before inShellOfDiameter(diameter)");
            }
            return compare(conductor.medium(), conductor.thickness(), magnetic.medium(), magnetic.thickness(), field,
                    requirement, saturation, diameter);
        }
    }

    private static Requirement withIncident(Requirement need) {
        for (Requirement.Entry e : need.entries()) {
            if (e.isDirect()) {
                throw new IllegalArgumentException("the two-layer advice needs the incident flux density of every"
                        + " band for its wall flux estimate; the entry \"" + e + "\" gives only a required SE");
            }
        }
        return need;
    }

    /**
     * Compares the two orders.
     *
     * @param conductor          the conductive layer's medium, not null
     * @param conductorThickness its thickness
     * @param magnetic           the high-permeability layer's medium, not null
     * @param magneticThickness  its thickness
     * @param field              the incident field, not null
     * @param requirement        the requirement (bands, incident and tolerated fields), not empty
     * @param saturation         the high-µ layer's saturation flux density, greater than 0
     * @param shellDiameter      the diameter of the enclosure the layers form, for the flux estimate
     * @return the advice
     */
    static Advice compare(MediumSource conductor, Length conductorThickness, MediumSource magnetic,
                                 Length magneticThickness, IncidentField field, Requirement requirement,
                                 MagneticFluxDensity saturation, Length shellDiameter) {
        Require.nonNull("field", field);
        Require.nonNull("requirement", requirement);
        double bSat = Require.positive("saturation flux density", Require.nonNull("saturation", saturation).toTesla(),
                "T");
        double d = Require.nonNull("shell diameter", shellDiameter).toMetres();
        Layer c = Layer.of(conductor, conductorThickness);
        Layer m = Layer.of(magnetic, magneticThickness);
        Barrier conductorFirst = Barrier.of(c, m);
        Barrier magneticFirst = Barrier.of(m, c);
        var conductorAlone = Barrier.of(c).facing(field);
        double t = magneticThickness.toMetres();
        double peakBehind = 0;
        double peakFacing = 0;
        for (Requirement.Entry e : withIncident(requirement).entries()) {
            double b0 = e.incident().orElseThrow().toTesla();
            double fLow = e.band().low().toHertz();
            double sc = Math.pow(10, conductorAlone.shieldingEffectivenessDb(fLow) / 20);
            // B_wall ≈ µ0·H·D/t = B·D/t for the field B reaching the layer.
            peakFacing = Math.max(peakFacing, b0 * d / t);
            peakBehind = Math.max(peakBehind, b0 / Math.max(1, sc) * d / t);
        }
        Option a = new Option("conductor facing the source", conductorFirst,
                requirement.marginOf(conductorFirst.facing(field)), peakBehind, peakBehind / bSat);
        Option b = new Option("high-µ layer facing the source", magneticFirst,
                requirement.marginOf(magneticFirst.facing(field)), peakFacing, peakFacing / bSat);
        return new Advice(a, b);
    }

    /**
     * One order of the two layers.
     *
     * @param description        the order in words
     * @param barrier            the stack, source side first
     * @param margin             its margin against the requirement
     * @param wallFluxDensity    the estimated peak flux density in the high-µ layer, T
     * @param saturationFraction that flux density over the saturation flux density
     */
    public record Option(String description, Barrier barrier, MarginReport margin, double wallFluxDensity,
                         double saturationFraction) {

        /**
         * Whether the wall flux density is above {@value TwoLayerAdvice#WARNING_FRACTION} of saturation.
         *
         * @return true if the high-µ layer is near or at saturation
         */
        public boolean saturationWarning() {
            return saturationFraction > WARNING_FRACTION;
        }
    }

    /**
     * The two orders and the recommendation.
     *
     * @param conductorFirst the conductor facing the source
     * @param magneticFirst  the high-µ layer facing the source
     */
    public record Advice(Option conductorFirst, Option magneticFirst) {

        /**
         * The recommended order: the one that meets the requirement with more margin and,
         * at equal margin (the planar case), the one with the lower wall flux density.
         *
         * @return the better option
         */
        public Option recommended() {
            double ma = conductorFirst.margin().worstMarginDb();
            double mb = magneticFirst.margin().worstMarginDb();
            if (Math.abs(ma - mb) > 0.01) {
                return ma > mb ? conductorFirst : magneticFirst;
            }
            return conductorFirst.wallFluxDensity() <= magneticFirst.wallFluxDensity() ? conductorFirst
                    : magneticFirst;
        }

        /**
         * Why, in sentences with numbers.
         *
         * @return the reasoning
         */
        public String reasoning() {
            List<String> s = new ArrayList<>();
            double ma = conductorFirst.margin().worstMarginDb();
            double mb = magneticFirst.margin().worstMarginDb();
            if (Math.abs(ma - mb) <= 0.01) {
                s.add(String.format(Locale.ROOT, "Both orders give the same SE (worst margin %.1f dB at %s): a passive "
                        + "stack transmits the same both ways (reciprocity).", ma,
                        conductorFirst.margin().worst().frequency()));
            } else {
                s.add(String.format(Locale.ROOT, "Worst margin %.1f dB with the %s, %.1f dB with the %s.", ma,
                        conductorFirst.description(), mb, magneticFirst.description()));
            }
            s.add(String.format(Locale.ROOT, "Estimated peak flux density in the high-µ layer: %s with the %s "
                    + "(%.0f %% of saturation), %s with the %s (%.0f %%).",
                    MagneticFluxDensity.ofTesla(conductorFirst.wallFluxDensity()), conductorFirst.description(),
                    100 * conductorFirst.saturationFraction(),
                    MagneticFluxDensity.ofTesla(magneticFirst.wallFluxDensity()), magneticFirst.description(),
                    100 * magneticFirst.saturationFraction()));
            Option r = recommended();
            s.add("Recommended: " + r.description() + (r.saturationWarning()
                    ? "; warning: even so the high-µ layer is above half its saturation flux density, so thicken it "
                    + "or add a layer" : "") + ".");
            if (!r.margin().meets()) {
                s.add("Neither order meets the requirement.");
            }
            return String.join(" ", s);
        }
    }
}
