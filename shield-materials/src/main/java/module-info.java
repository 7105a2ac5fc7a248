/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * shield-materials: the built-in material catalogue with the provenance of every number,
 * user catalogues and design files in documented JSON formats of this library's own,
 * read with Jackson's streaming parser and validated strictly.
 */
module io.shieldmath.shield.materials {
    requires transitive io.shieldmath.shield.core;
    requires tools.jackson.databind;

    exports io.shieldmath.shield.materials;
}
