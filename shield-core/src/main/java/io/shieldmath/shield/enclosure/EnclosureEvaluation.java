/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.planar.PlanarEvaluation;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * An enclosure in a field, ready to evaluate at frequencies: facing an incident wave
 * ({@link Enclosure#facing(IncidentField)}) or in a uniform magnetic field
 * ({@link Enclosure#inUniformField()}).
 *
 * <p>Immutable and thread-safe.
 */
public final class EnclosureEvaluation implements ShieldingModel<EnclosureResult> {

    private static final FrequencyBand UNIFORM_FIELD_BAND =
            FrequencyBand.of(Frequency.ofHertz(Shell.MIN_HERTZ), Frequency.ofHertz(Shell.MAX_HERTZ));
    private static final FrequencyBand WAVE_BAND =
            FrequencyBand.of(Frequency.ofHertz(PlanarEvaluation.MIN_HERTZ), Frequency.ofHertz(PlanarEvaluation.MAX_HERTZ));

    private final Enclosure enclosure;
    /** The incident wave, or empty in a uniform magnetic field. */
    private final Optional<IncidentField> wave;

    private EnclosureEvaluation(Enclosure enclosure, Optional<IncidentField> wave) {
        this.enclosure = enclosure;
        this.wave = wave;
    }

    static EnclosureEvaluation facing(Enclosure enclosure, IncidentField field) {
        return new EnclosureEvaluation(enclosure, Optional.of(field));
    }

    static EnclosureEvaluation inUniformField(Enclosure enclosure) {
        return new EnclosureEvaluation(enclosure, Optional.empty());
    }

    /**
     * The incident wave this enclosure faces, or empty in a uniform magnetic field.
     *
     * @return the field, if any
     */
    public Optional<IncidentField> incidentField() {
        return wave;
    }

    /**
     * The frequencies this model evaluates: 1 µHz to 100 GHz in a uniform field (the
     * shell model), 1 µHz to 10 THz facing a wave (the planar wall).
     *
     * @return the valid band
     */
    @Override
    public FrequencyBand validBand() {
        return wave.isPresent() ? WAVE_BAND : UNIFORM_FIELD_BAND;
    }

    /**
     * The enclosure.
     *
     * @return the enclosure
     */
    public Enclosure enclosure() {
        return enclosure;
    }

    /**
     * The result at one frequency.
     *
     * @param frequency the frequency: 1 µHz to 100 GHz in a uniform field, 1 µHz to 10 THz facing a wave
     * @return the result
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     */
    @Override
    public EnclosureResult at(Frequency frequency) {
        Require.nonNull("frequency", frequency);
        if (wave.isEmpty()) {
            ShellResult wall = enclosure.shell().at(frequency);
            return combine(enclosure, frequency, wall.shieldingEffectivenessDb(), "shell in a uniform field",
                    frequency.toHertz(), false);
        }
        IncidentField field = wave.get();
        double wallDb = enclosure.shell().toBarrier().facing(field).at(frequency).shieldingEffectivenessDb();
        return combine(enclosure, frequency, wallDb, "planar wall facing " + field, frequency.toHertz(), true);
    }

    /**
     * The shielding effectiveness of the enclosure, all paths summed, at one frequency. This
     * model builds its leakage paths per call (it is not on primitives like the planar one).
     *
     * @param hertz the frequency in Hz, within {@link #validBand()}
     * @return SE in dB, 0 or more
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        FrequencyBand b = validBand();
        Require.inRange("frequency", hertz, b.low().toHertz(), b.high().toHertz(), "Hz");
        return at(Frequency.ofHertz(hertz)).shieldingEffectivenessDb();
    }

    /**
     * Combines the wall and the openings (log domain, so nothing underflows).
     *
     * @param frequency null for a static field
     * @param wave      true for an incident wave (aperture rules), false for a uniform magnetic field (Bethe)
     */
    static EnclosureResult combine(Enclosure e, Frequency frequency, double wallDb, String wallModel, double hz,
                                   boolean wave) {
        List<Opening> ops = e.openings();
        int n = ops.size() + 1;
        double[] db = new double[n];
        String[] names = new String[n];
        String[] models = new String[n];
        db[0] = wallDb;
        names[0] = "wall";
        models[0] = wallModel;
        Shell s = e.shell();
        for (int i = 0; i < ops.size(); i++) {
            Opening o = ops.get(i);
            if (wave) {
                db[i + 1] = o.farFieldDb(hz);
                models[i + 1] = "aperture rule λ/(2L)" + (o.count() > 1 ? ", sqrt(n)" : "")
                        + (o.tubeDepth().isPresent() ? ", tube below cut-off" : "");
            } else {
                db[i + 1] = o.magneticDb(hz, s.geometry(), s.shape().innerRadius().toMetres());
                models[i + 1] = "Bethe magnetic polarizability" + (o.tubeDepth().isPresent() ? ", tube below cut-off" : "");
            }
            names[i + 1] = o.name();
        }
        // ln τ_i = −SE_i·ln10/20; power p = 1 (magnitudes) or 2 (root-sum-square).
        double p = e.pathSum() == PathSum.MAGNITUDES ? 1 : 2;
        double max = Double.NEGATIVE_INFINITY;
        for (double d : db) {
            max = Math.max(max, -p * d / Numerics.DB_PER_NEPER);
        }
        double sum = 0;
        for (double d : db) {
            sum += Math.exp(-p * d / Numerics.DB_PER_NEPER - max);
        }
        double logTau = (max + Math.log(sum)) / p;
        double total = Math.max(0, -Numerics.DB_PER_NEPER * logTau);
        List<LeakagePath> paths = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            double share = Math.exp(-p * db[i] / Numerics.DB_PER_NEPER - max) / sum;
            paths.add(new LeakagePath(names[i], i == 0, db[i], share, models[i]));
        }
        return new EnclosureResult(frequency, e.pathSum(), total, paths);
    }

    @Override
    public String toString() {
        return enclosure + wave.map(f -> " facing " + f).orElse(" in a uniform magnetic field");
    }
}
