/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.model.ValidityNote;
import io.shieldmath.shield.quantity.FrequencyUnit;
import io.shieldmath.shield.quantity.PhysicalConstants;
import java.util.List;
import java.util.Locale;

/**
 * The validity checks shared by several models, each giving a {@link ValidityNote} or
 * nothing. Not on any hot path: the models call them when they build a full result.
 */
public final class Validity {

    /** Above this k0·L a quasi-static model is flagged. */
    public static final double QUASI_STATIC_LIMIT = 0.1;
    /**
     * Above this frequency, in Hz, a metal's DC conductivity is flagged (the relaxation
     * time of the conduction electrons of good metals is of order 10 to 30 fs, so σ(ω)
     * departs from σ(0) from some hundreds of GHz; N. W. Ashcroft and N. D. Mermin, Solid
     * State Physics, 1976, ch. 1, from memory).
     */
    public static final double DC_CONDUCTIVITY_LIMIT_HERTZ = 1e11;
    /** The conductivity from which a layer counts as a metal for that check, S/m. */
    public static final double METAL_SIEMENS_PER_METRE = 1e5;

    private Validity() {
    }

    /**
     * k0·L = 2πf·L/c.
     *
     * @param hertz  the frequency in Hz
     * @param metres the length L in m
     * @return k0·L
     */
    public static double k0L(double hertz, double metres) {
        return 2 * Math.PI * hertz / PhysicalConstants.SPEED_OF_LIGHT * metres;
    }

    /**
     * The note for a quasi-static model whose largest dimension is L, if k0·L is above
     * {@value #QUASI_STATIC_LIMIT}.
     *
     * @param hertz  the frequency in Hz
     * @param metres the largest dimension L in m
     * @param what   what is quasi-static, for the message
     * @param out    receives the note, if any
     */
    public static void quasiStatic(double hertz, double metres, String what, List<ValidityNote> out) {
        double x = k0L(hertz, metres);
        if (x > QUASI_STATIC_LIMIT) {
            out.add(ValidityNote.of(ValidityNote.Limit.QUASI_STATIC, String.format(Locale.ROOT,
                    "%s is quasi-static, but k0·L = %.3g at %s (above %s, L = %s m): displacement currents and "
                            + "propagation, which the model leaves out, matter; treat the result as an estimate",
                    what, x, Text.show(hertz, FrequencyUnit.values()), QUASI_STATIC_LIMIT, Text.number(metres))));
        }
    }

    /**
     * The note for metal layers above {@value #DC_CONDUCTIVITY_LIMIT_HERTZ} Hz.
     *
     * @param hertz the frequency in Hz
     * @param sigma the layers' conductivities in S/m
     * @param out   receives the note, if any
     */
    public static void dcConductivity(double hertz, double[] sigma, List<ValidityNote> out) {
        if (!(hertz > DC_CONDUCTIVITY_LIMIT_HERTZ)) {
            return;
        }
        for (double s : sigma) {
            if (s >= METAL_SIEMENS_PER_METRE) {
                out.add(ValidityNote.of(ValidityNote.Limit.DC_CONDUCTIVITY, "above 100 GHz a metal's conductivity "
                        + "is no longer its DC value, which the model uses (electron relaxation, surface roughness): "
                        + "the result at " + Text.show(hertz, FrequencyUnit.values()) + " likely overstates the absorption; treat it as an "
                        + "upper estimate"));
                return;
            }
        }
    }
}
