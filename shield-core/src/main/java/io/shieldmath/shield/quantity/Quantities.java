/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.quantity;

/**
 * Short factories for static import, so a stack reads like the engineer's sentence:
 *
 * <pre>{@code
 * import static io.shieldmath.shield.quantity.Quantities.*;
 *
 * Length t = mil(21);          // 533.4 µm
 * Frequency f = kHz(10);       // 10 kHz
 * Conductivity s = iacs(61);   // 35.38 MS/m
 * Temperature t = celsius(60); // 60 °C
 * Density rho = kgPerCubicMetre(8890);
 * }</pre>
 *
 * <p>Each method is the same as the named factory of its type and throws the same
 * {@link InvalidQuantityException}.
 */
public final class Quantities {

    private Quantities() {
    }

    /**
     * A frequency in hertz; same as {@link Frequency#ofHertz(double)}.
     *
     * @param value the value in hertz
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Frequency#ofHertz(double)} accepts
     */
    public static Frequency Hz(double value) {
        return Frequency.ofHertz(value);
    }

    /**
     * A frequency in kilohertz; same as {@link Frequency#ofKilohertz(double)}.
     *
     * @param value the value in kilohertz
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Frequency#ofKilohertz(double)} accepts
     */
    public static Frequency kHz(double value) {
        return Frequency.ofKilohertz(value);
    }

    /**
     * A frequency in megahertz; same as {@link Frequency#ofMegahertz(double)}.
     *
     * @param value the value in megahertz
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Frequency#ofMegahertz(double)} accepts
     */
    public static Frequency MHz(double value) {
        return Frequency.ofMegahertz(value);
    }

    /**
     * A frequency in gigahertz; same as {@link Frequency#ofGigahertz(double)}.
     *
     * @param value the value in gigahertz
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Frequency#ofGigahertz(double)} accepts
     */
    public static Frequency GHz(double value) {
        return Frequency.ofGigahertz(value);
    }

    /**
     * A length in metres; same as {@link Length#ofMetres(double)}.
     *
     * @param value the value in metres
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Length#ofMetres(double)} accepts
     */
    public static Length m(double value) {
        return Length.ofMetres(value);
    }

    /**
     * A length in centimetres; same as {@link Length#ofCentimetres(double)}.
     *
     * @param value the value in centimetres
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Length#ofCentimetres(double)} accepts
     */
    public static Length cm(double value) {
        return Length.ofCentimetres(value);
    }

    /**
     * A length in millimetres; same as {@link Length#ofMillimetres(double)}.
     *
     * @param value the value in millimetres
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Length#ofMillimetres(double)} accepts
     */
    public static Length mm(double value) {
        return Length.ofMillimetres(value);
    }

    /**
     * A length in micrometres; same as {@link Length#ofMicrometres(double)}.
     *
     * @param value the value in micrometres
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Length#ofMicrometres(double)} accepts
     */
    public static Length um(double value) {
        return Length.ofMicrometres(value);
    }

    /**
     * A length in nanometres; same as {@link Length#ofNanometres(double)}.
     *
     * @param value the value in nanometres
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Length#ofNanometres(double)} accepts
     */
    public static Length nm(double value) {
        return Length.ofNanometres(value);
    }

    /**
     * A length in mils; same as {@link Length#ofMils(double)}.
     *
     * @param value the value in mils
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Length#ofMils(double)} accepts
     */
    public static Length mil(double value) {
        return Length.ofMils(value);
    }

    /**
     * A length in inches; same as {@link Length#ofInches(double)}.
     *
     * @param value the value in inches
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Length#ofInches(double)} accepts
     */
    public static Length inch(double value) {
        return Length.ofInches(value);
    }

    /**
     * A conductivity in S/m; same as {@link Conductivity#ofSiemensPerMetre(double)}.
     *
     * @param value the value in S/m
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Conductivity#ofSiemensPerMetre(double)} accepts
     */
    public static Conductivity siemensPerMetre(double value) {
        return Conductivity.ofSiemensPerMetre(value);
    }

    /**
     * A conductivity in MS/m; same as {@link Conductivity#ofMegasiemensPerMetre(double)}.
     *
     * @param value the value in MS/m
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Conductivity#ofMegasiemensPerMetre(double)} accepts
     */
    public static Conductivity megasiemensPerMetre(double value) {
        return Conductivity.ofMegasiemensPerMetre(value);
    }

