/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;

import io.shieldmath.shield.design.Requirement;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.model.Sweep;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.materials.internal.Spelling;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A planar shielding design a user keeps in a file: the layer stack (catalogue
 * materials by identifier, inline media, air gaps), the incident field, and the band and
 * number of points to sweep.
 *
 * <pre>{@code
 * Catalogue cat = Catalogue.builtIn();
 * Design d = Design.of(List.of(DesignLayer.of(cat.get("copper-annealed"), mm(0.3)),
 *                              DesignLayer.gap(mm(2)),
 *                              DesignLayer.of(cat.get("nickel-iron-80"), mm(0.5))),
 *         IncidentField.magneticNearField(cm(6), ImpedanceForm.EXACT_DIPOLE),
 *         FrequencyBand.parse("10 Hz to 100 kHz"), 41);
 * DesignFile.write(d, Path.of("study.json"));
 * Sweep<PlanarResult> s = DesignFile.read(Path.of("study.json"), cat).sweep();
 * }</pre>
 *
 * <p>The file format is described in {@link DesignFile}. Results are estimates for an
 * infinite flat sheet; real shields are limited by seams, openings and edges and must be
 * verified by measurement.
 *
 * <p>Immutable and thread-safe; equality is by value, the texts a design read from a file
 * gave its quantities in included (so equal designs write equal documents).
 * {@link #withTitle(String)} returns a copy.
 */
public final class Design {

    /** The largest number of sweep points. */
    public static final int MAX_POINTS = 10_000;

    private final String title;
    private final List<DesignLayer> layers;
    private final IncidentField field;
    private final FrequencyBand band;
    private final int points;
    private final Barrier barrier;
    private final DesignShell shell;
    private final Requirement requirement;
    private final Spelling spelling;

    private Design(String title, List<DesignLayer> layers, IncidentField field, FrequencyBand band, int points) {
        this(title, layers, field, band, points, null, Requirement.none(), Spelling.DEFAULT);
    }

    private Design(String title, List<DesignLayer> layers, IncidentField field, FrequencyBand band, int points,
                   DesignShell shell, Requirement requirement, Spelling spelling) {
        this.spelling = spelling;
        this.shell = shell;
        this.requirement = requirement;
        this.title = title;
        this.layers = layers;
        this.field = field;
        this.band = band;
        this.points = points;
        List<Layer> core = new ArrayList<>(layers.size());
        for (DesignLayer l : layers) {
            core.add(l.toLayer());
        }
        this.barrier = Barrier.of(core);
    }

    /**
     * Obtains a design without a title.
     *
     * @param layers the stack, source side first, 1 to {@value Barrier#MAX_LAYERS} layers, none null
     * @param field  the incident field, not null
     * @param band   the band to sweep, not null, within 1 µHz to 10 THz
     * @param points the number of log-spaced sweep points, 1 to {@value #MAX_POINTS}
     * @return the design
     * @throws IllegalArgumentException if the stack is empty or too long, or points is out of range
     * @throws InvalidQuantityException if the band is out of range
     */
    public static Design of(List<DesignLayer> layers, IncidentField field, FrequencyBand band, int points) {
        Require.nonNull("layers", layers);
        Require.nonNull("field", field);
        Require.nonNull("band", band);
        Require.inRange("band lower frequency", band.low().toHertz(), PlanarEvaluation.MIN_HERTZ,
                PlanarEvaluation.MAX_HERTZ, "Hz");
        Require.inRange("band upper frequency", band.high().toHertz(), PlanarEvaluation.MIN_HERTZ,
                PlanarEvaluation.MAX_HERTZ, "Hz");
        if (points < 1 || points > MAX_POINTS) {
            throw new IllegalArgumentException("number of sweep points must be 1 to " + MAX_POINTS + "; got " + points);
        }
        return new Design("", List.copyOf(layers), field, band, points);
    }

    /**
     * A copy with a title.
     *
     * @param newTitle the title, at most 200 characters without control characters; empty for none
     * @return the new design; this one is unchanged
     * @throws IllegalArgumentException if the title is longer than 200 characters or holds control characters
     */
    public Design withTitle(String newTitle) {
        Require.nonNull("title", newTitle);
        String t = newTitle.isBlank() ? "" : Require.text("design title", newTitle, 200);
        return t.equals(title) ? this : new Design(t, layers, field, band, points, shell, requirement, spelling);
    }

    /**
     * Obtains a design of a closed shell with its openings (the layers are the shell's walls,
     * innermost first).
     *
     * @param shell  the shell, not null
     * @param field  the incident field the shell faces when it is not in a uniform field, not null
     * @param band   the band to sweep, not null, within 1 µHz to 10 THz
     * @param points the number of log-spaced sweep points, 1 to {@value #MAX_POINTS}
     * @return the design
     * @throws IllegalArgumentException if points is out of range
     */
    public static Design of(DesignShell shell, IncidentField field, FrequencyBand band, int points) {
        Require.nonNull("shell", shell);
        Design planar = of(shell.walls(), field, band, points);
        return new Design("", planar.layers, field, band, points, shell, Requirement.none(), Spelling.DEFAULT);
    }

    /**
     * A copy with the source cases the design must meet.
     *
     * @param newRequirement the bands with incident and tolerated flux densities or required SEs, not null
     * @return the new design; this one is unchanged
     */
    public Design meeting(Requirement newRequirement) {
        Require.nonNull("requirement", newRequirement);
        return new Design(title, layers, field, band, points, shell, newRequirement, spelling);
    }

    /** A copy that writes its quantities in the texts they were read in (for {@link DesignFile}). */
    Design spelledAs(Spelling newSpelling) {
        return newSpelling.equals(spelling) ? this
                : new Design(title, layers, field, band, points, shell, requirement, newSpelling);
    }

    /** The texts the quantities were read in, where they differ from the default form. */
    Spelling spelling() {
        return spelling;
    }

    /**
     * The closed shell, for a shell design.
     *
     * @return the shell, or empty for a planar stack
     */
    public java.util.Optional<DesignShell> shell() {
        return java.util.Optional.ofNullable(shell);
    }

    /**
     * The source cases the design must meet.
     *
     * @return the requirement, {@link Requirement#none()} if the file gives none
     */
    public Requirement requirement() {
        return requirement;
    }

    /**
     * The model this design is evaluated with: the shell with its openings (in a uniform field
     * or facing the incident field) for a shell design, else the planar stack facing the
     * incident field.
     *
     * @return the model
     */
    public ShieldingModel<?> model() {
        if (shell == null) {
            return barrier.facing(field);
        }
        return shell.uniformField() ? shell.toEnclosure().inUniformField() : shell.toEnclosure().facing(field);
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
     * The layers as written, source side first.
     *
     * @return an unmodifiable list
     */
    public List<DesignLayer> layers() {
        return layers;
    }

    /**
     * The barrier for the planar engine.
     *
     * @return the barrier
     */
    public Barrier barrier() {
        return barrier;
    }

    /**
     * The incident field.
     *
     * @return the field
     */
    public IncidentField field() {
        return field;
    }

    /**
     * The band to sweep.
     *
     * @return the band
     */
    public FrequencyBand band() {
        return band;
    }

    /**
     * The number of log-spaced sweep points.
     *
     * @return 1 to {@value #MAX_POINTS}
     */
    public int points() {
        return points;
    }

    /**
     * Sweeps the planar stack: {@code barrier().facing(field()).sweep(band(), points())}. For a
     * shell design use {@link #model()}.
     *
     * @return the sweep, with every frequency's shielding effectiveness and its parts
     */
    public Sweep<PlanarResult> sweep() {
        return barrier.facing(field).sweep(band, points);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Design d && d.title.equals(title) && d.layers.equals(layers) && d.field.equals(field)
                && d.band.equals(band) && d.points == points && Objects.equals(d.shell, shell)
                && d.requirement.equals(requirement) && d.spelling.equals(spelling);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, layers, field, band, points, shell, requirement, spelling);
    }

    @Override
    public String toString() {
        return (title.isEmpty() ? "design" : title) + ": " + layers + " facing " + field + ", " + band + ", " + points
                + " points"
                + (shell == null ? "" : ", shell " + shell) + (requirement.entries().isEmpty() ? "" : ", " + requirement);
    }
}
