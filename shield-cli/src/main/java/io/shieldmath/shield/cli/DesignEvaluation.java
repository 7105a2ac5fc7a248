/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import io.shieldmath.shield.axisymmetric.AxialFieldSolution;
import io.shieldmath.shield.axisymmetric.CouplingSolution;
import io.shieldmath.shield.axisymmetric.FieldDirection;
import io.shieldmath.shield.axisymmetric.MeshTooLargeException;
import io.shieldmath.shield.axisymmetric.ToleranceNotReachedException;
import io.shieldmath.shield.axisymmetric.TransverseFieldSolution;
import io.shieldmath.shield.axisymmetric.WorstDirectionSolution;
import io.shieldmath.shield.axisymmetric.files.AxisymmetricDesign;
import io.shieldmath.shield.axisymmetric.files.DesignFieldDirection;
import io.shieldmath.shield.axisymmetric.files.WholeDesign;
import io.shieldmath.shield.axisymmetric.internal.MeshProgress;
import io.shieldmath.shield.materials.files.Design;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import java.util.List;

/**
 * How the command evaluates one design of any kind at one frequency, and what it writes: the
 * columns after {@code frequency_hz}, each named with its unit, and the frequencies the
 * design accepts.
 *
 * <ul>
 *   <li>planar stack: {@code se_db, absorption_db, reflection_db, multiple_reflection_db}
 *       ({@link PlanarEvaluation});</li>
 *   <li>closed shell: {@code se_db} ({@link Design#model()});</li>
 *   <li>axisymmetric: {@code se_db, discretisation_estimate_db}: the insertion loss between
 *       the coils or the worst shielding over the sensor region in an axial or a transverse
 *       field, and the change between the last two meshes ({@link AxisymmetricDesign#model()}),
 *       each frequency solved on its own, exactly as {@code design.model().at(frequency)} solves
 *       it;</li>
 *   <li>axisymmetric in a field of either direction ({@link DesignFieldDirection#WORST}):
 *       {@code se_db, discretisation_estimate_db, axial_se_db, transverse_se_db,
 *       worse_direction}: the smaller of the two, the estimate of that one, both directions'
 *       values, and the word {@code axial} or {@code transverse} for the direction that gave
 *       {@code se_db} (axial on a tie).</li>
 * </ul>
 *
 * <p>Each row also carries its result's validity notes, which the command summarises on standard
 * error and writes into JSON results (never into CSV rows).
 *
 * <p>Immutable; each evaluation is independent.
 */
final class DesignEvaluation {

    private static final String[] PLANAR = {"se_db", "absorption_db", "reflection_db", "multiple_reflection_db"};
    private static final String[] SHELL = {"se_db"};
    private static final String[] SOLVER = {"se_db", "discretisation_estimate_db"};
    private static final String[] EITHER = {"se_db", "discretisation_estimate_db", "axial_se_db", "transverse_se_db"};
    /** The one text column, after the numbers, of a design in a field of either direction. */
    static final String WORSE_DIRECTION = "worse_direction";

    private final String kind;
    private final String field;
    private final String[] columns;
    private final boolean either;
    private final double lowHz;
    private final double highHz;
    private final PlanarEvaluation planar;
    private final ShieldingModel<?> model;

    private DesignEvaluation(String kind, String field, String[] columns, double lowHz, double highHz,
                             PlanarEvaluation planar, ShieldingModel<?> model) {
        this.kind = kind;
        this.field = field;
        this.columns = columns;
        this.either = columns == EITHER;
        this.lowHz = lowHz;
        this.highHz = highHz;
        this.planar = planar;
        this.model = model;
    }

    /** The evaluation of a design; a design the models refuse is an IllegalArgumentException. */
    static DesignEvaluation of(WholeDesign design) {
        switch (design.kind()) {
            case PLANAR: {
                Design d = design.design().orElseThrow();
                return new DesignEvaluation("planar", d.field().toString(), PLANAR, PlanarEvaluation.MIN_HERTZ,
                        PlanarEvaluation.MAX_HERTZ, d.barrier().facing(d.field()), null);
            }
            case SHELL: {
                Design d = design.design().orElseThrow();
                ShieldingModel<?> m = d.model();
                String f = d.shell().orElseThrow().uniformField() ? "uniform magnetic field" : d.field().toString();
                return new DesignEvaluation("shell", f, SHELL, m.validBand().low().toHertz(),
                        m.validBand().high().toHertz(), null, m);
            }
            default: {
                AxisymmetricDesign d = design.axisymmetric().orElseThrow();
                ShieldingModel<?> m = d.model();
                DesignFieldDirection direction = d.fieldDirection().orElse(null);
                String f = d.coils().map(p -> "between " + p)
                        .orElseGet(() -> fieldWords(direction) + ", " + d.sensor().orElseThrow());
                FrequencyBand valid = m.validBand();
                return new DesignEvaluation("axisymmetric", f, direction == DesignFieldDirection.WORST ? EITHER : SOLVER,
                        valid.low().toHertz(), valid.high().toHertz(), null, m);
            }
        }
    }

