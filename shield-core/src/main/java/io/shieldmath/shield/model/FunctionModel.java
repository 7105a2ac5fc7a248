/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.model;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

/** A model given by a function of frequency ({@link ShieldingModel#ofFunction}). */
final class FunctionModel implements ShieldingModel<ShieldingResult> {

    private final String name;
    private final FrequencyBand band;
    private final DoubleUnaryOperator seDb;

    FunctionModel(String name, FrequencyBand band, DoubleUnaryOperator seDb) {
        this.name = name;
        this.band = band;
        this.seDb = seDb;
    }

    @Override
    public FrequencyBand validBand() {
        return band;
    }

    @Override
    public ShieldingResult at(Frequency frequency) {
        double db = shieldingEffectivenessDb(Require.nonNull("frequency", frequency).toHertz());
        return new Point(db);
    }

    @Override
    public double shieldingEffectivenessDb(double hertz) {
        Require.inRange("frequency", hertz, band.low().toHertz(), band.high().toHertz(), "Hz");
        double db = seDb.applyAsDouble(hertz);
        if (!Double.isFinite(db)) {
            throw new ArithmeticException("the model \"" + name + "\" gave " + db + " dB at " + Frequency.ofHertz(hertz));
        }
        return db;
    }

    @Override
    public String toString() {
        return name;
    }

    /** A result that carries only the shielding effectiveness. */
    private static final class Point implements ShieldingResult {
        private final double db;

        Point(double db) {
            this.db = db;
        }

        @Override
        public double shieldingEffectivenessDb() {
            return db;
        }

        @Override
        public String toString() {
            return String.format(Locale.ROOT, "SE %.2f dB", db);
        }
    }
}
