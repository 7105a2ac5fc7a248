/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.materials.files;

import io.shieldmath.shield.materials.Catalogue;
import io.shieldmath.shield.materials.Material;
import io.shieldmath.shield.materials.MaterialProperty;
import io.shieldmath.shield.materials.TypicalRange;

import io.shieldmath.shield.quantity.Temperature;
import io.shieldmath.shield.quantity.TemperatureCoefficient;
import io.shieldmath.shield.quantity.Density;
import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.quantity.RelativePermeability;
import io.shieldmath.shield.quantity.RelativePermittivity;
import io.shieldmath.shield.quantity.SheetResistance;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** Random but valid materials, catalogues and designs for the property tests (invented data). */
final class RandomMaterials {

    private static final String ALPHABET = "abcdefghijklmnopqrstuvwxyz0123456789";
    private static final String[] TEXT_PIECES = {"copper", "Ni–Fe", "80 %", "µr", "Ω/sq", "\"quoted\"", "back\\slash",
        "ß", "日本", "😀", "tab-free", "a/b", "{braces}", "[brackets]", ",", ":", "from memory"};

    private RandomMaterials() {
    }

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(Math.log(lo) + r.nextDouble() * (Math.log(hi) - Math.log(lo)));
    }

    static String id(Random r) {
        StringBuilder s = new StringBuilder();
        int words = 1 + r.nextInt(3);
        for (int w = 0; w < words; w++) {
            if (w > 0) {
                s.append('-');
            }
            int n = 1 + r.nextInt(8);
            for (int i = 0; i < n; i++) {
                s.append(ALPHABET.charAt(r.nextInt(ALPHABET.length())));
            }
        }
        return s.toString();
    }

    static String text(Random r) {
        StringBuilder s = new StringBuilder();
        int n = 1 + r.nextInt(4);
        for (int i = 0; i < n; i++) {
            if (i > 0) {
                s.append(' ');
            }
            s.append(TEXT_PIECES[r.nextInt(TEXT_PIECES.length)]);
        }
        return s.toString();
    }

    static PermeabilityModel permeability(Random r) {
        switch (r.nextInt(4)) {
            case 0:
                return PermeabilityModel.constant(1);
            case 1:
                return PermeabilityModel.constant(RelativePermeability.ofComplex(logUniform(r, 0.5, 1e6),
                        r.nextBoolean() ? 0 : logUniform(r, 1e-3, 1e5)));
            case 2:
                return PermeabilityModel.relaxation(r.nextBoolean() ? Math.rint(logUniform(r, 1, 1e7))
                        : logUniform(r, 1, 1e7), Frequency.ofHertz(logUniform(r, 1, 1e8)));
            default: {
                int n = 1 + r.nextInt(6);
                double[] hz = new double[n];
                double[] re = new double[n];
                double[] im = new double[n];
                double f = logUniform(r, 1e-3, 1e3);
                for (int i = 0; i < n; i++) {
                    hz[i] = f;
                    f *= logUniform(r, 1.01, 100);
                    re[i] = logUniform(r, 0.5, 1e6);
                    im[i] = r.nextInt(3) == 0 ? 0 : logUniform(r, 1e-3, 1e5);
                }
                return PermeabilityModel.table(hz, re, im);
            }
        }
    }

    static Material material(Random r, String id) {
        Material.Builder b = Material.builder(id, text(r));
        boolean sheet = r.nextInt(5) == 0;
        boolean insulator = !sheet && r.nextInt(5) == 0;
        if (sheet) {
            Length t = Length.ofMetres(logUniform(r, 1e-7, 1e-3));
            // keep σ = 1/(Rs·t) at most 1e9 S/m
            double minRs = Math.max(1e-6, 1 / (1e9 * t.toMetres()));
            b.sheetResistance(SheetResistance.ofOhmsPerSquare(logUniform(r, minRs * 1.01, 1e6)), t, text(r));
        } else {
            b.conductivity(insulator ? Conductivity.ZERO : r.nextBoolean()
                    ? Conductivity.ofPercentIacs(Math.rint(logUniform(r, 1, 110)))
                    : Conductivity.ofSiemensPerMetre(logUniform(r, 1e-3, 1e9)), text(r));
        }
        if (!insulator || r.nextBoolean()) {
            b.temperatureCoefficient(TemperatureCoefficient.ofPerKelvin((r.nextDouble() * 2 - 1) * 0.01), text(r));
        }
        PermeabilityModel mu = permeability(r);
        b.permeability(mu, text(r));
        b.permittivity(RelativePermittivity.of(r.nextBoolean() ? 1 : logUniform(r, 1, 1e6)), text(r));
        b.density(r.nextBoolean() ? Density.ofKilogramsPerCubicMetre(Math.rint(logUniform(r, 1, 30_000)))
                : Density.ofKilogramsPerCubicMetre(logUniform(r, 0.01, 30_000)), text(r));
        if (mu.staticValue() >= Material.FERROMAGNETIC_MU || r.nextInt(4) == 0) {
            b.saturation(MagneticFluxDensity.ofTesla(logUniform(r, 0.01, 3)), text(r));
        }
        if (r.nextBoolean()) {
            b.note(text(r));
        }
        Material m = b.build();
        if (r.nextInt(3) == 0) {
            // Ranges around the typical values of some properties this material carries (version 2 files).
            for (MaterialProperty p : RANGED) {
                if (r.nextBoolean() || m.typicalValue(p).isEmpty()
                        || (p == MaterialProperty.CONDUCTIVITY && m.sheetResistance().isPresent())) {
                    continue;
                }
                TypicalRange range = rangeAround(r, p, m.typicalValue(p).getAsDouble());
                if (range != null) {
                    b.range(range);
                }
            }
            m = b.build();
        }
        return m;
    }

    private static final MaterialProperty[] RANGED = {MaterialProperty.CONDUCTIVITY,
        MaterialProperty.TEMPERATURE_COEFFICIENT, MaterialProperty.PERMEABILITY, MaterialProperty.PERMITTIVITY,
        MaterialProperty.DENSITY, MaterialProperty.SATURATION};

    /** The limits a material accepts, as in {@link Material}. */
    private static double[] limits(MaterialProperty p) {
        switch (p) {
            case CONDUCTIVITY:
                return new double[] {0, 1e9};
            case TEMPERATURE_COEFFICIENT:
                return new double[] {-0.01, 0.01};
            case PERMEABILITY:
                return new double[] {0, 1e7};
            case PERMITTIVITY:
                return new double[] {1, 1e6};
            case DENSITY:
                return new double[] {0.01, 30_000};
            default:
                return new double[] {0.01, 3};
        }
    }

    /** A range that holds the typical value, within the limits, or null if none fits. */
    static TypicalRange rangeAround(Random r, MaterialProperty p, double typical) {
        double[] lim = limits(p);
        double w = Math.max(Math.abs(typical), 1e-6);
        double low = Math.max(lim[0], r.nextInt(4) == 0 ? typical : typical - w * r.nextDouble());
        double high = Math.min(lim[1], r.nextInt(4) == 0 ? typical : typical + w * r.nextDouble());
        if (!(low < high)) {
            return null;
        }
        return TypicalRange.of(p, low, high, text(r));
    }

    static Catalogue catalogue(Random r, int maxMaterials) {
        int n = r.nextInt(maxMaterials + 1);
        List<Material> list = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        while (list.size() < n) {
            String id = id(r);
            if (!ids.contains(id)) {
                ids.add(id);
                list.add(material(r, id));
            }
        }
        return Catalogue.of(list);
    }

    static IncidentField field(Random r) {
        Length d = Length.ofMetres(logUniform(r, 1e-3, 100));
        ImpedanceForm form = r.nextBoolean() ? ImpedanceForm.TEXTBOOK : ImpedanceForm.EXACT_DIPOLE;
        switch (r.nextInt(3)) {
            case 0:
                return IncidentField.planeWave();
            case 1:
                return IncidentField.magneticNearField(d, form);
            default:
                return IncidentField.electricNearField(d, form);
        }
    }

    /** A design over a catalogue with at least one material. */
    static Design design(Random r, Catalogue cat) {
        int n = 1 + r.nextInt(4);
        List<DesignLayer> layers = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Length t = Length.ofMetres(logUniform(r, 1e-9, 1));
            switch (r.nextInt(4)) {
                case 0:
                    layers.add(DesignLayer.gap(t));
                    break;
                case 1:
                    layers.add(DesignLayer.medium(Medium.of(text(r), Conductivity.ofSiemensPerMetre(
                            logUniform(r, 1e-3, 1e8)), permeability(r), RelativePermittivity.of(logUniform(r, 1, 10))), t));
                    break;
                default: {
                    Material m = cat.all().get(r.nextInt(cat.size()));
                    if (r.nextBoolean()) {
                        layers.add(DesignLayer.of(m, t));
                    } else {
                        double c = Math.rint(r.nextDouble() * 200 - 50);
                        try {
                            layers.add(DesignLayer.of(m, t, Temperature.ofCelsius(c)));
                        } catch (IllegalArgumentException e) {
                            layers.add(DesignLayer.of(m, t));
                        }
                    }
                }
            }
        }
        double lo = logUniform(r, 1e-3, 1e9);
        FrequencyBand band = FrequencyBand.of(Frequency.ofHertz(lo), Frequency.ofHertz(lo * logUniform(r, 1, 1e3)));
        Design d = Design.of(layers, field(r), band, 1 + r.nextInt(Design.MAX_POINTS));
        if (r.nextBoolean() && layers.get(0).kind() != DesignLayer.Kind.GAP) {
            d = Design.of(shell(r, layers), d.field(), band, d.points());
        }
        if (r.nextBoolean()) {
            d = d.meeting(cases(r));
        }
        return r.nextBoolean() ? d.withTitle(text(r)) : d;
    }

    /** A closed shell of random form, sizes and openings around the given walls. */
    static DesignShell shell(Random r, List<DesignLayer> walls) {
        Length a = Length.ofMetres(logUniform(r, 0.01, 1));
        DesignShell s;
        if (r.nextBoolean()) {
            s = DesignShell.box(a, Length.ofMetres(a.toMetres() * (0.6 + 0.8 * r.nextDouble())),
                    Length.ofMetres(a.toMetres() * (0.6 + 0.8 * r.nextDouble())), walls);
        } else {
            DesignShell.Form[] round = {DesignShell.Form.SPHERE, DesignShell.Form.CYLINDER_TRANSVERSE,
                    DesignShell.Form.CYLINDER_AXIAL};
            s = DesignShell.round(round[r.nextInt(3)], a, walls);
        }
        // Openings fit the shell (Enclosure.withOpening refuses the others): sizes 2e-3·a (20 µm and up, so a
        // slot's width of 0.05 times its length stays above 1 µm) to 0.05·a, at most
        // 3 arrays of 200 holes, 1.2·a² open at most, below the smallest wall area, 6·(0.6·a)² = 2.2·a².
        for (int i = r.nextInt(4); i > 0; i--) {
            Length l = Length.ofMetres(a.toMetres() * logUniform(r, 2e-3, 0.05));
            io.shieldmath.shield.enclosure.Opening o = switch (r.nextInt(3)) {
                case 0 -> io.shieldmath.shield.enclosure.Opening.holes(l, 1 + r.nextInt(200));
                case 1 -> io.shieldmath.shield.enclosure.Opening.slot(l, Length.ofMetres(l.toMetres() * r.nextDouble()
                        * 0.9 + l.toMetres() * 0.05));
                default -> io.shieldmath.shield.enclosure.Opening.seam(l);
            };
            if (r.nextBoolean() && o.kind() != io.shieldmath.shield.enclosure.Opening.Kind.SEAM) {
                o = o.throughTube(Length.ofMetres(logUniform(r, 1e-4, 0.05)));
            }
            if (r.nextBoolean()) {
                o = o.atDistance(Length.ofMetres(logUniform(r, 1e-3, 0.5)));
            }
            if (r.nextBoolean()) {
                o = o.named(text(r));
            }
            s = s.withOpening(o);
        }
        return s.inUniformField(r.nextBoolean());
    }

    /**
     * Random source cases: bands with incident and tolerated flux densities, or with a
     * required SE given directly (0 dB to 400 dB, the ends included now and then).
     */
    static io.shieldmath.shield.design.Requirement cases(Random r) {
        io.shieldmath.shield.design.Requirement q = io.shieldmath.shield.design.Requirement.none();
        for (int i = 1 + r.nextInt(5); i > 0; i--) {
            double lo = logUniform(r, 1, 1e6);
            FrequencyBand b = r.nextBoolean() ? FrequencyBand.at(Frequency.ofHertz(lo))
                    : FrequencyBand.of(Frequency.ofHertz(lo), Frequency.ofHertz(lo * logUniform(r, 1, 10)));
            if (r.nextBoolean()) {
                double db = switch (r.nextInt(8)) {
                    case 0 -> 0;
                    case 1 -> 400;
                    case 2 -> r.nextInt(121);
                    default -> 400 * r.nextDouble();
                };
                q = q.plus(b, io.shieldmath.shield.quantity.Decibels.of(db));
            } else {
                q = q.plus(b, MagneticFluxDensity.ofTesla(logUniform(r, 1e-9, 1e-2)),
                        MagneticFluxDensity.ofTesla(logUniform(r, 1e-12, 1e-6)));
            }
        }
        return q;
    }
}
