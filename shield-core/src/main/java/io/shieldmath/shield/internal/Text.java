/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.internal;

import io.shieldmath.shield.quantity.InvalidQuantityException;
import io.shieldmath.shield.quantity.Unit;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The one text form of every quantity: a decimal number, optional white space, a unit
 * symbol. Reading is lenient about the spellings engineers type (both micro signs, the
 * ohm sign, non-breaking and thin spaces, a Unicode minus, {@code u} for micro, a middle
 * dot or none in compound units); writing is one engineering form that reads back to
 * the same double.
 *
 * <p>Internal: not exported; the quantity types and the file readers of this library use it.
 */
public final class Text {

    private static final Pattern NUMBER =
            Pattern.compile("([+-]?(?:[0-9]+(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?)(.*)");

    private Text() {
    }

    /**
     * Reads text such as {@code "21 mil"} into an SI value.
     *
     * @param quantity the quantity's name, for messages
     * @param text     the text
     * @param units    the units of this kind
     * @return the value in SI units (not yet range-checked)
     */
    public static double parse(String quantity, CharSequence text, Unit[] units) {
        if (text == null) {
            throw new NullPointerException(quantity + " text must not be null");
        }
        String raw = text.toString();
        String s = normalizeSpaces(raw).strip();
        String expected = "a number and a unit such as \"" + example(units) + "\"; units: " + symbols(units);
        if (s.isEmpty()) {
            throw InvalidQuantityException.unreadable(quantity, raw, "empty text", expected);
        }
        Matcher m = NUMBER.matcher(s.replace('\u2212', '-'));
        if (!m.matches()) {
            throw InvalidQuantityException.unreadable(quantity, raw, "no decimal number at the start", expected);
        }
        double number;
        try {
            number = Double.parseDouble(m.group(1));
        } catch (NumberFormatException e) {
            throw InvalidQuantityException.unreadable(quantity, raw, "not a decimal number", expected);
        }
        String unitText = m.group(2).strip();
        if (unitText.isEmpty()) {
            throw InvalidQuantityException.unreadable(quantity, raw, "no unit", expected);
        }
        Unit unit = findUnit(unitText, units);
        if (unit == null) {
            throw InvalidQuantityException.unreadable(quantity, raw, "unknown unit \"" + unitText + "\"", expected);
        }
        if (!Double.isFinite(number)) {
            throw InvalidQuantityException.unreadable(quantity, raw, "number too large", expected);
        }
        return number * unit.toSi();
    }

    /**
     * Finds the unit written as {@code unitText}: exact match first, then a match that
     * ignores case where that is unambiguous.
     *
     * @param unitText the unit as written
     * @param units    the units of this kind
     * @return the unit, or null if none or more than one matches
     */
    public static Unit findUnit(String unitText, Unit[] units) {
        String key = canonical(unitText);
        for (Unit u : units) {
            if (canonical(u.symbol()).equals(key)) {
                return u;
            }
            for (String alias : u.aliases()) {
                if (canonical(alias).equals(key)) {
                    return u;
                }
            }
        }
        Unit found = null;
        for (Unit u : units) {
            boolean hit = canonical(u.symbol()).equalsIgnoreCase(key);
            for (String alias : u.aliases()) {
                hit |= canonical(alias).equalsIgnoreCase(key);
            }
            if (hit) {
                if (found != null && found != u) {
                    return null;
                }
                found = u;
            }
        }
        return found;
    }

    private static String normalizeSpaces(String s) {
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            b.append(Character.isSpaceChar(c) || Character.isWhitespace(c) ? ' ' : c);
        }
        return b.toString();
    }

    /** Folds the spellings of one unit symbol together. */
    private static String canonical(String unit) {
        StringBuilder b = new StringBuilder(unit.length());
        for (int i = 0; i < unit.length(); i++) {
            char c = unit.charAt(i);
            switch (c) {
                case ' ', '\u00b7', '\u22c5', '*', '.' -> { }
                case '\u03bc' -> b.append('\u00b5');
                case '\u2126' -> b.append('\u03a9');
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    private static String symbols(Unit[] units) {
        List<String> list = new ArrayList<>();
        for (Unit u : units) {
            list.add(u.symbol());
        }
        return String.join(", ", list);
    }

    private static String example(Unit[] units) {
        return "10 " + units[0].symbol();
    }

    /**
     * Writes an SI value in the display unit that puts it between 1 and 1000 where one
     * does, with the fewest digits (at most 12 significant) that read back to the same
     * double, or else rounded to 12 significant digits.
     *
     * @param si      the value in SI units
     * @param display the display units, smallest first; must include the SI unit
     * @param siUnit  the SI unit
     * @return the text form
     */
    public static String format(double si, Unit[] display, Unit siUnit) {
        if (!Double.isFinite(si)) {
            return si + " " + siUnit.symbol();
        }
        Unit chosen = display[0];
        double mag = Math.abs(si);
        for (Unit u : display) {
            if (mag >= u.toSi() * (1 - 1e-12)) {
                chosen = u;
            }
        }
        if (si == 0) {
            chosen = siUnit;
        }
        return roundTrip(si, chosen) + " " + chosen.symbol();
    }

    private static String roundTrip(double si, Unit unit) {
        double q = si / unit.toSi();
        for (int digits = 1; digits <= 12; digits++) {
            String s = plain(new BigDecimal(q).round(new MathContext(digits)));
            if (Double.parseDouble(s) * unit.toSi() == si) {
                return s;
            }
        }
        // No short form reads back exactly (unit factors such as mil are not binary
        // fractions): print 12 significant digits, which reads back within 1e-12.
        return plain(new BigDecimal(q).round(new MathContext(12)));
    }

    private static String plain(BigDecimal d) {
        BigDecimal t = d.stripTrailingZeros();
        int exponent = t.precision() - t.scale() - 1;
        if (exponent >= -4 && exponent < 16) {
            return t.toPlainString();
        }
        return t.toString().replace("E+", "e").replace('E', 'e');
    }

    /**
     * A plain rendering of a double for messages: shortest form, no locale.
     *
     * @param v the value
     * @return the text
     */
    public static String number(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return String.format(Locale.ROOT, "%d", (long) v);
        }
        return Double.toString(v);
    }
}
