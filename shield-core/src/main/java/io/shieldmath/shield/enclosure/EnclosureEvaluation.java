/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.internal.Require;
import java.util.ArrayList;
import java.util.List;

/**
 * An enclosure in a field, ready to evaluate at frequencies: facing an incident wave
 * ({@link Enclosure#facing(IncidentField)}) or in a uniform magnetic field
 * ({@link Enclosure#inUniformField()}).
 *
 * <p>Immutable and thread-safe.
 */
public final class EnclosureEvaluation {

    private final Enclosure enclosure;
    private final IncidentField field;

    EnclosureEvaluation(Enclosure enclosure, IncidentField field) {
        this.enclosure = enclosure;
        this.field = field;
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
    public EnclosureResult at(Frequency frequency) {
        Require.nonNull("frequency", frequency);
        if (field == null) {
            ShellResult wall = enclosure.shell().at(frequency);
            return combine(enclosure, frequency, wall.totalDb(), "shell in a uniform field", frequency.toHertz(), false);
        }
        double wallDb = enclosure.shell().toBarrier().facing(field).at(frequency).totalDb();
        return combine(enclosure, frequency, wallDb, "planar wall facing " + field, frequency.toHertz(), true);
    }

    /**
     * The results at log-spaced frequencies across a band, both ends included.
     *
     * @param band   the band, not null
     * @param points the number of points, 1 or more
     * @return the results in increasing frequency, unmodifiable
     */
    public List<EnclosureResult> sweep(FrequencyBand band, int points) {
        double[] hz = Require.nonNull("band", band).logSpacedHertz(points);
        List<EnclosureResult> out = new ArrayList<>(hz.length);
        for (double f : hz) {
            out.add(at(Frequency.ofHertz(f)));
        }
        return List.copyOf(out);
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
            max = Math.max(max, -p * d / StaticShielding.DB_PER_NEPER);
        }
        double sum = 0;
        for (double d : db) {
            sum += Math.exp(-p * d / StaticShielding.DB_PER_NEPER - max);
        }
        double logTau = (max + Math.log(sum)) / p;
        double total = Math.max(0, -StaticShielding.DB_PER_NEPER * logTau);
        List<LeakagePath> paths = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            double share = Math.exp(-p * db[i] / StaticShielding.DB_PER_NEPER - max) / sum;
            paths.add(new LeakagePath(names[i], i == 0, db[i], share, models[i]));
        }
        return new EnclosureResult(frequency, e.pathSum(), total, paths);
    }

    @Override
    public String toString() {
        return enclosure + (field == null ? " in a uniform magnetic field" : " facing " + field);
    }
}
