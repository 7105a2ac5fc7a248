/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.enclosure;

import io.shieldmath.shield.internal.Numerics;
import io.shieldmath.shield.model.ShieldingResult;
import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.quantity.RelativePermeability;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import io.shieldmath.shield.quantity.Complex;

/**
 * The shielding of a shell in a uniform alternating field at one frequency: the complex
 * shielding factor S (applied field over the field at the centre, time convention
 * e^{jωt}), |S| in dB, and Kaden's thin-shell closed form of each wall alone for
 * comparison.
 *
 * <p>Immutable and thread-safe.
 */
public final class ShellResult implements ShieldingResult {

    /** Above this k0·R (free-space wavenumber times outer radius) the quasi-static model is flagged. */
    public static final double QUASI_STATIC_LIMIT = 0.1;

    private final Shell shell;
    private final Frequency frequency;
    private final double logS;
    private final double phase;

    ShellResult(Shell shell, Frequency frequency, double logS, double phase) {
        this.shell = shell;
        this.frequency = frequency;
        this.logS = logS;
        this.phase = phase;
    }

    /**
     * The shell.
     *
     * @return the shell
     */
    public Shell shell() {
        return shell;
    }

    /**
     * The frequency.
     *
     * @return f
     */
    public Frequency frequency() {
        return frequency;
    }

    /**
     * |S| in dB, 20·log10|S|, finite for any wall thickness.
     *
     * @return SE in dB
     */
    @Override
    public double shieldingEffectivenessDb() {
        return Numerics.DB_PER_NEPER * logS;
    }

    /**
     * The complex shielding factor S (applied field over the field at the centre); its
     * magnitude is {@link #shieldingFactor()}.
     *
     * @return S
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if |S| does not fit a double
     *         (above about 6160 dB; use {@link #shieldingEffectivenessDb()} and {@link #phase()} there)
     */
    public Complex complexShieldingFactor() {
        return Complex.ofPolar(Math.exp(logS), phase);
    }

    /**
     * arg S in radians, in (−π, π]: the phase lag of the field inside behind the applied field.
     *
     * @return arg S
     */
    public double phase() {
        return phase;
    }

    /**
     * Kaden's thin-shell factor of one wall alone (see the package notes for the formulas),
     * with that wall's µr at this frequency.
     *
     * @param wall the wall's index, 0 for the innermost
     * @return S of that wall by the thin-shell formula
     * @throws IndexOutOfBoundsException if there is no such wall
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if |S| does not fit a double
     *         (above about 6160 dB; use {@link #thinShellDb(int)} there)
     */
    public Complex thinShellFactor(int wall) {
        org.apache.commons.math3.complex.Complex log = logThin(wall);
        return Complex.ofPolar(Math.exp(log.getReal()), log.getImaginary());
    }

    /**
     * Kaden's thin-shell factor of one wall alone, in dB.
     *
     * @param wall the wall's index, 0 for the innermost
     * @return 20·log10|S| by the thin-shell formula
     * @throws IndexOutOfBoundsException if there is no such wall
     */
    public double thinShellDb(int wall) {
        return Numerics.DB_PER_NEPER * logThin(wall).getReal();
    }

    private org.apache.commons.math3.complex.Complex logThin(int wall) {
        Wall w = shell.walls().get(wall);
        RelativePermeability mu = w.medium().permeabilityAt(frequency);
        return Kaden.logFactor(shell.geometry(), new org.apache.commons.math3.complex.Complex(mu.real(), -mu.loss()),
                w.medium().conductivity().toSiemensPerMetre(), frequency.angular(), w.meanMetres(),
                w.thicknessMetres());
    }

    /**
     * Whether the quasi-static assumption holds: k0·R ≤ {@value #QUASI_STATIC_LIMIT},
     * with k0 = 2πf/c and R the outer radius. Above it displacement currents and cavity
     * resonances, which this model leaves out, start to matter.
     *
     * @return true if quasi-static
     */
    public boolean isQuasiStatic() {
        return frequency.angular() / PhysicalConstants.SPEED_OF_LIGHT * shell.outerRadius().toMetres()
                <= QUASI_STATIC_LIMIT;
    }

    /**
     * Plain-text warnings about the validity of this result (empty if none): the messages
     * of {@link #validityNotes()}.
     *
     * @return an unmodifiable list
     */
    public List<String> warnings() {
        List<String> w = new ArrayList<>();
        for (ValidityNote n : validityNotes()) {
            w.add(n.message());
        }
        return List.copyOf(w);
    }

    /**
     * The notes on this result's validity: {@link ValidityNote.Limit#QUASI_STATIC} above
     * k0·R = {@value #QUASI_STATIC_LIMIT}.
     *
     * @return an unmodifiable list, empty inside the limits
     */
    @Override
    public List<ValidityNote> validityNotes() {
        if (isQuasiStatic()) {
            return List.of();
        }
        return List.of(ValidityNote.of(ValidityNote.Limit.QUASI_STATIC, "the shell is not small against the "
                + "wavelength at " + frequency + " (k0·R above " + QUASI_STATIC_LIMIT + "): the quasi-static shell "
                + "model leaves out displacement currents and cavity resonances; treat the result as an estimate"));
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "|S| %.2f dB, arg S %.3f rad at %s", shieldingEffectivenessDb(), phase, frequency);
    }
}
