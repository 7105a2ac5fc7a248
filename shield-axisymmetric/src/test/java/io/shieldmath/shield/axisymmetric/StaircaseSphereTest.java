/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.enclosure.Shell;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * A spherical shell has no preferred direction, so its static shielding factor is the same
 * along and across the axis. The mesh has no curved boundaries, so the shell is built as a
 * staircase of rings (invented geometry: a = 20 mm, b = 24 mm, µr 100).
 */
class StaircaseSphereTest {

    private static final double A = 20;
    private static final double B = 24;
    private static final double MU = 100;

    /** The shell as n slabs of equal height, each ring spanning the sphere's radii at the slab's mid-height. */
    private static Arrangement staircase(int n, Medium m) {
        List<Body> rings = new ArrayList<>();
        double dz = 2 * B / n;
        for (int k = 0; k < n; k++) {
            double zc = -B + (k + 0.5) * dz;
            double outer = Math.sqrt(B * B - zc * zc);
            double inner = Math.abs(zc) < A ? Math.sqrt(A * A - zc * zc) : 0;
            Body ring = inner > 0 ? Body.annularPlate("ring " + k, m, mm(outer), mm(inner), mm(dz))
                    : Body.disc("ring " + k, m, mm(outer), mm(dz));
            rings.add(zc >= 0 ? ring.shiftedBy(mm(zc)) : ring.shiftedBackBy(mm(-zc)));
        }
        return Arrangement.of(rings);
    }

    @Test
    void bothDirectionsTendToJacksonsSphericalShell() {
        // J. D. Jackson, Classical Electrodynamics, 3rd ed., §5.12: a shell of radii a < b and
        // permeability µ has S = [(2µ+1)(µ+2) − 2(a/b)³(µ−1)²]/(9µ) at its centre, in any
        // direction; shield-core's Shell.sphere gives the same number.
        double q = Math.pow(A / B, 3);
        double jackson = ((2 * MU + 1) * (MU + 2) - 2 * q * (MU - 1) * (MU - 1)) / (9 * MU);
        Medium m = Medium.conductor("test alloy", Conductivity.ZERO, MU);
        assertEquals(jackson, Shell.sphere(mm(A)).wall(m, mm(B - A)).staticShielding().factor(), 1e-9 * jackson);
        // The staircase's error is first order in the step (its corners), so the steps halve
        // and the first-order Richardson extrapolation 2·S(2n) − S(n) removes it (common
        // practice, no source).
        int[] steps = {16, 32, 64};
        double[] axial = new double[3];
        double[] transverse = new double[3];
        StringBuilder table = new StringBuilder(String.format(Locale.ROOT,
                "staircase sphere (Jackson %.4f): steps   axial   transverse%n", jackson));
        for (int i = 0; i < 3; i++) {
            Arrangement shell = staircase(steps[i], m);
            axial[i] = shell.inUniformAxialField().magnetostatic().shieldingFactorAt(Point.ORIGIN).value();
            transverse[i] = shell.inUniformTransverseField().magnetostatic().shieldingFactorAt(Point.ORIGIN).value();
            table.append(String.format(Locale.ROOT, "  %3d   %.4f   %.4f%n", steps[i], axial[i], transverse[i]));
        }
        double axialLimit = 2 * axial[2] - axial[1];
        double transverseLimit = 2 * transverse[2] - transverse[1];
        table.append(String.format(Locale.ROOT, "  extrapolated   %.4f   %.4f%n", axialLimit, transverseLimit));
        System.out.print(table);
        for (int i = 1; i < 3; i++) {
            assertTrue(Math.abs(axial[i] - transverse[i]) < Math.abs(axial[i - 1] - transverse[i - 1]), table.toString());
            assertTrue(Math.abs(axial[i] - jackson) < Math.abs(axial[i - 1] - jackson), table.toString());
            assertTrue(Math.abs(transverse[i] - jackson) < Math.abs(transverse[i - 1] - jackson), table.toString());
        }
        assertEquals(jackson, axialLimit, 0.01 * jackson, table.toString());
        assertEquals(jackson, transverseLimit, 0.01 * jackson, table.toString());
    }
}
