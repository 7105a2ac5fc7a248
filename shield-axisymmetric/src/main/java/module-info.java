/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * shield-axisymmetric: finite shields of revolution (discs, annular plates, tubes, caps and
 * cans) between coaxial coils or in a uniform axial field, solved by axisymmetric finite
 * elements. The numerics live in a package that is not exported.
 */
module io.shieldmath.shield.axisymmetric {
    requires transitive io.shieldmath.shield.core;

    exports io.shieldmath.shield.axisymmetric;
}
