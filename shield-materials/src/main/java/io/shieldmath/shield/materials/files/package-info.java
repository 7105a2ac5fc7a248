/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * The file formats of this library's own: catalogue files ({@link
 * io.shieldmath.shield.materials.files.CatalogueFile}) and design files ({@link
 * io.shieldmath.shield.materials.files.DesignFile}, holding a {@link
 * io.shieldmath.shield.materials.files.Design}), both JSON, read with Jackson's streaming
 * parser into a tree that keeps each value's JSON path, line and column, so that every
 * refusal ({@link io.shieldmath.shield.materials.files.MaterialFileException}) says where it
 * is. Nothing is bound by reflection and no type is taken from a document.
 *
 * <pre>{@code
 * Catalogue cat = Catalogue.builtIn().extendedWith(CatalogueFile.read(Path.of("our-alloys.json")));
 * Design d = DesignFile.read(Path.of("study.json"), cat);
 * Sweep<PlanarResult> s = d.sweep();
 * }</pre>
 *
 * <p>Limits: a document is at most 4 000 000 characters, counted after decoding for
 * strings, streams and files alike (UTF-8, UTF-16 or UTF-32, detected); one quantity's text
 * at most 256 characters; nesting 32 levels; 10 000 materials; 1000 permeability table
 * points. Columns count characters from 1, the same for a string and a file.
 */
package io.shieldmath.shield.materials.files;
