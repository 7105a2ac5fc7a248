/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.internal.Require;
import java.util.Objects;
import java.util.Optional;

/**
 * An opening in an enclosure wall: a round hole, a rectangular slot, a seam (treated as a
 * slot of its unfastened length), or n equal ones of these (a perforated panel or vent),
 * optionally backed by a tube (a waveguide below cut-off).
 *
 * <pre>{@code
 * Opening vent = Opening.holes(mm(4), 120).throughTube(mm(6)).named("vent");
 * Opening lid = Opening.seam(cm(8)).named("lid seam between screws");
 * }</pre>
 *
 * <p>Two models, chosen by the field the enclosure faces:
 * <ul>
 *   <li>Incident waves ({@link Enclosure#facing}): the aperture rule (H. W. Ott,
 *       Electromagnetic Compatibility Engineering, Wiley 2009, ch. 6; common practice):
 *       one opening of largest dimension L gives SE = 20·log10(λ/(2L)) for L &lt; λ/2 and
 *       0 dB beyond; n equal openings lose 20·log10(sqrt(n)) more (a rule for openings
 *       within half a wavelength of each other, applied here to every array, which errs
 *       on the safe side); a tube of depth l adds its below-cut-off attenuation
 *       8.686·l·(2π/λc)·sqrt(1 − (f/fc)²) dB, which tends to Ott's 27.3·l/w dB
 *       (rectangular, w the larger side, λc = 2w) and 32·l/D dB (round, λc = πD/1.8412)
 *       far below cut-off, and adds nothing above it. A path's SE is never taken below 0 dB.</li>
 *   <li>A uniform low-frequency magnetic field ({@link Enclosure#inUniformField()},
 *       {@link Enclosure#staticShielding()}): Bethe's small-aperture magnetic
 *       polarizability (H. A. Bethe, Phys. Rev. 66 (1944) 163; from memory) of a round
 *       hole of radius r in a thin, perfectly conducting plane, α_m = (4/3)·r³: the hole
 *       leaks like a magnetic dipole m = α_m·H_t, H_t the tangential field outside the
 *       hole, and at the victim, a distance d behind the hole on its axis, the dipole and
 *       its image in the wall give H = m/(2π·d³). H_t is taken at its largest on a
 *       perfectly conducting shell: 1.5·H0 (sphere), 2·H0 (cylinder across the field),
 *       H0 (along). So the path lets through τ = k·(4/3)·r³/(2π·d³)·n with k that factor
 *       and n the number of holes (their dipoles add in phase), times the tube's
 *       attenuation. A slot or seam of length L is taken as the round hole of diameter L
 *       around it (an upper bound). Assumptions: r ≪ λ, r ≪ d (d is the shell's inner
 *       radius unless {@link #atDistance(Length)} sets it), a wall much thinner than r
 *       (else give the tube) and a wall that shields by eddy currents (t ≫ δ). When
 *       r/d is above 0.2 the result carries a
 *       {@link io.shieldmath.shield.model.ValidityNote.Limit#SMALL_HOLE} note.</li>
 * </ul>
 *
 * <p>High-permeability walls in a static or low-frequency field: the code uses the
 * eddy-current law above for them too, that is the tangential-field drive (α_m = (4/3)·r³)
 * and the tube's TE11 decay exp(−1.841·z/a) (λc = πD/1.8412, 32·l/D dB). That is not their
 * physics: a hole in a high-µ wall is driven by the field normal to the wall (the flux the
 * wall collects), and a high-µ tube in an axial field attenuates as exp(−2.405·z/a), the
 * first zero of J0 (about 41.8·l/D dB; Abramowitz and Stegun, table 9.5, for the zero).
 * So for such walls the tube's attenuation is understated by about a quarter and the hole's
 * drive may be over- or understated by the ratio of normal to tangential field near the
 * hole; treat the path as an order-of-magnitude estimate (±10 dB, from memory). The result
 * carries a {@link io.shieldmath.shield.model.ValidityNote.Limit#HIGH_PERMEABILITY_OPENING}
 * note whenever a wall's µ' is 10 or more.
 *
 * <p>Sizes: 1 µm to 100 m; count 1 to 10⁹. Immutable and thread-safe; equality is by value.
 */
public final class Opening {

    /** The largest number of equal openings in one array. */
    public static final int MAX_COUNT = 1_000_000_000;

    /** The kind of opening. */
    public enum Kind {
        /** A round hole, size its diameter. */
        HOLE,
        /** A rectangular slot, size its length and width. */
        SLOT,
        /** A seam, a slot as long as the unfastened run between fasteners. */
        SEAM
    }

