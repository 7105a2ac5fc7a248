/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * shield-axisymmetric: finite shields of revolution (discs, annular plates, tubes, caps and
 * cans) between coaxial coils or in a uniform field along or across the axis, solved by axisymmetric finite
 * elements. The numerics live in a package that is not exported. The package {@code files}
 * reads and writes whole designs of every kind (planar, shell, axisymmetric) in one file.
 */
module io.shieldmath.shield.axisymmetric {
    requires transitive io.shieldmath.shield.core;
    // Whole-design files name catalogue materials and planar/shell designs in their API.
    requires transitive io.shieldmath.shield.materials;
    requires tools.jackson.databind;

    exports io.shieldmath.shield.axisymmetric;
    exports io.shieldmath.shield.axisymmetric.files;

    // The solver's progress hook (each mesh built), for this library's own command line only.
    exports io.shieldmath.shield.axisymmetric.internal to io.shieldmath.shield.cli;
}
