/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import java.util.Locale;
import java.util.Objects;

/**
 * One path by which field reaches the inside of an enclosure: through the wall, or
 * through one opening (or array of equal openings).
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class LeakagePath {

    private final String name;
    private final boolean wall;
    private final double db;
    private final double share;
    private final String model;

    LeakagePath(String name, boolean wall, double db, double share, String model) {
        this.name = name;
        this.wall = wall;
        this.db = db;
        this.share = share;
        this.model = model;
    }

    /**
     * The path's name: "wall" or the opening's name.
     *
     * @return the name
     */
    public String name() {
        return name;
    }

    /**
     * Whether this is the path through the wall.
     *
     * @return true for the wall
     */
    public boolean isWall() {
        return wall;
    }

    /**
     * The path's own shielding effectiveness: the SE the enclosure would have if this
     * were its only path.
     *
     * @return SE in dB
     */
    public double shieldingEffectivenessDb() {
        return db;
    }

    /**
     * The path's share of the field that gets in: τ_i/Σ τ_j (magnitudes) or
     * τ_i²/Σ τ_j² (root-sum-square), so the shares add up to 1.
     *
     * @return the share, 0 to 1
     */
    public double share() {
        return share;
    }

    /**
     * The model that gave the path's SE.
     *
     * @return a short description
     */
    public String model() {
        return model;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LeakagePath p && p.name.equals(name) && p.wall == wall
                && Double.compare(p.db, db) == 0 && Double.compare(p.share, share) == 0 && p.model.equals(model);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, wall, db, share, model);
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s: %.1f dB (%.1f %% of the leakage; %s)", name, db, 100 * share, model);
    }
}