    private final Kind kind;
    private final Length length;
    private final Length width;
    private final int count;
    private final Length tubeDepth;
    private final Length victimDistance;
    private final String name;

    private Opening(Kind kind, Length length, Length width, int count, Length tubeDepth, Length victimDistance,
                    String name) {
        this.kind = kind;
        this.length = length;
        this.width = width;
        this.count = count;
        this.tubeDepth = tubeDepth;
        this.victimDistance = victimDistance;
        this.name = name;
    }

    private static Length size(String what, Length l) {
        Require.nonNull(what, l);
        Require.inRange(what, l.toMetres(), 1e-6, 100, "m");
        return l;
    }

    /**
     * A round hole.
     *
     * @param diameter the diameter, from 1 µm to 100 m
     * @return the opening
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the diameter is outside 1 µm to 100 m
     */
    public static Opening hole(Length diameter) {
        return new Opening(Kind.HOLE, size("hole diameter", diameter), diameter, 1, null, null, "hole " + diameter);
    }

    /**
     * An array of n equal round holes (a perforated panel or vent).
     *
     * @param diameter the diameter of each hole, from 1 µm to 100 m
     * @param count    the number of holes, 1 to 10⁹
     * @return the opening
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the diameter is outside 1 µm to 100 m or the count
     *         outside 1 to 10⁹
     */
    public static Opening holes(Length diameter, int count) {
        size("hole diameter", diameter);
        Require.inRange("hole count", count, 1, MAX_COUNT, "(holes)");
        return new Opening(Kind.HOLE, diameter, diameter, count, null, null, count + " holes of " + diameter);
    }

    /**
     * A rectangular slot.
     *
     * @param length the longer side, from 1 µm to 100 m
     * @param width  the shorter side, from 1 µm to 100 m and not longer than the length
     * @return the opening
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a size is out of range or the width
     *                                  exceeds the length
     */
    public static Opening slot(Length length, Length width) {
        size("slot length", length);
        size("slot width", width);
        Require.inRange("slot width", width.toMetres(), 0, length.toMetres(), "m");
        return new Opening(Kind.SLOT, length, width, 1, null, null, "slot " + length + " × " + width);
    }

    /**
     * A seam, treated as a slot as long as the unfastened run between two fasteners (its
     * gap width does not enter the aperture rule).
     *
     * @param length the unfastened length, from 1 µm to 100 m
     * @return the opening
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the length is outside 1 µm to 100 m
     */
    public static Opening seam(Length length) {
        size("seam length", length);
        return new Opening(Kind.SEAM, length, null, 1, null, null, "seam " + length);
    }

    /**
     * This opening backed by a tube of the opening's cross-section (a waveguide below
     * cut-off, such as a honeycomb vent or a thick wall). For a seam, give it as a slot
     * with its gap width instead.
     *
     * @param depth the tube length l, from 1 µm to 100 m
     * @return the new opening; this one is unchanged
     * @throws IllegalStateException if this is a seam (its width is not known)
     */
    public Opening throughTube(Length depth) {
        if (kind == Kind.SEAM) {
            throw new IllegalStateException("a seam has no known width; describe it as Opening.slot(length, gap) "
                    + "to give it a depth");
        }
        return new Opening(kind, length, width, count, size("tube depth", depth), victimDistance, name);
    }

    /**
     * This opening with the victim at a given distance behind it (for the low-frequency
     * magnetic model); by default the shell's inner radius.
     *
     * @param distance the distance, from 1 µm to 100 m
     * @return the new opening; this one is unchanged
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the distance is outside 1 µm to 100 m
     */
    public Opening atDistance(Length distance) {
        return new Opening(kind, length, width, count, tubeDepth, size("victim distance", distance), name);
    }

    /**
     * This opening with a name for reports.
     *
     * @param newName the name, not blank
     * @return the new opening; this one is unchanged
     * @throws IllegalArgumentException if the name is blank
     */
    public Opening named(String newName) {
        Require.nonNull("opening name", newName);
        if (newName.isBlank()) {
            throw new IllegalArgumentException("opening name must not be blank");
        }
        return new Opening(kind, length, width, count, tubeDepth, victimDistance, newName.strip());
    }

    /**
     * The kind.
     *
     * @return the kind
     */
    public Kind kind() {
        return kind;
    }

    /**
     * The largest dimension L (diameter of a hole, length of a slot or seam).
     *
     * @return L
     */
    public Length largestDimension() {
        return length;
    }

