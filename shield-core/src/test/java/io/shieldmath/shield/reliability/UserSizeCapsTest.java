/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.reliability;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.design.ToleranceStudy;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.model.Sweep;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import org.junit.jupiter.api.Test;

/**
 * Issue 15 item 8: every size that comes from a user has a documented cap, enforced before
 * anything of that size is allocated. Each call below would need gigabytes if the cap were
 * checked after the allocation (8 bytes per point or sample), so the refusal itself, in a
 * test JVM of the default heap, shows the order of the check.
 */
class UserSizeCapsTest {

    private static final Barrier COPPER = Barrier.of(
            Medium.conductor("copper", Conductivity.ofPercentIacs(100), 1), Length.ofMillimetres(1));

    @Test
    void pointsSamplesAndSweepsAreRefusedAboveTheirCapsBeforeAllocation() {
        FrequencyBand band = FrequencyBand.of(Frequency.ofHertz(10), Frequency.ofMegahertz(1));
        String msg = assertThrows(IllegalArgumentException.class, () -> band.logSpacedHertz(Integer.MAX_VALUE))
                .getMessage();
        assertTrue(msg.contains(String.valueOf(FrequencyBand.MAX_POINTS)), msg);
        var planar = COPPER.facing(IncidentField.planeWave());
        assertThrows(IllegalArgumentException.class, () -> planar.sweep(band, 50_000_000));
        assertThrows(IllegalArgumentException.class, () -> planar.sweep(band, Sweep.MAX_POINTS + 1));
        var run = ToleranceStudy.of(COPPER, IncidentField.planeWave()).at(Frequency.ofMegahertz(1))
                .toMeet(Decibels.of(40));
        // 10 M samples of 8 bytes (80 MB) is the cap; 100 M (the old cap, 1.6 GB held) is refused.
        run.samples(ToleranceStudy.MAX_SAMPLES);
        assertThrows(InvalidQuantityException.class, () -> run.samples(ToleranceStudy.MAX_SAMPLES + 1));
        assertThrows(InvalidQuantityException.class, () -> run.samples(100_000_000));
    }
}