    /**
     * A conductivity in % IACS; same as {@link Conductivity#ofPercentIacs(double)}.
     *
     * @param value the value in % IACS
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Conductivity#ofPercentIacs(double)} accepts
     */
    public static Conductivity iacs(double value) {
        return Conductivity.ofPercentIacs(value);
    }

    /**
     * A sheet resistance in Ω/sq; same as {@link SheetResistance#ofOhmsPerSquare(double)}.
     *
     * @param value the value in Ω/sq
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link SheetResistance#ofOhmsPerSquare(double)} accepts
     */
    public static SheetResistance ohmsPerSquare(double value) {
        return SheetResistance.ofOhmsPerSquare(value);
    }

    /**
     * A magnetic field strength in A/m; same as {@link MagneticFieldStrength#ofAmperesPerMetre(double)}.
     *
     * @param value the value in A/m
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link MagneticFieldStrength#ofAmperesPerMetre(double)} accepts
     */
    public static MagneticFieldStrength amperesPerMetre(double value) {
        return MagneticFieldStrength.ofAmperesPerMetre(value);
    }

    /**
     * A magnetic field strength in oersteds; same as {@link MagneticFieldStrength#ofOersteds(double)}.
     *
     * @param value the value in oersteds
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link MagneticFieldStrength#ofOersteds(double)} accepts
     */
    public static MagneticFieldStrength oersted(double value) {
        return MagneticFieldStrength.ofOersteds(value);
    }

    /**
     * A magnetic flux density in tesla; same as {@link MagneticFluxDensity#ofTesla(double)}.
     *
     * @param value the value in tesla
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link MagneticFluxDensity#ofTesla(double)} accepts
     */
    public static MagneticFluxDensity tesla(double value) {
        return MagneticFluxDensity.ofTesla(value);
    }

    /**
     * A magnetic flux density in millitesla; same as {@link MagneticFluxDensity#ofMillitesla(double)}.
     *
     * @param value the value in millitesla
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link MagneticFluxDensity#ofMillitesla(double)} accepts
     */
    public static MagneticFluxDensity mT(double value) {
        return MagneticFluxDensity.ofMillitesla(value);
    }

    /**
     * A magnetic flux density in microtesla; same as {@link MagneticFluxDensity#ofMicrotesla(double)}.
     *
     * @param value the value in microtesla
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link MagneticFluxDensity#ofMicrotesla(double)} accepts
     */
    public static MagneticFluxDensity uT(double value) {
        return MagneticFluxDensity.ofMicrotesla(value);
    }

    /**
     * A magnetic flux density in nanotesla; same as {@link MagneticFluxDensity#ofNanotesla(double)}.
     *
     * @param value the value in nanotesla
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link MagneticFluxDensity#ofNanotesla(double)} accepts
     */
    public static MagneticFluxDensity nT(double value) {
        return MagneticFluxDensity.ofNanotesla(value);
    }

    /**
     * A magnetic flux density in gauss; same as {@link MagneticFluxDensity#ofGauss(double)}.
     *
     * @param value the value in gauss
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link MagneticFluxDensity#ofGauss(double)} accepts
     */
    public static MagneticFluxDensity gauss(double value) {
        return MagneticFluxDensity.ofGauss(value);
    }
    /**
     * A density in kg/m³; same as {@link Density#ofKilogramsPerCubicMetre(double)}.
     *
     * @param value the value in kg/m³
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Density#ofKilogramsPerCubicMetre(double)} accepts
     */
    public static Density kgPerCubicMetre(double value) {
        return Density.ofKilogramsPerCubicMetre(value);
    }

    /**
     * A density in g/cm³; same as {@link Density#ofGramsPerCubicCentimetre(double)}.
     *
     * @param value the value in g/cm³
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Density#ofGramsPerCubicCentimetre(double)} accepts
     */
    public static Density gPerCubicCentimetre(double value) {
        return Density.ofGramsPerCubicCentimetre(value);
    }

    /**
     * An areal mass in kg/m²; same as {@link ArealMass#ofKilogramsPerSquareMetre(double)}.
     *
     * @param value the value in kg/m²
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link ArealMass#ofKilogramsPerSquareMetre(double)} accepts
     */
    public static ArealMass kgPerSquareMetre(double value) {
        return ArealMass.ofKilogramsPerSquareMetre(value);
    }

