/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * shield-materials: the built-in material catalogue with the provenance of every number
 * ({@code io.shieldmath.shield.materials}), and the documented JSON formats of this
 * library's own for catalogues and designs ({@code io.shieldmath.shield.materials.files}),
 * read with Jackson's streaming parser and validated strictly.
 */
module io.shieldmath.shield.materials {
    requires transitive io.shieldmath.shield.core;
    requires tools.jackson.databind;

    exports io.shieldmath.shield.materials;
    exports io.shieldmath.shield.materials.files;

    // The located JSON reader and shared format parts, for this library's own whole-design files only.
    exports io.shieldmath.shield.materials.internal to io.shieldmath.shield.axisymmetric;
}
