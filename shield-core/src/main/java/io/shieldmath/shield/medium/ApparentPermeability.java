/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.medium;

import io.shieldmath.shield.internal.Require;
import io.shieldmath.shield.internal.Text;
import io.shieldmath.shield.quantity.Conductivity;
import io.shieldmath.shield.quantity.Frequency;
import io.shieldmath.shield.quantity.FrequencyUnit;
import io.shieldmath.shield.quantity.Length;
import io.shieldmath.shield.quantity.PhysicalConstants;
import io.shieldmath.shield.quantity.RelativePermeability;
import java.util.Objects;
import org.apache.commons.math3.complex.Complex;

/**
 * A permeability known as the apparent permeability of a sheet, converted to the
 * intrinsic permeability the models need.
 *
 * <p>Why: supplier curves of µ against frequency for laminations, tape and sheet are often
 * apparent permeabilities, measured on a sheet of given thickness: they already contain
 * the sheet's own eddy-current screening (from memory: this is the usual way such curves
 * are measured, on ring cores wound from the sheet). The planar chain matrix, the coil
 * coupling and the shells compute that screening again from σ and the thickness, so fed as
 * they are such data would count it twice. Every {@link PermeabilityModel} is intrinsic;
 * this class is how apparent data gets in.
 *
 * <p>Method: the thin-sheet relation of a plate of thickness t in a uniform tangential
 * field, µ_app = µ·tanh(u)/u with u = k·t/2 and k = sqrt(jωµ0µσ) (the classical
 * eddy-current result for laminations; R. M. Bozorth, Ferromagnetism, 1951, ch. 17, from
 * memory), is inverted at each point. With c = jωµ0σt²/4, u² = c·µ, so the relation reads
 * u·tanh(u) = c·µ_app: one complex equation in u. It is solved by Newton's method,
 * continued from the thin-sheet end (u·tanh u ≈ u² for small |u|, the root with
 * Re u &gt; 0) along s·c·µ_app for s from about 1e-8/|c·µ_app| up to 1 in steps of 10 %;
 * then µ = u²/c. The result is accepted only if it is passive and in range
 * (µ' &gt; 0, µ'' ≥ 0, both at most 1e7) and if the forward relation gives back the
 * apparent value to 1e-9 relative; otherwise the point is refused, with the reason.
 *
 * <p>Low frequency (|u| ≪ 1): µ_app ≈ µ·(1 − u²/3), so µ''_app ≈ µ'·ωµ0µ'σt²/12, the
 * classical eddy-current loss of a lamination. Thick sheets (|u| ≫ 1): µ_app ≈ µ/u, whose
 * real and loss parts are equal for a real µ. An apparent value with µ''_app far below
 * µ'_app where |u| ≫ 1 has no passive intrinsic value and is refused.
 *
 * <p>The conversion uses the conductivity given here, once; if the medium's conductivity
 * later changes (a temperature), the intrinsic values are not converted again.
 *
 * <p>Immutable and thread-safe; equality is by value.
 */
public final class ApparentPermeability implements PermeabilityModel {

    private static final double STEP = 1.1;
    private static final int NEWTON = 60;

    private final TabulatedPermeability apparent;
    private final TabulatedPermeability intrinsic;
    private final Length sheet;
    private final Conductivity sigma;

    private ApparentPermeability(TabulatedPermeability apparent, TabulatedPermeability intrinsic, Length sheet,
                                 Conductivity sigma) {
        this.apparent = apparent;
        this.intrinsic = intrinsic;
        this.sheet = sheet;
        this.sigma = sigma;
    }

