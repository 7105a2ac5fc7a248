/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */

/**
 * Named materials with provenance and the built-in
 * {@link io.shieldmath.shield.materials.Catalogue}. The JSON files for catalogues and designs
 * are in {@code io.shieldmath.shield.materials.files}.
 *
 * <pre>{@code
 * Catalogue cat = Catalogue.builtIn();
 * Material mu = cat.get("nickel-iron-80");
 * Barrier b = Barrier.of(cat.get("copper-annealed"), mm(0.3)).thenGap(mm(2)).then(mu, mm(0.5));
 * Catalogue ours = CatalogueFile.read(Path.of("our-alloys.json"));
 * }</pre>
 *
 * <p>Every value in the built-in catalogue is a typical handbook value, not a guarantee:
 * properties vary with alloy, temper, heat treatment, temperature, field strength and
 * mechanical stress. Each number carries its source, or the words "from memory" with the
 * source it should be checked against. Results computed from them are estimates for
 * idealised geometry and must be verified by measurement; for mains, medical,
 * life-safety or regulatory work, follow the applicable local codes and licensed,
 * qualified practice.
 */
package io.shieldmath.shield.materials;
