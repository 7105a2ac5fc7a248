/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * shield-core: typed quantities, incident fields, layered barriers and the shielding
 * models. Its only runtime dependency is Apache Commons Math.
 */
module io.shieldmath.shield.core {
    // Commons Math is used inside the models only; no type of it appears in this module's API.
    requires commons.math3;

    exports io.shieldmath.shield.quantity;
    exports io.shieldmath.shield.medium;
    exports io.shieldmath.shield.model;
    exports io.shieldmath.shield.field;
    exports io.shieldmath.shield.planar;
    exports io.shieldmath.shield.design;
    exports io.shieldmath.shield.enclosure;
    exports io.shieldmath.shield.coupling;
    exports io.shieldmath.shield.bench;

    // Engine kernels, argument checks and text helpers shared by this library's own modules only.
    exports io.shieldmath.shield.internal to io.shieldmath.shield.materials, io.shieldmath.shield.axisymmetric;
}
