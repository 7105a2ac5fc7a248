/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.PlanarResult;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.Length;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Every corner of the documented input range (1 mHz–100 GHz, 1 nm–10 cm, σ 0–1e8 S/m,
 * µr 1–1e6, distance 1 mm–100 m), alone and stacked, gives a finite result whose parts
 * add up: the corners are where overflow, underflow and cancellation live.
 */
class PlanarRangeCornersTest {

    @Test
    void everyCornerIsFiniteAndAddsUp() {
        double[] hz = {1e-3, 1, 1e6, 1e11};
        double[] t = {1e-9, 1e-5, 0.1};
        double[] sigma = {0, 1e-2, 1e8};
        double[] mu = {1, 1e6};
        List<IncidentField> fields = new ArrayList<>();
        fields.add(IncidentField.planeWave());
        for (double d : new double[] {1e-3, 100}) {
            for (ImpedanceForm form : ImpedanceForm.values()) {
                fields.add(IncidentField.magneticNearField(Length.ofMetres(d), form));
                fields.add(IncidentField.electricNearField(Length.ofMetres(d), form));
            }
        }
        int checked = 0;
        for (double s : sigma) {
            for (double m : mu) {
                Medium medium = Medium.conductor("corner", Conductivity.ofSiemensPerMetre(s), m);
                for (double th : t) {
                    Barrier single = Barrier.of(medium, Length.ofMetres(th));
                    Barrier stacked = single.thenGap(Length.ofMetres(th)).then(medium, Length.ofMetres(th));
                    for (Barrier b : List.of(single, stacked)) {
                        for (IncidentField f : fields) {
                            for (double h : hz) {
                                PlanarResult r = b.facing(f).at(Frequency.ofHertz(h));
                                String where = b + " " + f + " " + h + " Hz: " + r;
                                assertTrue(Double.isFinite(r.shieldingEffectivenessDb()) && Double.isFinite(r.reflectionDb())
                                        && Double.isFinite(r.multipleReflectionDb())
                                        && Double.isFinite(r.transmissionDb()), where);
                                assertEquals(r.shieldingEffectivenessDb(), r.absorptionDb() + r.reflectionDb()
                                        + r.multipleReflectionDb(), 1e-9 * Math.max(1, Math.abs(r.shieldingEffectivenessDb())), where);
                                checked++;
                            }
                        }
                    }
                }
            }
        }
        assertEquals(3 * 2 * 3 * 2 * 9 * 4, checked);
    }
}
