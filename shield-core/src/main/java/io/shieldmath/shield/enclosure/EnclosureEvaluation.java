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
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Length;
import java.util.Locale;
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

    /**
     * The largest hole radius over victim distance, r/d, for which Bethe's small-hole law
     * is used without a {@link ValidityNote.Limit#SMALL_HOLE} note (the law needs r ≪ d; at
     * r/d = 0.2 the dipole's neglected higher terms are of order (r/d)², a few per cent
     * of the field: common practice, no source).
     */
    static final double SMALL_HOLE_LIMIT = 0.2;
    /** From this static µ' of a wall on, holes in a uniform field get a high-permeability note. */
    static final double HIGH_PERMEABILITY = 10;

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
                    frequency.toHertz(), false, wall.validityNotes());
        }
        IncidentField field = wave.get();
        PlanarResult wall = enclosure.shell().toBarrier().facing(field).at(frequency);
        return combine(enclosure, frequency, wall.shieldingEffectivenessDb(), "planar wall facing " + field,
                frequency.toHertz(), true, wall.validityNotes());
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
        return combine(e, frequency, wallDb, wallModel, hz, wave, List.of());
    }

    /** As above, with the wall model's validity notes, to which the openings' notes are added. */
    static EnclosureResult combine(Enclosure e, Frequency frequency, double wallDb, String wallModel, double hz,
                                   boolean wave, List<ValidityNote> wallNotes) {
        List<ValidityNote> notes = new ArrayList<>(wallNotes);
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
                double inner = s.shape().innerRadius().toMetres();
                db[i + 1] = o.magneticDb(hz, s.geometry(), inner);
                models[i + 1] = "Bethe magnetic polarizability" + (o.tubeDepth().isPresent() ? ", tube below cut-off" : "");
                openingNotes(o, inner, s, hz, notes);
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
        return new EnclosureResult(frequency, e.pathSum(), total, paths, List.copyOf(notes));
    }

    /** The notes of one opening in a uniform magnetic field: a hole not small against d, a high-µ wall. */
    private static void openingNotes(Opening o, double inner, Shell s, double hz, List<ValidityNote> notes) {
        double r = o.largestDimension().toMetres() / 2;
        double d = o.victimDistance().map(l -> l.toMetres()).orElse(inner);
        if (r > SMALL_HOLE_LIMIT * d) {
            notes.add(ValidityNote.of(ValidityNote.Limit.SMALL_HOLE, String.format(Locale.ROOT,
                    "%s: Bethe's small-hole law needs the hole radius (%s) much smaller than the distance to the "
                            + "victim (%s), r/d = %.3g here (above %s): the dipole estimate of this path is rough",
                    o.name(), Length.ofMetres(r), Length.ofMetres(d), r / d, SMALL_HOLE_LIMIT)));
        }
        for (Wall w : s.walls()) {
            if (w.medium().permeability().real(hz) >= HIGH_PERMEABILITY) {
                notes.add(ValidityNote.of(ValidityNote.Limit.HIGH_PERMEABILITY_OPENING, o.name() + ": the wall is "
                        + "of high permeability; a hole in it is driven by the normal field, not the tangential "
                        + "field of the eddy-current law used, and a tube beyond it attenuates as exp(−2.405·z/a), "
                        + "not exp(−1.841·z/a); treat this path as an order-of-magnitude estimate (see Opening)"));
                return;
            }
        }
    }

    @Override
    public String toString() {
        return enclosure + wave.map(f -> " facing " + f).orElse(" in a uniform magnetic field");
    }
}
