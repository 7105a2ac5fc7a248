/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import static io.shieldmath.shield.quantity.Quantities.Hz;
import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.RelativePermittivity;
import org.junit.jupiter.api.Test;

/** Equal shells give equal results: a gap is known by its mark, never by object identity. */
class EqualShellsTest {

    @Test
    void anAirWallThatIsNotAGapIsNotTreatedAsOne() {
        // Regression: Shell decided "gap" by l.medium() == Medium.AIR, so a copy of air built by
        // value was a wall in one shell and a gap in another, and two shells that were equal gave
        // shielding factors of 0.268 and 0.0208.
        Medium alloy = Medium.conductor("high-µ alloy", iacs(3), 20_000);
        Shell gapped = Shell.sphere(cm(5)).wall(alloy, mm(1)).thenGap(cm(1)).then(alloy, mm(1));
        Shell again = Shell.sphere(cm(5)).wall(alloy, mm(1)).thenGap(cm(1)).then(alloy, mm(1));
        assertEquals(gapped, again);
        assertEquals(gapped.staticShielding().shieldingEffectivenessDb(),
                again.staticShielding().shieldingEffectivenessDb(), 0);
        assertEquals(gapped.at(Hz(50)).shieldingEffectivenessDb(), again.at(Hz(50)).shieldingEffectivenessDb(), 0);
        // The same air, made by value, as a wall: not equal to the gapped shell, and not a gap.
        Medium air = Medium.of("air", Conductivity.ofSiemensPerMetre(0), Medium.AIR.permeability(),
                RelativePermittivity.of(1));
        Shell airWall = Shell.sphere(cm(5)).wall(alloy, mm(1)).then(air, cm(1)).then(alloy, mm(1));
        assertNotEquals(gapped, airWall);
        assertEquals(3, airWall.walls().size());
        assertEquals(2, gapped.walls().size());
    }
}
