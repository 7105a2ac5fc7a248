/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.axisymmetric;

/**
 * One end of a can along the common axis. In an arrangement between coils the lower end
 * faces the transmitter (which sits at negative z) and the upper end faces the receiver.
 */
public enum CanEnd {
    /** The end at the smaller axial coordinate. */
    LOWER,
    /** The end at the larger axial coordinate. */
    UPPER
}
