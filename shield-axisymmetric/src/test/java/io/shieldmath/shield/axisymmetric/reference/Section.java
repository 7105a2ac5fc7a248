/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric.reference;

import io.shieldmath.shield.quantity.InvalidQuantityException;

/**
 * The rectangular cross-section of an annular cell (or of a winding), in the (r, z)
 * half-plane: rInner ≤ r ≤ rOuter, zLow ≤ z ≤ zHigh, all in metres.
 *
 * @param rInner the inner radius, 0 m or more
 * @param rOuter the outer radius, greater than {@code rInner}
 * @param zLow   the lower axial bound, finite
 * @param zHigh  the upper axial bound, greater than {@code zLow}
 */
public record Section(double rInner, double rOuter, double zLow, double zHigh) {

    /**
     * Checks the bounds.
     *
     * @throws InvalidQuantityException if a bound is not finite, rInner is negative, or a side
     *                                  has zero or negative length
     */
    public Section {
        if (!(rInner >= 0 && Double.isFinite(rInner))) {
            throw new InvalidQuantityException("cell inner radius", rInner + " m", "finite and 0 m or more");
        }
        if (!(rOuter > rInner && Double.isFinite(rOuter))) {
            throw new InvalidQuantityException("cell outer radius", rOuter + " m",
                    "finite and greater than the inner radius " + rInner + " m");
        }
        if (!Double.isFinite(zLow)) {
            throw new InvalidQuantityException("cell lower face", zLow + " m", "finite");
        }
        if (!(zHigh > zLow && Double.isFinite(zHigh))) {
            throw new InvalidQuantityException("cell upper face", zHigh + " m",
                    "finite and above the lower face " + zLow + " m");
        }
    }

    /**
     * The mean radius (rInner + rOuter)/2: with a uniform current density, the radius at which
     * the cell's resistance 2π·r̄/(σ·Δr·Δz) is exact.
     *
     * @return r̄ in m
     */
    public double meanRadius() {
        return 0.5 * (rInner + rOuter);
    }

    /**
     * The axial centre.
     *
     * @return (zLow + zHigh)/2 in m
     */
    public double centreZ() {
        return 0.5 * (zLow + zHigh);
    }

    /**
     * The radial width Δr.
     *
     * @return rOuter − rInner in m
     */
    public double width() {
        return rOuter - rInner;
    }

    /**
     * The axial height Δz.
     *
     * @return zHigh − zLow in m
     */
    public double height() {
        return zHigh - zLow;
    }

    /**
     * The larger side, the length scale the quadrature rules compare distances with.
     *
     * @return max(Δr, Δz) in m
     */
    public double size() {
        return Math.max(width(), height());
    }

    /**
     * Whether a point of the half-plane lies in this closed rectangle.
     *
     * @param r the radius in m
     * @param z the axial position in m
     * @return true if rInner ≤ r ≤ rOuter and zLow ≤ z ≤ zHigh
     */
    public boolean contains(double r, double z) {
        return r >= rInner && r <= rOuter && z >= zLow && z <= zHigh;
    }
}