    /** The applied field in words, for the JSON header. */
    private static String fieldWords(DesignFieldDirection direction) {
        return switch (direction) {
            case AXIAL -> "uniform axial field";
            case TRANSVERSE -> "uniform transverse field";
            case WORST -> "uniform field, the worse of axial and transverse";
        };
    }

    /** The kind in words: planar, shell or axisymmetric. */
    String kind() {
        return kind;
    }

    /** The field or source the design faces, in words. */
    String field() {
        return field;
    }

    /** The column names after frequency_hz: the numbers', then {@link #textColumns()}. */
    String[] columns() {
        String[] all = java.util.Arrays.copyOf(columns, columns.length + textColumns().length);
        System.arraycopy(textColumns(), 0, all, columns.length, textColumns().length);
        return all;
    }

    /** The names of the text columns after the numbers: {@value #WORSE_DIRECTION} or none. */
    String[] textColumns() {
        return either ? new String[] {WORSE_DIRECTION} : new String[0];
    }

    /** The lowest frequency the design accepts, Hz. */
    double lowHz() {
        return lowHz;
    }

    /** The highest frequency the design accepts, Hz. */
    double highHz() {
        return highHz;
    }

    /**
     * The values at one frequency, in the order of {@link #columns()}: the numbers, then the
     * texts (for a design in a field of either direction, the direction that gave the smaller
     * shielding, {@code axial} or {@code transverse}).
     *
     * @throws CommandFailure (bad input) if the design cannot be evaluated there
     */
    Row row(double hz) throws CommandFailure {
        return row(hz, (fineness, unknowns) -> { });
    }

    /**
     * {@link #row(double)}, telling {@code meshes} of each mesh the finite-element solver builds
     * for it (the stages of its refinement), on this thread, before each is solved.
     *
     * @throws CommandFailure (bad input) if the design cannot be evaluated there
     */
    Row row(double hz, MeshProgress.Listener meshes) throws CommandFailure {
        try {
            return model == null ? compute(hz) : MeshProgress.during(meshes, () -> compute(hz));
        } catch (ArithmeticException | IllegalArgumentException | MeshTooLargeException
                 | ToleranceNotReachedException e) {
            throw CommandFailure.badInput("cannot evaluate the design at " + ResultOutput.shortest(hz) + " Hz: "
                    + e.getMessage(), e);
        }
    }

    /**
     * The values of one frequency: the numbers, then the texts, and the result's validity notes.
     *
     * @param values the numbers, in the order of the numeric columns
     * @param texts  the texts, in the order of {@link #textColumns()}
     * @param notes  the result's {@link ShieldingResult#validityNotes()}, often empty
     */
    record Row(double[] values, String[] texts, List<ValidityNote> notes) {
    }

    /**
     * The numbers at one frequency, in the order of the numeric columns.
     *
     * @throws CommandFailure (bad input) if the design cannot be evaluated there
     */
    double[] at(double hz) throws CommandFailure {
        return row(hz).values();
    }

    private Row compute(double hz) {
        if (planar != null) {
            PlanarResult r = planar.at(Frequency.ofHertz(hz));
            return numbers(r, r.shieldingEffectivenessDb(), r.absorptionDb(), r.reflectionDb(),
                    r.multipleReflectionDb());
        }
        ShieldingResult r = model.at(Frequency.ofHertz(hz));
        if (r instanceof CouplingSolution c) {
            return numbers(r, c.insertionLossDb(), c.insertionLossEstimateDb());
        }
        if (r instanceof AxialFieldSolution a) {
            return numbers(r, a.shieldingEffectivenessDb(), a.worstShieldingDb().estimate());
        }
        if (r instanceof TransverseFieldSolution t) {
            return numbers(r, t.shieldingEffectivenessDb(), t.worstShieldingDb().estimate());
        }
        if (r instanceof WorstDirectionSolution w) {
            AxialFieldSolution a = w.axial();
            TransverseFieldSolution t = w.transverse();
            boolean axial = w.worstDirection() == FieldDirection.AXIAL;
            double estimate = axial ? a.worstShieldingDb().estimate() : t.worstShieldingDb().estimate();
            return new Row(new double[] {w.shieldingEffectivenessDb(), estimate, a.shieldingEffectivenessDb(),
                t.shieldingEffectivenessDb()}, new String[] {axial ? "axial" : "transverse"}, w.validityNotes());
        }
        return numbers(r, r.shieldingEffectivenessDb());
    }

    private static Row numbers(ShieldingResult r, double... values) {
        return new Row(values, new String[0], r.validityNotes());
    }
}
