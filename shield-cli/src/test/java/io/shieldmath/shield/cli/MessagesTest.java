/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** What reaches standard error (issue 15, item 15): escaped, on one line, and short. */
class MessagesTest {

    @Test
    void terminalControlsAreEscaped() {
        assertEquals("red \\u001B[31m bell \\u0007 del \\u007F csi \\u009B", Messages.clean(
                "red \u001b[31m bell \u0007 del \u007f csi \u009b"));
        assertEquals("a\\nshield-batch: forged\\r\\t", Messages.clean("a\nshield-batch: forged\r\t"));
        // Bidirectional override, zero-width space, byte-order mark, line separator, lone surrogate.
        assertEquals("\\u202Eabc \\u200B \\uFEFF \\u2028 \\uD800x", Messages.clean("\u202eabc \u200b \ufeff \u2028 \ud800x"));
        // A format character outside the basic plane is escaped as its surrogate pair.
        assertEquals("\\uDB40\\uDC01", Messages.clean("\udb40\udc01"));
    }

    @Test
    void ordinaryTextIsLeftAlone() {
        String s = "thickness: 0.5 µm, σ 58 MS/m, 10 Ω/sq, 20 °C, é, \ud83d\ude00, back\\slash";
        assertEquals(s, Messages.clean(s));
    }

    @Test
    void echoesAreShortenedWithTheirLength() {
        String eighty = "x".repeat(Messages.ECHO_LIMIT);
        assertEquals(eighty, Messages.abbreviate(eighty));
        assertEquals("x".repeat(40) + "... (81 characters)", Messages.abbreviate(eighty + "x"));
        // Code points, not chars: a pair at the cut is kept whole.
        String emoji = "\ud83d\ude00".repeat(100);
        assertEquals("\ud83d\ude00".repeat(40) + "... (100 characters)", Messages.abbreviate(emoji));
        // Shortening is idempotent, so an echo inside a message is not shortened twice.
        String once = Messages.abbreviate("y".repeat(10_000_000));
        assertEquals(once, Messages.abbreviate(once));
        assertEquals("\"" + once + "\"", Messages.clean(Messages.quote("y".repeat(10_000_000))));
    }

    @Test
    void quotedInputInLibraryMessagesIsShortened() {
        String refused = "7".repeat(5000) + " kHz";
        String m = Messages.clean("frequency: cannot read \"" + refused + "\" (bad); expected \"10 kHz\"");
        assertEquals("frequency: cannot read \"" + "7".repeat(40) + "... (5004 characters)\" (bad); expected \"10 kHz\"",
                m);
    }

    @Test
    void longDigitRunsAndLongMessagesAreCut() {
        String big = "1" + "0".repeat(300);
        String m = Messages.clean("target: " + big + " dB is out of range");
        assertEquals("target: 10000000000000000000... (301 digits) dB is out of range", m);
        String forty = "9".repeat(Messages.DIGIT_RUN_LIMIT);
        assertEquals(forty, Messages.clean(forty));
        String huge = "word ".repeat(2000);
        String cut = Messages.clean(huge);
        assertTrue(cut.endsWith("... (" + (huge.length() - Messages.MESSAGE_LIMIT) + " more characters)"), cut);
        assertTrue(cut.length() < Messages.MESSAGE_LIMIT + 40, cut);
        assertFalse(Messages.clean(null).isEmpty());
    }

    @Test
    void longFileNamesKeepBothEnds() {
        String name = "/data/" + "d".repeat(300) + "/design.json";
        String shown = Messages.fileName(name);
        assertTrue(shown.startsWith("/data/ddd"), shown);
        assertTrue(shown.endsWith("ddd/design.json (" + name.length() + " characters)"), shown);
        assertEquals("short.json", Messages.fileName("short.json"));
    }
}
