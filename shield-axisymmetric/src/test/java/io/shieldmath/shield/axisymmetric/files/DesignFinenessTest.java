/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.axisymmetric.Arrangement;
import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.axisymmetric.CanEnd;
import io.shieldmath.shield.axisymmetric.SensorRegion;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.files.MaterialFileException;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Length;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The mesh fineness a design is evaluated at travels with it through the file, so that a
 * study computed at another fineness reads back to the same evaluation (an invented can).
 */
class DesignFinenessTest {

    private static final Catalogue CATALOGUE = Catalogue.builtIn();

    private static AxisymmetricDesign can() {
        return AxisymmetricDesign.inUniformAxialField(List.of(DesignBody.can("can", CATALOGUE.get("nickel-iron-80"),
                        Length.ofMillimetres(15), Length.ofMillimetres(1), Length.ofMillimetres(60))
                        .withCapHole(CanEnd.UPPER, Length.ofMillimetres(3))),
                DesignSensor.cylinder(Length.ofMillimetres(3), Length.ofMillimetres(10)),
                FrequencyBand.parse("10 Hz to 1 kHz"), 3);
    }

    @Test
    void aFinenessIsWrittenReadBackAndEvaluated() {
        AxisymmetricDesign d = can().withFineness(0.5);
        String json = WholeDesignFile.toJson(d);
        assertTrue(json.contains("\"fineness\" : 0.5"), json);
        AxisymmetricDesign back = WholeDesignFile.parse(json, CATALOGUE).axisymmetric().orElseThrow();
        assertEquals(d, back);
        assertEquals(0.5, back.fineness(), 0);
        assertEquals(Arrangement.of(Body.can("can", CATALOGUE.get("nickel-iron-80"), Length.ofMillimetres(15),
                        Length.ofMillimetres(1), Length.ofMillimetres(60)).withCapHole(CanEnd.UPPER, Length.ofMillimetres(3)))
                .inUniformAxialField().sensing(SensorRegion.cylinder(Length.ofMillimetres(3), Length.ofMillimetres(10)))
                .withFineness(0.5), back.model());
    }

    @Test
    void theDefaultFinenessIsNotWrittenAndABadOneIsRefused() {
        AxisymmetricDesign d = can();
        assertEquals(AxisymmetricDesign.DEFAULT_FINENESS, d.fineness(), 0);
        String json = WholeDesignFile.toJson(d);
        assertTrue(!json.contains("fineness"), json);
        assertEquals(d, can().withFineness(1));
        assertThrows(InvalidQuantityException.class, () -> d.withFineness(0.1));
        String bad = WholeDesignFile.toJson(d.withFineness(0.5)).replace("\"fineness\" : 0.5", "\"fineness\" : 40");
        MaterialFileException e = assertThrows(MaterialFileException.class, () -> WholeDesignFile.parse(bad, CATALOGUE));
        assertTrue(e.getMessage().contains("fineness"), e.getMessage());
    }
}