    /**
     * The number of equal openings.
     *
     * @return n, 1 or more
     */
    public int count() {
        return count;
    }

    /**
     * The shorter side of a slot, or the diameter of a hole.
     *
     * @return the width, or empty for a seam
     */
    public Optional<Length> width() {
        return Optional.ofNullable(width);
    }

    /**
     * The depth of the tube behind the opening.
     *
     * @return the depth, or empty if none
     */
    public Optional<Length> tubeDepth() {
        return Optional.ofNullable(tubeDepth);
    }

    /**
     * The victim distance set by {@link #atDistance(Length)}.
     *
     * @return the distance, or empty for the default (the shell's inner radius)
     */
    public Optional<Length> victimDistance() {
        return Optional.ofNullable(victimDistance);
    }

    /**
     * The name for reports.
     *
     * @return the name
     */
    public String name() {
        return name;
    }

    /** The size of one such opening in words, for messages: "diameter 4 mm", "8 cm × 1 mm", "length 8 cm". */
    String sizeText() {
        switch (kind) {
            case HOLE:
                return "diameter " + length;
            case SLOT:
                return length + " × " + width;
            default:
                return "length " + length;
        }
    }

    /**
     * The open area of all n openings, m²: n·πD²/4 for holes, n·L·W for a slot, and 0 for a
     * seam, whose gap width is not known (a seam is a slot along a joint, not a cut-out).
     */
    double totalArea() {
        double l = length.toMetres();
        switch (kind) {
            case HOLE:
                return count * Math.PI * l * l / 4;
            case SLOT:
                return count * l * width.toMetres();
            default:
                return 0;
        }
    }

    /**
     * The aperture rule for one such opening without tube, 20·log10(λ/(2L)) for L &lt; λ/2, else 0.
     *
     * @param hertz the frequency in Hz, greater than 0
     * @return SE in dB, 0 or more
     */
    double apertureDb(double hertz) {
        double lambda = PhysicalConstants.SPEED_OF_LIGHT / hertz;
        double l = length.toMetres();
        return l < lambda / 2 ? 20 * Math.log10(lambda / (2 * l)) : 0;
    }

    /** The cut-off wavelength of the tube's lowest mode: 2w (rectangular, TE10), πD/1.8412 (round, TE11). */
    double cutoffWavelength() {
        return kind == Kind.HOLE ? Math.PI * length.toMetres() / 1.8412 : 2 * length.toMetres();
    }

    /**
     * The tube's attenuation, 8.686·l·(2π/λc)·sqrt(1 − (f/fc)²) dB below cut-off, 0 above.
     *
     * @param hertz the frequency in Hz, 0 for a static field
     * @return dB, 0 or more
     */
    double tubeDb(double hertz) {
        if (tubeDepth == null) {
            return 0;
        }
        double lc = cutoffWavelength();
        double x = hertz * lc / PhysicalConstants.SPEED_OF_LIGHT;
        if (x >= 1) {
            return 0;
        }
        return Numerics.DB_PER_NEPER * tubeDepth.toMetres() * 2 * Math.PI / lc * Math.sqrt(1 - x * x);
    }

    /** The far-field path SE: aperture − 10·log10 n + tube, at least 0. */
    double farFieldDb(double hertz) {
        return Math.max(0, apertureDb(hertz) - 10 * Math.log10(count) + tubeDb(hertz));
    }

    /** The low-frequency magnetic path SE by Bethe's polarizability, at least 0. */
    double magneticDb(double hertz, ShellGeometry geometry, double defaultDistance) {
        double r = length.toMetres() / 2;
        double d = victimDistance == null ? defaultDistance : victimDistance.toMetres();
        double surface = geometry == ShellGeometry.SPHERE ? 1.5 : geometry == ShellGeometry.CYLINDER_TRANSVERSE ? 2 : 1;
        double tau = surface * (4.0 / 3) * r * r * r / (2 * Math.PI * d * d * d) * count;
        return Math.max(0, -20 * Math.log10(tau) + tubeDb(hertz));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Opening p && p.kind == kind && p.length.equals(length) && Objects.equals(p.width, width)
                && p.count == count && Objects.equals(p.tubeDepth, tubeDepth)
                && Objects.equals(p.victimDistance, victimDistance) && p.name.equals(name);
    }

    @Override
    public int hashCode() {
        return Objects.hash(kind, length, width, count, tubeDepth, victimDistance, name);
    }

    @Override
    public String toString() {
        return name + (tubeDepth == null ? "" : " through a tube of " + tubeDepth);
    }
}
