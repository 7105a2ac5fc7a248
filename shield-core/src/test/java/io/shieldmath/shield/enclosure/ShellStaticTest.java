/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.m;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.InvalidQuantityException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Static shell factors against the closed-form boundary-value solutions. */
class ShellStaticTest {

    static Medium magnetic(double mu) {
        return Medium.conductor("µr " + mu, Conductivity.ofMegasiemensPerMetre(1.7), mu);
    }

    /** Sphere: S = [(2µ+1)(µ+2) − 2(a/b)³(µ−1)²]/(9µ) (J. D. Jackson, Classical Electrodynamics, 3rd ed., §5.12). */
    static double jacksonSphere(double mu, double a, double b) {
        double q = Math.pow(a / b, 3);
        return ((2 * mu + 1) * (mu + 2) - 2 * q * (mu - 1) * (mu - 1)) / (9 * mu);
    }

    /** Long cylinder across the field: S = [(µ+1)² − (a/b)²(µ−1)²]/(4µ) (same boundary-value method as Jackson §5.12). */
    static double cylinder(double mu, double a, double b) {
        double q = (a / b) * (a / b);
        return ((mu + 1) * (mu + 1) - q * (mu - 1) * (mu - 1)) / (4 * mu);
    }

    @ParameterizedTest
    @CsvSource({
        // µr, inner radius a (m), thickness (m): thin and thick walls, low and high µ
        "2,      0.1,  0.001",
        "100,    0.1,  0.01",
        "1000,   0.05, 0.05",
        "30000,  0.2,  0.001",
        "100000, 0.01, 0.0005",
        "1.0001, 0.1,  0.1",
    })
    void singleSphereMatchesJackson(double mu, double a, double t) {
        double s = Shell.sphere(m(a)).wall(magnetic(mu), m(t)).staticShielding().factor();
        double ref = jacksonSphere(mu, a, a + t);
        assertEquals(ref, s, 1e-10 * ref);
    }

    @ParameterizedTest
    @CsvSource({
        "2,      0.1,  0.001",
        "100,    0.1,  0.01",
        "1000,   0.05, 0.05",
        "30000,  0.2,  0.001",
        "100000, 0.01, 0.0005",
    })
    void singleCylinderMatchesClosedForm(double mu, double a, double t) {
        double s = Shell.cylinderTransverse(m(a)).wall(magnetic(mu), m(t)).staticShielding().factor();
        double ref = cylinder(mu, a, a + t);
        assertEquals(ref, s, 1e-10 * ref);
    }

    @Test
    void axialStaticFieldIsNotShieldedByAnInfiniteTube() {
        // H_z is uniform and continuous at every boundary of an infinite tube: S = 1 (no source needed: ∇×H = 0, ∇·B = 0).
        double s = Shell.cylinderAxial(cm(5)).wall(magnetic(50_000), mm(1)).staticShielding().factor();
        assertEquals(1, s, 1e-12);
    }

    @ParameterizedTest
    @CsvSource({"1000, 0.1, 0.0001", "30000, 0.25, 0.0002", "50, 0.05, 0.00005"})
    void thinShellLimits(double mu, double a, double t) {
        // Kaden 1959 (from memory): S ≈ 1 + (2/3)µ t/R (sphere), 1 + µ t/D (cylinder); the difference from the exact
        // value is of order t/R relative, so allow 3·t/R.
        StaticShielding sp = Shell.sphere(m(a)).wall(magnetic(mu), m(t)).staticShielding();
        double r = a + t / 2;
        assertEquals(1 + 2.0 / 3 * mu * t / r, sp.thinShellFactor(0), 1e-12 * sp.factor());
        assertEquals(sp.factor(), sp.thinShellFactor(0), 3 * t / a * sp.factor());
        StaticShielding cy = Shell.cylinderTransverse(m(a)).wall(magnetic(mu), m(t)).staticShielding();
        assertEquals(1 + mu * t / (2 * r), cy.thinShellFactor(0), 1e-12 * cy.factor());
        assertEquals(cy.factor(), cy.thinShellFactor(0), 3 * t / a * cy.factor());
    }