    /**
     * An areal mass in g/m²; same as {@link ArealMass#ofGramsPerSquareMetre(double)}.
     *
     * @param value the value in g/m²
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link ArealMass#ofGramsPerSquareMetre(double)} accepts
     */
    public static ArealMass gPerSquareMetre(double value) {
        return ArealMass.ofGramsPerSquareMetre(value);
    }

    /**
     * A temperature in °C; same as {@link Temperature#ofCelsius(double)}.
     *
     * @param value the value in °C
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Temperature#ofCelsius(double)} accepts
     */
    public static Temperature celsius(double value) {
        return Temperature.ofCelsius(value);
    }

    /**
     * A temperature in K; same as {@link Temperature#ofKelvin(double)}.
     *
     * @param value the value in K
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Temperature#ofKelvin(double)} accepts
     */
    public static Temperature kelvin(double value) {
        return Temperature.ofKelvin(value);
    }

    /**
     * A temperature coefficient in 1/K; same as {@link TemperatureCoefficient#ofPerKelvin(double)}.
     *
     * @param value the value in 1/K
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link TemperatureCoefficient#ofPerKelvin(double)} accepts
     */
    public static TemperatureCoefficient perKelvin(double value) {
        return TemperatureCoefficient.ofPerKelvin(value);
    }

    /**
     * A temperature coefficient in ppm/K; same as {@link TemperatureCoefficient#ofPpmPerKelvin(double)}.
     *
     * @param value the value in ppm/K
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link TemperatureCoefficient#ofPpmPerKelvin(double)} accepts
     */
    public static TemperatureCoefficient ppmPerKelvin(double value) {
        return TemperatureCoefficient.ofPpmPerKelvin(value);
    }

    /**
     * A voltage amplitude in V; same as {@link VoltageAmplitude#ofVolts(double)}.
     *
     * @param value the value in V
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link VoltageAmplitude#ofVolts(double)} accepts
     */
    public static VoltageAmplitude V(double value) {
        return VoltageAmplitude.ofVolts(value);
    }

    /**
     * A voltage amplitude in mV; same as {@link VoltageAmplitude#ofMillivolts(double)}.
     *
     * @param value the value in mV
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link VoltageAmplitude#ofMillivolts(double)} accepts
     */
    public static VoltageAmplitude mV(double value) {
        return VoltageAmplitude.ofMillivolts(value);
    }

    /**
     * A voltage amplitude in µV; same as {@link VoltageAmplitude#ofMicrovolts(double)}.
     *
     * @param value the value in µV
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link VoltageAmplitude#ofMicrovolts(double)} accepts
     */
    public static VoltageAmplitude uV(double value) {
        return VoltageAmplitude.ofMicrovolts(value);
    }

    /**
     * A current amplitude in A; same as {@link CurrentAmplitude#ofAmperes(double)}.
     *
     * @param value the value in A
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link CurrentAmplitude#ofAmperes(double)} accepts
     */
    public static CurrentAmplitude A(double value) {
        return CurrentAmplitude.ofAmperes(value);
    }

    /**
     * A current amplitude in mA; same as {@link CurrentAmplitude#ofMilliamperes(double)}.
     *
     * @param value the value in mA
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link CurrentAmplitude#ofMilliamperes(double)} accepts
     */
    public static CurrentAmplitude mA(double value) {
        return CurrentAmplitude.ofMilliamperes(value);
    }

    /**
     * An inductance in H; same as {@link Inductance#ofHenries(double)}.
     *
     * @param value the value in H
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Inductance#ofHenries(double)} accepts
     */
    public static Inductance H(double value) {
        return Inductance.ofHenries(value);
    }

    /**
     * An inductance in mH; same as {@link Inductance#ofMillihenries(double)}.
     *
     * @param value the value in mH
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Inductance#ofMillihenries(double)} accepts
     */
    public static Inductance mH(double value) {
        return Inductance.ofMillihenries(value);
    }

    /**
     * An inductance in µH; same as {@link Inductance#ofMicrohenries(double)}.
     *
     * @param value the value in µH
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Inductance#ofMicrohenries(double)} accepts
     */
    public static Inductance uH(double value) {
        return Inductance.ofMicrohenries(value);
    }

    /**
     * An inductance in nH; same as {@link Inductance#ofNanohenries(double)}.
     *
     * @param value the value in nH
     * @return the quantity
     * @throws InvalidQuantityException if the value is out of the range {@link Inductance#ofNanohenries(double)} accepts
     */
    public static Inductance nH(double value) {
        return Inductance.ofNanohenries(value);
    }
}