    /**
     * Converts a table of apparent permeability measured on a sheet to the intrinsic
     * permeability, point by point (see the class notes for the method). Between and
     * beyond the points the intrinsic values are interpolated as a {@link TabulatedPermeability}.
     *
     * @param hertz          the frequencies in Hz, as for {@link PermeabilityModel#table}
     * @param real           µ'_app at each frequency, as for {@link PermeabilityModel#table}
     * @param loss           µ''_app at each frequency, as for {@link PermeabilityModel#table}
     * @param sheetThickness the thickness of the sheet the data were measured on, not null
     * @param conductivity   the sheet's conductivity, not null, 0 or more (0 leaves the values as they are)
     * @return the model
     * @throws NullPointerException     if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if a table value is out of the
     *                                  range of {@link PermeabilityModel#table}
     * @throws IllegalArgumentException if the arrays are not acceptable to {@link PermeabilityModel#table},
     *                                  or a point has no passive intrinsic permeability in range (the
     *                                  message names the point and the reason)
     */
    public static ApparentPermeability fromTable(double[] hertz, double[] real, double[] loss, Length sheetThickness,
                                                 Conductivity conductivity) {
        TabulatedPermeability app = new TabulatedPermeability(hertz, real, loss);
        double t = Require.nonNull("sheet thickness", sheetThickness).toMetres();
        double s = Require.nonNull("conductivity", conductivity).toSiemensPerMetre();
        double[] f = app.hertz();
        double[] re = app.realParts();
        double[] im = app.lossParts();
        double[] ire = new double[f.length];
        double[] iim = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            double[] mu = intrinsicOf(re[i], im[i], f[i], t, s);
            if (mu.length == 1) {
                throw new IllegalArgumentException("apparent permeability table point [" + i + "] at "
                        + Text.show(f[i], FrequencyUnit.values()) + " (µ' " + Text.number(re[i]) + ", µ'' "
                        + Text.number(im[i]) + ", sheet " + sheetThickness + ", σ " + conductivity
                        + ") has no passive intrinsic permeability up to 1e7: " + REASONS[(int) mu[0]]);
            }
            ire[i] = mu[0];
            iim[i] = mu[1];
        }
        return new ApparentPermeability(app, new TabulatedPermeability(f, ire, iim), sheetThickness, conductivity);
    }

    private static final String[] REASONS = {
        "the solution is active (µ'' < 0) or has µ' ≤ 0; an apparent loss part this small is not "
                + "possible for a sheet this thick at this frequency",
        "the intrinsic value would exceed 1e7",
        "the inversion did not converge"
    };

    /**
     * The apparent permeability of a sheet: µ_app = µ·tanh(kt/2)/(kt/2),
     * k = sqrt(jωµ0µσ) (see the class notes).
     *
     * @param intrinsic      the intrinsic µr, not null
     * @param frequency      the frequency, not null (0 Hz gives µ itself)
     * @param sheetThickness the sheet thickness, not null
     * @param conductivity   the conductivity, not null
     * @return the apparent µr
     * @throws NullPointerException if an argument is null
     * @throws io.shieldmath.shield.quantity.InvalidQuantityException if the result is out of the range of
     *                                  {@link RelativePermeability} (it cannot be, for an intrinsic value in range)
     */
    public static RelativePermeability apparent(RelativePermeability intrinsic, Frequency frequency,
                                                Length sheetThickness, Conductivity conductivity) {
        Require.nonNull("intrinsic permeability", intrinsic);
        double w = 2 * Math.PI * Require.nonNull("frequency", frequency).toHertz();
        double t = Require.nonNull("sheet thickness", sheetThickness).toMetres();
        double s = Require.nonNull("conductivity", conductivity).toSiemensPerMetre();
        Complex mu = new Complex(intrinsic.real(), -intrinsic.loss());
        Complex c = new Complex(0, w * PhysicalConstants.MU_0 * s * t * t / 4);
        Complex u = c.multiply(mu).sqrt();
        Complex app = u.abs() == 0 ? mu : mu.multiply(tanhOverU(u));
        return RelativePermeability.ofComplex(app.getReal(), Math.max(0, -app.getImaginary()));
    }

    /** tanh(u)/u; tanh by its real-argument-safe form (sinh 2x + j sin 2y)/(cosh 2x + cos 2y). */
    private static Complex tanhOverU(Complex u) {
        return tanh(u).divide(u);
    }

    private static Complex tanh(Complex u) {
        double x = u.getReal();
        double y = u.getImaginary();
        if (Math.abs(x) > 20) {
            // e^{−4|x|} < 1e-34: tanh is ±1 to double precision.
            return new Complex(Math.signum(x), 0);
        }
        double d = Math.cosh(2 * x) + Math.cos(2 * y);
        return new Complex(Math.sinh(2 * x) / d, Math.sin(2 * y) / d);
    }

    /** u·tanh(u) and its derivative tanh u + u·(1 − tanh² u). */
    private static Complex[] g(Complex u) {
        Complex th = tanh(u);
        Complex d = th.add(u.multiply(Complex.ONE.subtract(th.multiply(th))));
        return new Complex[] {u.multiply(th), d};
    }

    /**
     * The intrinsic µ' and µ'' for an apparent value, or a one-element array with the
     * index of the reason it has none.
     */
    static double[] intrinsicOf(double appReal, double appLoss, double hertz, double t, double sigma) {
        Complex app = new Complex(appReal, -appLoss);
        Complex c = new Complex(0, 2 * Math.PI * hertz * PhysicalConstants.MU_0 * sigma * t * t / 4);
        Complex w = c.multiply(app);
        double size = w.abs();
        if (size < 1e-12) {
            // u·tanh u = u²(1 − u²/3 + ...): the relative change is below 1e-12.
            return new double[] {appReal, appLoss};
        }
        double s = Math.min(1, 1e-8 / size);
        Complex u = w.multiply(s).sqrt();
        while (true) {
            Complex target = w.multiply(s);
            boolean done = false;
            for (int k = 0; k < NEWTON; k++) {
                Complex[] gd = g(u);
                Complex du = gd[0].subtract(target).divide(gd[1]);
                if (du.isNaN() || du.isInfinite()) {
                    return new double[] {2};
                }
                u = u.subtract(du);
                if (du.abs() <= 1e-15 * u.abs()) {
                    done = true;
                    break;
                }
            }
            if (!done) {
                return new double[] {2};
            }
            if (s == 1) {
                break;
            }
            s = Math.min(1, s * STEP);
        }
        Complex mu = u.multiply(u).divide(c);
        double re = mu.getReal();
        double im = -mu.getImaginary();
        // Rounding of a lossless case can leave µ'' a few ulps below 0.
        if (im < 0 && im > -1e-9 * mu.abs()) {
            im = 0;
        }
        if (!(re > 0) || !(im >= 0)) {
            return new double[] {0};
        }
        if (re > RelativePermeability.MAX || im > RelativePermeability.MAX) {
            return new double[] {1};
        }
        Complex back = mu.multiply(tanhOverU(u));
        if (!(back.subtract(app).abs() <= 1e-9 * app.abs())) {
            return new double[] {2};
        }
        return new double[] {re, im};
    }

    /**
     * The apparent data as given.
     *
     * @return the apparent table
     */
    public TabulatedPermeability apparentTable() {
        return apparent;
    }

    /**
     * The intrinsic permeability the apparent data were converted to, which this model returns.
     *
     * @return the intrinsic table
     */
    public TabulatedPermeability intrinsicTable() {
        return intrinsic;
    }

    /**
     * The thickness of the sheet the apparent data were measured on.
     *
     * @return t
     */
    public Length sheetThickness() {
        return sheet;
    }

    /**
     * The conductivity used for the conversion.
     *
     * @return σ
     */
    public Conductivity conductivity() {
        return sigma;
    }

    @Override
    public double real(double hertz) {
        return intrinsic.real(hertz);
    }

    @Override
    public double loss(double hertz) {
        return intrinsic.loss(hertz);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ApparentPermeability a && a.apparent.equals(apparent) && a.sheet.equals(sheet)
                && a.sigma.equals(sigma);
    }

    @Override
    public int hashCode() {
        return Objects.hash(apparent, sheet, sigma);
    }

    /**
     * A description such as {@code "µr table of 4 points, 10 Hz to 100 kHz, converted from the
     * apparent µ of a 350 µm sheet"}.
     *
     * @return the description
     */
    @Override
    public String toString() {
        return intrinsic + ", converted from the apparent µ of a " + sheet + " sheet";
    }
}