    @Test
    void nestedShellsReduceToTheSingleShellWhenTheOthersHaveUnitPermeability() {
        Medium air = Medium.conductor("µr 1 wall", Conductivity.ZERO, 1);
        double a = 0.1;
        double t = 0.002;
        double single = jacksonSphere(20_000, a, a + t);
        // the magnetic wall inside, in the middle, or outside of µr = 1 walls, with gaps
        Shell inner = Shell.sphere(m(a)).wall(magnetic(20_000), m(t)).thenGap(cm(1)).then(air, mm(1))
                .thenGap(cm(2)).then(air, mm(3));
        Shell middle = Shell.sphere(m(a - 0.03)).wall(air, mm(5)).thenGap(m(0.025)).then(magnetic(20_000), m(t))
                .thenGap(cm(1)).then(air, mm(1));
        Shell outer = Shell.sphere(m(a - 0.05)).wall(air, mm(1)).thenGap(m(0.049)).then(magnetic(20_000), m(t));
        for (Shell s : new Shell[] {inner, middle, outer}) {
            assertEquals(single, s.staticShielding().factor(), 1e-9 * single, s::toString);
        }
        Shell cyl = Shell.cylinderTransverse(m(a - 0.02)).wall(air, mm(2)).thenGap(m(0.018))
                .then(magnetic(20_000), m(t)).thenGap(cm(3)).then(air, mm(2));
        double c = cylinder(20_000, a, a + t);
        assertEquals(c, cyl.staticShielding().factor(), 1e-9 * c);
    }

    @Test
    void twoShellsAgreeWithTheirOwnClosedFormAndTheSpacedProduct() {
        // Two thin spheres: by the same matching with thin walls, S = S1·S2 − (S1−1)(S2−1)(R1/R2)³; for S_i ≫ 1
        // the spaced product S1·S2·[1 − (R1/R2)³] (Sumner, Pendlebury and Smith 1987, from memory).
        Shell two = Shell.sphere(cm(10)).wall(magnetic(30_000), mm(1)).thenGap(cm(5))
                .then(magnetic(30_000), mm(1));
        StaticShielding st = two.staticShielding();
        double s1 = jacksonSphere(30_000, 0.10, 0.101);
        double s2 = jacksonSphere(30_000, 0.151, 0.152);
        assertEquals(s1, st.singleWallFactor(0), 1e-9 * s1);
        assertEquals(s2, st.singleWallFactor(1), 1e-9 * s2);
        assertEquals(s1 * s2, st.productFactor(), 1e-9 * s1 * s2);
        double rho = Math.pow(0.1005 / 0.1515, 3);
        double thin = s1 * s2 - (s1 - 1) * (s2 - 1) * rho;
        assertEquals(thin, st.factor(), 0.03 * thin);
        assertEquals(st.spacedProductFactor(), st.factor(), 0.05 * st.factor());
        // the plain product overstates it by about 1/(1 − (R1/R2)³) ≈ 1.4
        assertTrue(st.productFactor() > 1.3 * st.factor(), "the plain product overstates nested shells");
        // four cylinders: the spaced product stays within 10 % of the exact value
        Shell four = Shell.cylinderTransverse(cm(5)).wall(magnetic(40_000), mm(1)).thenGap(cm(2))
                .then(magnetic(40_000), mm(1)).thenGap(cm(2)).then(magnetic(40_000), mm(1)).thenGap(cm(2))
                .then(magnetic(40_000), mm(1));
        StaticShielding f = four.staticShielding();
        assertEquals(f.spacedProductFactor(), f.factor(), 0.10 * f.factor());
    }

    @Test
    void boxIsItsEquivalentSphere() {
        Medium al = Medium.conductor("aluminium", iacs(61), 1);
        Shell box = Shell.box(cm(30), cm(20), cm(15)).wall(magnetic(10_000), mm(1));
        Shell sphere = Shell.sphere(cm(15)).wall(magnetic(10_000), mm(1));
        assertEquals(sphere.staticShielding().factor(), box.staticShielding().factor(), 1e-12);
        assertTrue(box.shape().description().contains("equivalent sphere"));
        assertThrows(InvalidQuantityException.class, () -> Shell.box(cm(40), cm(10), cm(10)).wall(al, mm(1)));
    }
}
