/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import io.shieldmath.shield.axisymmetric.AxialFieldSolution;
import io.shieldmath.shield.axisymmetric.CouplingSolution;
import io.shieldmath.shield.axisymmetric.MeshTooLargeException;
import io.shieldmath.shield.axisymmetric.ToleranceNotReachedException;
import io.shieldmath.shield.axisymmetric.files.AxisymmetricDesign;
import io.shieldmath.shield.axisymmetric.files.WholeDesign;
import io.shieldmath.shield.materials.files.Design;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;

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
 *       the coils or the worst shielding over the sensor region, and the change between the
 *       last two meshes ({@link AxisymmetricDesign#model()}), each frequency solved on its own,
 *       exactly as {@code design.model().at(frequency)} solves it.</li>
 * </ul>
 *
 * <p>Immutable; each evaluation is independent.
 */
final class DesignEvaluation {

    private static final String[] PLANAR = {"se_db", "absorption_db", "reflection_db", "multiple_reflection_db"};
    private static final String[] SHELL = {"se_db"};
    private static final String[] SOLVER = {"se_db", "discretisation_estimate_db"};

    private final String kind;
    private final String field;
    private final String[] columns;
    private final double lowHz;
    private final double highHz;
    private final PlanarEvaluation planar;
    private final ShieldingModel<?> model;

    private DesignEvaluation(String kind, String field, String[] columns, double lowHz, double highHz,
                             PlanarEvaluation planar, ShieldingModel<?> model) {
        this.kind = kind;
        this.field = field;
        this.columns = columns;
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
                String f = d.coils().map(p -> "between " + p)
                        .orElseGet(() -> "uniform axial field, " + d.sensor().orElseThrow());
                FrequencyBand valid = m.validBand();
                return new DesignEvaluation("axisymmetric", f, SOLVER, valid.low().toHertz(), valid.high().toHertz(),
                        null, m);
            }
        }
    }

    /** The kind in words: planar, shell or axisymmetric. */
    String kind() {
        return kind;
    }

    /** The field or source the design faces, in words. */
    String field() {
        return field;
    }

    /** The column names after frequency_hz. */
    String[] columns() {
        return columns.clone();
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
     * The values at one frequency, in the order of {@link #columns()}.
     *
     * @throws CommandFailure (bad input) if the design cannot be evaluated there
     */
    double[] at(double hz) throws CommandFailure {
        try {
            if (planar != null) {
                PlanarResult r = planar.at(Frequency.ofHertz(hz));
                return new double[] {r.shieldingEffectivenessDb(), r.absorptionDb(), r.reflectionDb(),
                        r.multipleReflectionDb()};
            }
            ShieldingResult r = model.at(Frequency.ofHertz(hz));
            if (r instanceof CouplingSolution c) {
                return new double[] {c.insertionLossDb(), c.insertionLossEstimateDb()};
            }
            if (r instanceof AxialFieldSolution a) {
                return new double[] {a.shieldingEffectivenessDb(), a.worstShieldingDb().estimate()};
            }
            return new double[] {r.shieldingEffectivenessDb()};
        } catch (ArithmeticException | IllegalArgumentException | MeshTooLargeException
                 | ToleranceNotReachedException e) {
            throw CommandFailure.badInput("cannot evaluate the design at " + ResultOutput.shortest(hz) + " Hz: "
                    + e.getMessage(), e);
        }
    }
}
