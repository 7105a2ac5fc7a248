/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.design;

import static io.shieldmath.shield.quantity.Quantities.cm;
import static io.shieldmath.shield.quantity.Quantities.iacs;
import static io.shieldmath.shield.quantity.Quantities.kHz;
import static io.shieldmath.shield.quantity.Quantities.mT;
import static io.shieldmath.shield.quantity.Quantities.mm;
import static io.shieldmath.shield.quantity.Quantities.nT;
import static io.shieldmath.shield.quantity.Quantities.uT;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import io.shieldmath.shield.field.ImpedanceForm;
import io.shieldmath.shield.field.IncidentField;
import io.shieldmath.shield.medium.Medium;
import io.shieldmath.shield.planar.Barrier;
import io.shieldmath.shield.planar.Layer;
import io.shieldmath.shield.quantity.Decibels;
import io.shieldmath.shield.quantity.FrequencyBand;
import org.junit.jupiter.api.Test;

/** The staged forms of the design tools give the same answers as the positional core and say what is missing. */
class StagedArgumentsTest {

    private static final Medium COPPER = Medium.conductor("copper", iacs(100), 1);
    private static final Medium ALLOY = Medium.conductor("high-µ alloy", iacs(3), 20_000);
    private static final IncidentField LOOP = IncidentField.magneticNearField(cm(6), ImpedanceForm.TEXTBOOK);
    private static final FrequencyBand BAND = FrequencyBand.of(kHz(10), kHz(100));

    @Test
    void thicknessSearchPicksTheLayerItselfNotAnIndexCountedWithGaps() {
        Layer copper = Layer.of(COPPER, mm(1));
        Barrier b = Barrier.of(Layer.of(ALLOY, mm(0.1))).thenGap(mm(2)).then(copper);
        ThicknessSolution staged = ThicknessSolver.resizing(b, copper).facing(LOOP).over(BAND)
                .toMeet(Decibels.of(60)).upTo(mm(5));
        ThicknessSolution core = ThicknessSolver.minimumThickness(b, 2, LOOP, BAND, 60, mm(5));
        assertEquals(core.thickness(), staged.thickness());
        assertEquals("the thickness search needs over(band) before upTo(limit)", assertThrows(
                IllegalStateException.class,
                () -> ThicknessSolver.resizing(b, copper).facing(LOOP).toMeet(Decibels.of(60)).upTo(mm(5)))
                .getMessage());
        Barrier twice = Barrier.of(copper, copper);
        assertThrows(IllegalArgumentException.class, () -> ThicknessSolver.resizing(twice, copper));
        assertThrows(IllegalArgumentException.class, () -> ThicknessSolver.resizing(b, Layer.of(COPPER, mm(3))));
    }

    @Test
    void twoLayerQuestionAndToleranceRunMatchTheCore() {
        Requirement need = Requirement.none().plus(BAND, uT(3), nT(200));
        Layer c = Layer.of(COPPER, mm(0.5));
        Layer m = Layer.of(ALLOY, mm(0.5));
        TwoLayerAdvice.Advice staged = TwoLayerAdvice.of(c, m).facing(LOOP).meeting(need).saturatingAt(mT(750))
                .inShellOfDiameter(cm(5));
        TwoLayerAdvice.Advice core = TwoLayerAdvice.compare(COPPER, mm(0.5), ALLOY, mm(0.5), LOOP, need, mT(750), cm(5));
        assertEquals(core.reasoning(), staged.reasoning());
        assertThrows(IllegalStateException.class, () -> TwoLayerAdvice.of(c, m).facing(LOOP).inShellOfDiameter(cm(5)));

        ToleranceStudy study = ToleranceStudy.of(Barrier.of(c), LOOP).thickness(0.05, ToleranceStudy.Spread.NORMAL);
        ToleranceResult a = study.at(kHz(20)).toMeet(Decibels.of(20)).samples(3000).seed(7).run();
        ToleranceResult b = study.run(kHz(20), 20, 3000, 7, ToleranceStudy.ProgressListener.NONE);
        assertEquals(b.percentileDb(5), a.percentileDb(5), 0);
        assertEquals(ToleranceStudy.DEFAULT_SAMPLES, study.at(kHz(20)).toMeet(Decibels.of(20)).run().samples());
    }
}
