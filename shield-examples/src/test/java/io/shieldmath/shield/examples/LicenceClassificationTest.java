/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.examples;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import io.shieldmath.shield.examples.PomLicences.Component;
import io.shieldmath.shield.examples.PomLicences.Licence;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The GPL/AGPL test of {@link PomLicences} on licence names and addresses as POMs write them.
 * The licence names and their short identifiers are those of the SPDX License List
 * (spdx.org/licenses); the addresses are those of the licence texts published by the Free
 * Software Foundation (gnu.org/licenses) and the Apache Software Foundation.
 */
class LicenceClassificationTest {

    static Licence l(String name, String url) {
        return new Licence(name, url);
    }

    @Test
    void gplAndAgplInTheirUsualSpellingsAreCaught() {
        assertTrue(PomLicences.isGplFamily(l("GNU General Public License v3.0", "")));
        assertTrue(PomLicences.isGplFamily(l("GNU General Public Licence", "")));
        assertTrue(PomLicences.isGplFamily(l("GPL-3.0-only", "")));
        assertTrue(PomLicences.isGplFamily(l("GPLv2", "")));
        assertTrue(PomLicences.isGplFamily(l("GPL2 w/ CPE", "")));
        assertTrue(PomLicences.isGplFamily(l("GNU Affero General Public License v3.0", "")));
        assertTrue(PomLicences.isGplFamily(l("AGPL-3.0-or-later", "")));
        // Named only by its address.
        assertTrue(PomLicences.isGplFamily(l("", "https://www.gnu.org/licenses/gpl-3.0.html")));
        assertTrue(PomLicences.isGplFamily(l("", "https://www.gnu.org/licenses/agpl-3.0.txt")));
        assertTrue(PomLicences.isGplFamily(l("", "http://www.gnu.org/copyleft/gpl.html")));
    }

    @Test
    void lgplAndPermissiveLicencesPass() {
        assertFalse(PomLicences.isGplFamily(l("GNU Lesser General Public Licence", "http://www.gnu.org/licenses/lgpl.txt")));
        assertFalse(PomLicences.isGplFamily(l("LGPL-2.1-or-later", "")));
        assertFalse(PomLicences.isGplFamily(l("GNU Library General Public License v2", "")));
        assertFalse(PomLicences.isGplFamily(l("Apache License, Version 2.0", "https://www.apache.org/licenses/LICENSE-2.0.txt")));
        assertFalse(PomLicences.isGplFamily(l("The Apache Software License, Version 2.0", "")));
        assertFalse(PomLicences.isGplFamily(l("MIT License", "https://opensource.org/licenses/MIT")));
        assertFalse(PomLicences.isGplFamily(l("Eclipse Public License v2.0", "https://www.eclipse.org/legal/epl-2.0/")));
        assertFalse(PomLicences.isGplFamily(l("BSD-3-Clause", "")));
    }

    @Test
    void aChoiceWithOneNonGplLicenceIsTakenUnderThatOne() {
        Licence epl = l("Eclipse Public License v. 2.0", "https://www.eclipse.org/org/documents/epl-2.0/EPL-2.0.txt");
        Licence gplCpe = l("GNU General Public License, version 2 with the GNU Classpath Exception",
                "https://www.gnu.org/software/classpath/license.html");
        assertFalse(PomLicences.onlyGplFamily(new Component("g", "a", "1", List.of(epl, gplCpe))));
        assertTrue(PomLicences.onlyGplFamily(new Component("g", "a", "1", List.of(gplCpe))));
        assertTrue(PomLicences.onlyGplFamily(new Component("g", "a", "1",
                List.of(l("GPL-3.0-only", ""), l("AGPL-3.0-only", "")))));
    }
}
