/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.materials.files.Design;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.quantity.FrequencyBand;
import java.util.Optional;

/**
 * Any design one design file holds: a planar stack or a closed shell with its openings (a
 * {@link Design}), or an axisymmetric arrangement ({@link AxisymmetricDesign}), each with the
 * band to evaluate and its source cases. {@link WholeDesignFile} reads and writes every kind.
 *
 * <pre>{@code
 * WholeDesign d = WholeDesignFile.read(Path.of("can.json"), Catalogue.builtIn());
 * ShieldingModel<?> m = d.model();                          // whatever the kind
 * double se = m.at(kHz(20)).shieldingEffectivenessDb();
 * }</pre>
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class WholeDesign {

    /** The kinds of design. */
    public enum Kind {
        /** An infinite planar stack facing an incident field. */
        PLANAR,
        /** A closed shell or enclosure with its openings. */
        SHELL,
        /** Finite bodies of revolution between coils or in a uniform applied field (axial, transverse or the worse of both). */
        AXISYMMETRIC
    }

    private final Design design;
    private final AxisymmetricDesign axisymmetric;

    private WholeDesign(Design design, AxisymmetricDesign axisymmetric) {
        this.design = design;
        this.axisymmetric = axisymmetric;
    }

    /**
     * A planar or shell design.
     *
     * @param design the design, not null
     * @return the whole design
     */
    public static WholeDesign of(Design design) {
        return new WholeDesign(Require.nonNull("design", design), null);
    }

    /**
     * An axisymmetric design.
     *
     * @param design the design, not null
     * @return the whole design
     */
    public static WholeDesign of(AxisymmetricDesign design) {
        return new WholeDesign(null, Require.nonNull("design", design));
    }

    /**
     * The kind.
     *
     * @return the kind
     */
    public Kind kind() {
        if (axisymmetric != null) {
            return Kind.AXISYMMETRIC;
        }
        return design.shell().isPresent() ? Kind.SHELL : Kind.PLANAR;
    }

    /**
     * The planar or shell design.
     *
     * @return the design, or empty for an axisymmetric one
     */
    public Optional<Design> design() {
        return Optional.ofNullable(design);
    }

    /**
     * The axisymmetric design.
     *
     * @return the design, or empty for a planar or shell one
     */
    public Optional<AxisymmetricDesign> axisymmetric() {
        return Optional.ofNullable(axisymmetric);
    }

    /**
     * The evaluation through the common contract: {@link Design#model()} or
     * {@link AxisymmetricDesign#model()}.
     *
     * @return the model
     */
    public ShieldingModel<?> model() {
        return design != null ? design.model() : axisymmetric.model();
    }

    /**
     * The title.
     *
     * @return the title, empty if none
     */
    public String title() {
        return design != null ? design.title() : axisymmetric.title();
    }

    /**
     * The band to evaluate.
     *
     * @return the band
     */
    public FrequencyBand band() {
        return design != null ? design.band() : axisymmetric.band();
    }

    /**
     * The number of log-spaced points to evaluate.
     *
     * @return at least 1
     */
    public int points() {
        return design != null ? design.points() : axisymmetric.points();
    }

    /**
     * The source cases the design must meet.
     *
     * @return the requirement, {@link Requirement#none()} if none is given
     */
    public Requirement requirement() {
        return design != null ? design.requirement() : axisymmetric.requirement();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WholeDesign w && java.util.Objects.equals(w.design, design)
                && java.util.Objects.equals(w.axisymmetric, axisymmetric);
    }

    @Override
    public int hashCode() {
        return java.util.Objects.hash(design, axisymmetric);
    }

    @Override
    public String toString() {
        return design != null ? design.toString() : axisymmetric.toString();
    }
}
