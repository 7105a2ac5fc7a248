/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package consumer.app;

import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mm;

import io.shieldmath.shield.axisymmetric.Body;
import io.shieldmath.shield.cli.BatchCommand;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.planar.Barrier;

/**
 * A small program of a library user (invented): one type from each published module,
 * one number computed, and the modules it ran in printed, one {@code key=value} a line.
 */
public final class Consumer {

    private Consumer() {
    }

    /**
     * Prints the shielding effectiveness of 1 mm of the catalogue's annealed copper against
     * a plane wave at 100 kHz, and the module each part was loaded from.
     *
     * @param args not used
     */
    public static void main(String[] args) {
        Material copper = Catalogue.builtIn().get("copper-annealed");
        double se = Barrier.of(copper, mm(1)).facing(IncidentField.planeWave()).at(kHz(100))
                .shieldingEffectivenessDb();
        Body lid = Body.disc("lid", copper, cm(5), mm(1));
        System.out.println("se=" + se);
        System.out.println("body=" + lid.getClass().getSimpleName());
        System.out.println("consumer.module=" + Consumer.class.getModule().getName());
        System.out.println("core.module=" + Barrier.class.getModule().getName());
        System.out.println("materials.module=" + Catalogue.class.getModule().getName());
        System.out.println("axisymmetric.module=" + Body.class.getModule().getName());
        System.out.println("cli.module=" + BatchCommand.class.getModule().getName());
    }
}
