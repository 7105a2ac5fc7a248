/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.medium.MediumSource;
import io.shieldmath.shield.medium.PermeabilityModel;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.model.ShieldingModel;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyBand;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.MagneticFieldStrength;
import io.shieldmath.shield.quantity.MagneticFluxDensity;
import io.shieldmath.shield.internal.RadialChain;
import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.StackArrays;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * A closed shell of one or more concentric walls, with air gaps between them, in a
 * uniform applied magnetic field (static or alternating, quasi-static). Built fluently
 * from the inside out:
 *
 * <pre>{@code
 * Shell can = Shell.sphere(cm(10)).wall(nickelIron, mm(1)).thenGap(cm(2)).then(nickelIron, mm(1));
 * StaticShielding dc = can.staticShielding();   // exact, linear µ
 * ShellResult ac = can.at(Hz(50));             // complex S, |S| in dB
 * }</pre>
 *
 * <p>The shielding factor S is the applied field over the field at the centre (uniform
 * inside the innermost cavity). The models: {@link #staticShielding()} is the exact
 * linear-µ boundary-value solution (Jackson §5.12 for one sphere; the same dipole matching
 * at every boundary for nested shells); {@link #at(Frequency)} matches the same boundaries
 * with complex wavenumbers (see the package notes for the method and its validity), and
 * also gives Kaden's thin-shell closed form of each wall. Each medium's permeability is
 * taken from its {@link PermeabilityModel} at the frequency evaluated, and µ'(0)
 * ({@link PermeabilityModel#staticValue()}) for a static field.
 *
 * <p>At most {@value #MAX_WALLS} walls. Immutable and thread-safe; {@code then…} return a
 * new shell and leave this one untouched.
 */
public final class Shell implements ShieldingModel<ShellResult> {

    /** The largest number of walls. */
    public static final int MAX_WALLS = 8;
    /** The lowest frequency evaluated, in Hz. */
    public static final double MIN_HERTZ = 1e-6;
    /** The highest frequency evaluated, in Hz (the model is quasi-static; see {@link ShellResult#warnings()}). */
    public static final double MAX_HERTZ = 1e11;

    private static final FrequencyBand VALID = FrequencyBand.of(Frequency.ofHertz(MIN_HERTZ), Frequency.ofHertz(MAX_HERTZ));

    private final ShellShape shape;
    private final List<Layer> layers;
    private final List<Wall> walls;
    // The hot-path arrays, one entry per layer (walls and gaps), from the one stack loop (StackArrays).
    final int geometryCode;
    final double[] inner;
    final double[] outer;
    final double[] sigma;
    final PermeabilityModel[] mu;
    /** Index into the layer arrays of each wall. */
    final int[] wallLayer;

    private Shell(ShellShape shape, List<Layer> layers) {
        this.shape = shape;
        this.layers = Collections.unmodifiableList(new ArrayList<>(layers));
        int[] wallNumber = new int[layers.size()];
        for (int i = 0, count = 0; i < wallNumber.length; i++) {
            wallNumber[i] = layers.get(i).isGap() ? count : ++count;
        }
        StackArrays stack = StackArrays.of(i -> (layers.get(i).isGap() ? "gap after wall " : "wall ") + wallNumber[i],
                layers.size(), i -> layers.get(i).medium(),
                i -> layers.get(i).thickness().toMetres(), i -> layers.get(i).isGap());
        double r0 = shape.innerRadius().toMetres();
        inner = stack.innerRadii(r0);
        outer = stack.outerRadii(r0);
        sigma = stack.sigma();
        mu = stack.muWithGapsAsNull();
        List<Wall> w = new ArrayList<>();
        List<Integer> idx = new ArrayList<>();
        for (int i = 0; i < layers.size(); i++) {
            if (!stack.gap()[i]) {
                w.add(new Wall(layers.get(i).medium(), inner[i], outer[i]));
                idx.add(i);
            }
        }
        if (w.size() > MAX_WALLS) {
            throw new IllegalArgumentException("a shell has at most " + MAX_WALLS + " walls; got " + w.size());
        }
        this.walls = Collections.unmodifiableList(w);
        this.wallLayer = idx.stream().mapToInt(Integer::intValue).toArray();
        this.geometryCode = switch (shape.geometry()) {
            case SPHERE -> RadialChain.SPHERE;
            case CYLINDER_TRANSVERSE -> RadialChain.CYLINDER_TRANSVERSE;
            case CYLINDER_AXIAL -> RadialChain.CYLINDER_AXIAL;
        };
    }

    static Shell start(ShellShape shape, MediumSource medium, Length thickness) {
        return new Shell(shape, List.of(Layer.of(medium, thickness)));
    }

    /**
     * A spherical shell, starting at the inner radius of its innermost wall.
     *
     * @param innerRadius the inner radius, from 1 µm to 100 m
     * @return the shape; add walls with {@link ShellShape#wall(MediumSource, Length)}
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the radius is out of range
     */
    public static ShellShape sphere(Length innerRadius) {
        return ShellShape.of(ShellGeometry.SPHERE, innerRadius);
    }

    /**
     * An infinitely long circular cylinder with the field across its axis.
     *
     * @param innerRadius the inner radius, from 1 µm to 100 m
     * @return the shape
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the radius is out of range
     */
    public static ShellShape cylinderTransverse(Length innerRadius) {
        return ShellShape.of(ShellGeometry.CYLINDER_TRANSVERSE, innerRadius);
    }

    /**
     * An infinitely long circular cylinder with the field along its axis (see
     * {@link ShellGeometry#CYLINDER_AXIAL} for what this leaves out).
     *
     * @param innerRadius the inner radius, from 1 µm to 100 m
     * @return the shape
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the radius is out of range
     */
    public static ShellShape cylinderAxial(Length innerRadius) {
        return ShellShape.of(ShellGeometry.CYLINDER_AXIAL, innerRadius);
    }

    /**
     * A closed box of the given inner sides, computed as its equivalent sphere of radius
     * half the longest side (common practice, no source; see the approximation and its
     * validity in the shape's description and in the package notes). Valid for boxes
     * whose longest side is at most {@value ShellShape#MAX_BOX_ASPECT} times the shortest.
     *
     * @param x one inner side, not null
     * @param y the second inner side, not null
     * @param z the third inner side, not null
     * @return the shape
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the sides are out of range or too unequal
     */
    public static ShellShape box(Length x, Length y, Length z) {
        return ShellShape.box(x, y, z);
    }

    /**
     * This shell with one more wall outside, touching the last layer.
     *
     * @param medium    the medium or catalogue material, not null
     * @param thickness the wall thickness, from 1 pm to 100 m
     * @return the new shell
     * @throws IllegalArgumentException if the shell would have more than {@value #MAX_WALLS} walls
     */
    public Shell then(MediumSource medium, Length thickness) {
        List<Layer> l = new ArrayList<>(layers);
        l.add(Layer.of(medium, thickness));
        return new Shell(shape, l);
    }

    /**
     * This shell with an air gap outside its last layer (the next wall starts beyond it).
     *
     * @param gap the gap, from 1 pm to 100 m
     * @return the new shell
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the gap is outside 1 pm to 100 m
     */
    public Shell thenGap(Length gap) {
        List<Layer> l = new ArrayList<>(layers);
        l.add(Layer.gap(gap));
        return new Shell(shape, l);
    }

    /**
     * The shape this shell was started from.
     *
     * @return the shape
     */
    public ShellShape shape() {
        return shape;
    }

    /**
     * The geometry.
     *
     * @return the geometry
     */
    public ShellGeometry geometry() {
        return shape.geometry();
    }

    /**
     * The layers from the inside out, walls and air gaps, as planar layers.
     *
     * @return an unmodifiable list
     */
    public List<Layer> layers() {
        return layers;
    }

    /**
     * The walls from the inside out (air gaps left out).
     *
     * @return an unmodifiable list of one or more walls
     */
    public List<Wall> walls() {
        return walls;
    }

    /**
     * The outer radius of the outermost layer.
     *
     * @return the radius
     */
    public Length outerRadius() {
        return Length.ofMetres(outer[outer.length - 1]);
    }

    /**
     * The same layers as a planar barrier, the outermost layer facing the source: the
     * flat-wall view of this shell used for high-frequency incident fields.
     *
     * @return the barrier
     */
    public Barrier toBarrier() {
        List<Layer> l = new ArrayList<>(layers);
        Collections.reverse(l);
        return Barrier.of(l);
    }

    /**
     * The exact static shielding, linear µ (µ'(0) of each wall), with the thin-shell and
     * product approximations beside it.
     *
     * @return the static result
     * @throws ArithmeticException if a wall's permeability model breaks its contract at 0 Hz (finite
     *         µ' &gt; 0), naming the wall
     */
    public StaticShielding staticShielding() {
        double[] wallLog = new double[inner.length];
        double logS = RadialChain.logShielding(geometryCode, inner, outer, sigma, mu, 0, true, null, wallLog);
        requireFinite(logS, 0);
        return new StaticShielding(this, logS, wallLog);
    }

    /**
     * The frequencies this model evaluates: 1 µHz to 100 GHz (quasi-static; see
     * {@link ShellResult#warnings()}).
     *
     * @return the valid band
     */
    @Override
    public FrequencyBand validBand() {
        return VALID;
    }

    /**
     * The shielding in an alternating uniform field at one frequency.
     *
     * @param frequency the frequency, from 1 µHz to 100 GHz
     * @return the result
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     */
    @Override
    public ShellResult at(Frequency frequency) {
        double hz = checkHertz("frequency", Require.nonNull("frequency", frequency).toHertz());
        double[] phase = new double[1];
        double logS = RadialChain.logShielding(geometryCode, inner, outer, sigma, mu, hz, false, phase, null);
        requireFinite(logS, hz);
        return new ShellResult(this, frequency, logS, phase[0]);
    }

    /**
     * |S| in dB at one frequency, without creating objects (for instrument software and
     * sweeps on primitive arrays); safe to call from many threads.
     *
     * @param hertz the frequency in Hz, from 1 µHz to 100 GHz
     * @return 20·log10|S|
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the frequency is out of range
     */
    @Override
    public double shieldingEffectivenessDb(double hertz) {
        double hz = checkHertz("frequency", hertz);
        double logS = RadialChain.logShielding(geometryCode, inner, outer, sigma, mu, hz, false, null, null);
        requireFinite(logS, hz);
        return Numerics.DB_PER_NEPER * logS;
    }

    /**
     * Checks the walls against saturation in a static (or low-frequency) ambient field.
     * Every wall is compared with the same saturation flux density; see
     * {@link SaturationCheck} for the model, the warning threshold and the suggested
     * thickness.
     *
     * @param ambient    the applied field strength (amplitude), not null; from A/m, oersted, or from a flux
     *                   density in air in µT or gauss by {@link MagneticFieldStrength#from(MagneticFluxDensity)}
     * @param saturation the alloy's saturation flux density, greater than 0, not null
     * @return the check
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the saturation flux density is 0
     */
    public SaturationCheck saturation(MagneticFieldStrength ambient, MagneticFluxDensity saturation) {
        Require.nonNull("ambient field", ambient);
        Require.nonNull("saturation flux density", saturation);
        Require.positive("saturation flux density", saturation.toTesla(), "T");
        return new SaturationCheck(staticShielding(), ambient, saturation);
    }

    private void requireFinite(double logS, double hz) {
        if (!Double.isFinite(logS)) {
            throw Numerics.notFinite("shielding factor", this, hz, Numerics.permeabilityFault(mu,
                    i -> "layer " + (i + 1) + " from the inside (walls and gaps)", hz));
        }
    }

    static double checkHertz(String what, double hz) {
        return Require.inRange(what, hz, MIN_HERTZ, MAX_HERTZ, "Hz");
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Shell s && s.shape.equals(shape) && s.layers.equals(layers);
    }

    @Override
    public int hashCode() {
        return shape.hashCode() * 31 + layers.hashCode();
    }

    @Override
    public String toString() {
        StringBuilder s = new StringBuilder(shape.description()).append(": ");
        for (int i = 0; i < layers.size(); i++) {
            if (i > 0) {
                s.append(" | ");
            }
            s.append(layers.get(i));
        }
        return s.toString();
    }
}
