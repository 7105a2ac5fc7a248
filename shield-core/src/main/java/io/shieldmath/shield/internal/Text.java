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

/**
 * The one text grammar of every quantity in this library, and the one formatter of
 * numbers for messages and text forms. Every quantity parser, both file readers and the
 * command-line tool read numbers through this class; every exception message and every
 * {@code toString} of the quantity, medium and materials packages writes them through it.
 *
 * <h2>The grammar</h2>
 * A quantity is a decimal number, optional spaces, and a unit symbol of its kind:
 * <pre>
 *   quantity = space* number space* unit space*
 *   number   = sign? (digits ("." digits?)? | "." digits) (("e" | "E") sign? digits)?
 *   sign     = "+" | "-" | U+2212 (minus sign)
 *   space    = U+0020 | U+0009 (tab) | U+00A0 (no-break space) | U+2009 (thin space)
 *            | U+202F (narrow no-break space)
 * </pre>
 * No other form of number is read: no inner spaces ({@code "1200 800"} is refused, not
 * read as 1200800), no thousands separators, no {@code NaN}, {@code Infinity}, hexadecimal
 * or type suffixes, no digits other than ASCII 0 to 9. A number whose decimal value is not
 * zero but which underflows to 0, or which overflows, in its unit or in SI units, is
 * refused with the text quoted.
 *
 * <p>The only non-ASCII characters accepted are the micro sign U+00B5 and the Greek small
 * mu U+03BC (both read as micro), the Greek capital omega U+03A9 and the ohm sign U+2126
 * (both read as ohm), the degree sign U+00B0, superscript two and three U+00B2 and U+00B3,
 * the middle dot U+00B7 and dot operator U+22C5, the minus sign U+2212, the white square
 * U+25A1 (in {@code Ω/□}) and the spaces above. Every other non-ASCII character (Greek
 * capital Mu, the Kelvin sign, dotless i, long s, full-width letters and digits, ...) and
 * every control character other than tab is refused by name, so a look-alike never reads
 * as the letter it resembles. One quantity's text is at most {@value #MAX_LENGTH}
 * characters; reading is one pass over the text, linear in its length.
 *
 * <h2>Units</h2>
 * A unit is matched against each symbol and alias of the kind, after folding the two micro
 * signs and the two ohm signs together. In a compound unit the separators space,
 * {@code ·}, {@code ⋅}, {@code *} and {@code .} are one separator, and may be left out
 * ({@code "µΩ cm"}, {@code "µΩ*cm"}, {@code "µΩcm"} all read as {@code µΩ·cm}) but never
 * put where the unit has none ({@code "k Hz"} and {@code "m m"} are refused).
 *
 * <p>Case matters, with one narrow exception: the letters of a unit word of two or more
 * letters ({@code Hz}, {@code Oe}, {@code sq}, {@code mil}, {@code in}, {@code gauss},
 * {@code IACS}, {@code ppm}, ...) may be written in another case when that matches exactly
 * one unit of the kind even with all case ignored. A prefix letter and a one-letter unit
 * symbol ({@code m}, {@code S}, {@code T}, {@code G}, {@code A}, {@code K}, ...) are never
 * read in another case. So {@code "10 khz"} and {@code "10 HZ"} read, but {@code "1 mhz"}
 * (mHz or MHz?), {@code "1 KHz"}, {@code "5 mS/m"} (not MS/m), {@code "1 Mm"} (not mm),
 * {@code "1 MT"} (not mT) and {@code "1 MΩ/sq"} (not mΩ/sq) are refused. Case folding is
 * ASCII only.
 *
 * <h2>Writing</h2>
 * {@link #format(double, Unit[], Unit)} writes a quantity's text form, which reads back to
 * the same double or within {@value #READ_BACK} relative of it (see there). {@link #number(double)} and {@link #show(double, Unit)} write
 * numbers for messages and descriptions, to {@value #MESSAGE_DIGITS} significant digits.
 *
 * <p>Internal: not exported; the quantity types and the file readers of this library use
 * it. Stateless and thread-safe.
 */
public final class Text {

    /** The largest number of characters in the text of one quantity. */
    public static final int MAX_LENGTH = 256;

    /** The significant digits of numbers in messages and descriptions. */
    public static final int MESSAGE_DIGITS = 6;

    /** How much of a refused text a message quotes, in characters. */
    static final int QUOTE_LENGTH = 60;

    /** The separator every compound-unit separator folds to. */
    private static final char SEP = '\u00b7';

    /** SI prefix letters (BIPM SI Brochure, 9th ed., Table 7), with u for micro. */
    private static final String PREFIXES = "qryzafpnuµmcdhkMGTPEZYRQ";

    private Text() {
    }

    // ================================================================ reading

    /**
     * Reads text such as {@code "21 mil"} into an SI value.
     *
     * @param quantity the quantity's name, for messages
     * @param text     the text, not null
     * @param units    the units of this kind, not empty
     * @return the value in SI units ({@code number × toSi() + offset()}), finite; not yet
     *         range-checked
     * @throws InvalidQuantityException if the text does not follow the grammar, has no unit
     *                                  or an unknown one, or its value under- or overflows
     * @throws NullPointerException     if {@code text} is null, naming the quantity
     */
    public static double parse(String quantity, CharSequence text, Unit[] units) {
        return parse(quantity, text, units, null);
    }

    /**
     * Reads text such as {@code "21 mil"} into an SI value, or a bare number as a value in
     * {@code bare}.
     *
     * @param quantity the quantity's name, for messages
     * @param text     the text, not null
     * @param units    the units of this kind, not empty
     * @param bare     the unit of a number written without one, or null to require a unit
     * @return the value in SI units, finite; not yet range-checked
     * @throws InvalidQuantityException if the text does not follow the grammar, has an unknown
     *                                  unit or no unit where one is required, or its value under-
     *                                  or overflows
     * @throws NullPointerException     if {@code text} is null, naming the quantity
     */
    public static double parse(String quantity, CharSequence text, Unit[] units, Unit bare) {
        String expected = "a number and a unit such as \"" + example(units) + "\"; units: " + symbols(units);
        Scan s = scan(quantity, text, expected);
        if (s.rest.isEmpty()) {
            if (bare == null) {
                throw InvalidQuantityException.unreadable(quantity, s.raw, "no unit", expected);
            }
            return toSi(quantity, s, bare, expected);
        }
        Unit unit = findUnit(s.rest, units);
        if (unit == null) {
            throw InvalidQuantityException.unreadable(quantity, s.raw, "unknown unit \"" + clip(s.rest) + "\"",
                    expected);
        }
        return toSi(quantity, s, unit, expected);
    }

    private static double toSi(String quantity, Scan s, Unit unit, String expected) {
        double si = s.value * unit.toSi() + unit.offset();
        if (!Double.isFinite(si)) {
            throw InvalidQuantityException.unreadable(quantity, s.raw, "number too large in SI units", expected);
        }
        if (si == 0 && s.value != 0 && unit.offset() == 0) {
            throw InvalidQuantityException.unreadable(quantity, s.raw, "number too small: it underflows to 0 in SI "
                    + "units", expected);
        }
        return si;
    }

    /**
     * Reads a plain real number, the whole text (spaces around it allowed), by the grammar
     * of this class.
     *
     * @param quantity the quantity's name, for messages
     * @param text     the text, not null
     * @param expected the accepted form in words, for messages, such as {@code "a number such as \"2.1\""}
     * @return the number, finite
     * @throws InvalidQuantityException if the text is not one number of this grammar, or it
     *                                  under- or overflows
     * @throws NullPointerException     if {@code text} is null, naming the quantity
     */
    public static double parseNumber(String quantity, CharSequence text, String expected) {
        String raw = nonNullText(quantity, text);
        String s = normalise(quantity, raw, expected);
        int end = numberEnd(s, 0);
        if (end != s.length()) {
            throw InvalidQuantityException.unreadable(quantity, raw, "not a decimal number", expected);
        }
        return value(quantity, raw, s, expected);
    }

    /**
     * A number read at the start of a text, and the rest of the text.
     */
    private static final class Scan {
        final String raw;
        final double value;
        /** The text after the number, spaces folded to U+0020 and stripped. */
        final String rest;

        Scan(String raw, double value, String rest) {
            this.raw = raw;
            this.value = value;
            this.rest = rest;
        }
    }

    /**
     * Checks the characters and length, then reads the number at the start. One pass, no
     * regular expression.
     */
    private static Scan scan(String quantity, CharSequence text, String expected) {
        String raw = nonNullText(quantity, text);
        String s = normalise(quantity, raw, expected);
        int end = numberEnd(s, 0);
        if (end < 0) {
            throw InvalidQuantityException.unreadable(quantity, raw, "no decimal number at the start", expected);
        }
        return new Scan(raw, value(quantity, raw, s.substring(0, end), expected), s.substring(end).strip());
    }

    private static String nonNullText(String quantity, CharSequence text) {
        if (text == null) {
            throw new NullPointerException(quantity + " text must not be null");
        }
        return text.toString();
    }

    /**
     * Refuses over-long text and undocumented characters, folds the documented spaces to
     * U+0020 and the minus sign to '-', and strips the ends.
     */
    private static String normalise(String quantity, String raw, String expected) {
        if (raw.length() > MAX_LENGTH) {
            throw InvalidQuantityException.unreadable(quantity, raw, "longer than " + MAX_LENGTH + " characters",
                    expected);
        }
        StringBuilder b = new StringBuilder(raw.length());
        for (int i = 0; i < raw.length(); i++) {
            char c = raw.charAt(i);
            if (isSpace(c)) {
                b.append(' ');
            } else if (c == '\u2212') {
                b.append('-');
            } else if (c >= 0x20 && c < 0x7f || ALLOWED.indexOf(c) >= 0) {
                b.append(c);
            } else {
                throw InvalidQuantityException.unreadable(quantity, raw, "character " + describe(raw, i)
                        + " is not accepted", expected);
            }
        }
        String s = b.toString().strip();
        if (s.isEmpty()) {
            throw InvalidQuantityException.unreadable(quantity, raw, "empty text", expected);
        }
        return s;
    }

    /**
     * The end of the number of the grammar that starts at {@code from}, or −1 if none does.
     * An exponent marker not followed by digits is not part of the number.
     */
    private static int numberEnd(String s, int from) {
        int i = from;
        int n = s.length();
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && isDigit(s.charAt(i))) {
            digits++;
            i++;
        }
        if (i < n && s.charAt(i) == '.') {
            int j = i + 1;
            while (j < n && isDigit(s.charAt(j))) {
                digits++;
                j++;
            }
            if (digits > 0) {
                i = j;
            }
        }
        if (digits == 0) {
            return -1;
        }
        if (i < n && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            int j = i + 1;
            if (j < n && (s.charAt(j) == '+' || s.charAt(j) == '-')) {
                j++;
            }
            int k = j;
            while (k < n && isDigit(s.charAt(k))) {
                k++;
            }
            if (k > j) {
                i = k;
            }
        }
        return i;
    }

    /** The value of a number of the grammar, refused if it overflows or underflows to 0. */
    private static double value(String quantity, String raw, String number, String expected) {
        double value = Double.parseDouble(number);
        if (!Double.isFinite(value)) {
            throw InvalidQuantityException.unreadable(quantity, raw, "number too large", expected);
        }
        if (value == 0) {
            int e = Math.max(number.indexOf('e'), number.indexOf('E'));
            String mantissa = e < 0 ? number : number.substring(0, e);
            for (int i = 0; i < mantissa.length(); i++) {
                char c = mantissa.charAt(i);
                if (c >= '1' && c <= '9') {
                    throw InvalidQuantityException.unreadable(quantity, raw, "number too small: it underflows to 0",
                            expected);
                }
            }
        }
        return value + 0.0;
    }

    /**
     * Reads a real number or a complex one in the form {@code "1200 - j 800"} (the spaces
     * optional, the minus sign U+2212 read as '-'): the form of a relative permeability
     * µ' − j·µ''. Only a minus sign is read before {@code j}.
     *
     * @param quantity the quantity's name, for messages
     * @param text     the text, not null
     * @param expected the accepted form in words, for messages
     * @return a new array {real, loss}; loss 0 for a real number
     * @throws InvalidQuantityException if the text is not of that form, or a number under- or
     *                                  overflows
     * @throws NullPointerException     if {@code text} is null, naming the quantity
     */
    public static double[] parseComplex(String quantity, CharSequence text, String expected) {
        String raw = nonNullText(quantity, text);
        String s = normalise(quantity, raw, expected);
        int end = numberEnd(s, 0);
        if (end < 0) {
            throw InvalidQuantityException.unreadable(quantity, raw, "not a decimal number", expected);
        }
        double real = value(quantity, raw, s.substring(0, end), expected);
        int i = skipSpaces(s, end);
        if (i == s.length()) {
            return new double[] {real, 0};
        }
        if (s.charAt(i) != '-') {
            throw InvalidQuantityException.unreadable(quantity, raw, "not a decimal number", expected);
        }
        i = skipSpaces(s, i + 1);
        if (i == s.length() || s.charAt(i) != 'j') {
            throw InvalidQuantityException.unreadable(quantity, raw, "no \"j\" after the minus sign", expected);
        }
        int start = skipSpaces(s, i + 1);
        int stop = numberEnd(s, start);
        if (stop < 0 || stop != s.length()) {
            throw InvalidQuantityException.unreadable(quantity, raw, "no decimal number after \"j\"", expected);
        }
        return new double[] {real, value(quantity, raw, s.substring(start, stop), expected)};
    }

    private static int skipSpaces(String s, int i) {
        while (i < s.length() && s.charAt(i) == ' ') {
            i++;
        }
        return i;
    }

    /** The documented non-ASCII characters other than spaces and the minus sign. */
    private static final String ALLOWED = "\u00b5\u03bc\u03a9\u2126\u00b0\u00b2\u00b3\u00b7\u22c5\u25a1";

    private static boolean isSpace(char c) {
        return c == ' ' || c == '\t' || c == '\u00a0' || c == '\u2009' || c == '\u202f';
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static String describe(String raw, int i) {
        int cp = raw.codePointAt(i);
        String hex = String.format(java.util.Locale.ROOT, "U+%04X", cp);
        String name = Character.getName(cp);
        return hex + (name == null ? "" : " (" + name.toLowerCase(java.util.Locale.ROOT) + ")");
    }

    /**
     * Finds the unit written as {@code unitText} by the rules of this class: an exact match
     * after folding the micro and ohm signs and the separators, else a match that changes
     * the case of unit-word letters only and is unique among the units even with all case
     * ignored.
     *
     * @param unitText the unit as written, spaces already folded to U+0020
     * @param units    the units of this kind
     * @return the unit, or null if none matches or the match would be ambiguous
     */
    public static Unit findUnit(String unitText, Unit[] units) {
        String key = canonical(unitText);
        List<Spelling> spellings = spellings(units);
        for (Spelling sp : spellings) {
            if (sp.matchesExactly(key)) {
                return sp.unit;
            }
        }
        Unit loose = null;
        for (Spelling sp : spellings) {
            if (sp.matchesIgnoringCase(key)) {
                if (loose != null && loose != sp.unit) {
                    return null;
                }
                loose = sp.unit;
            }
        }
        if (loose == null) {
            return null;
        }
        for (Spelling sp : spellings) {
            if (sp.unit == loose && sp.matchesCaseFree(key)) {
                return loose;
            }
        }
        return null;
    }

    /** One spelling of a unit, canonical, with the positions whose case may differ. */
    private static final class Spelling {
        final Unit unit;
        final String text;
        final boolean[] free;
        final String joined;
        final boolean[] joinedFree;

        Spelling(Unit unit, String text, boolean[] free) {
            this.unit = unit;
            this.text = text;
            this.free = free;
            StringBuilder b = new StringBuilder();
            boolean[] f = new boolean[text.length()];
            int n = 0;
            for (int i = 0; i < text.length(); i++) {
                if (text.charAt(i) != SEP) {
                    b.append(text.charAt(i));
                    f[n++] = free[i];
                }
            }
            this.joined = b.toString();
            this.joinedFree = java.util.Arrays.copyOf(f, n);
        }

        boolean matchesExactly(String key) {
            return key.equals(text) || key.equals(joined);
        }

        boolean matchesIgnoringCase(String key) {
            return asciiEqualsIgnoreCase(key, text, null) || asciiEqualsIgnoreCase(key, joined, null);
        }

        boolean matchesCaseFree(String key) {
            return asciiEqualsIgnoreCase(key, text, free) || asciiEqualsIgnoreCase(key, joined, joinedFree);
        }
    }

    /** Equal, ignoring ASCII case at the positions marked free (everywhere if {@code free} is null). */
    private static boolean asciiEqualsIgnoreCase(String key, String spelling, boolean[] free) {
        if (key.length() != spelling.length()) {
            return false;
        }
        for (int i = 0; i < key.length(); i++) {
            char a = key.charAt(i);
            char b = spelling.charAt(i);
            if (a == b) {
                continue;
            }
            boolean foldable = isAsciiLetter(a) && isAsciiLetter(b) && (a | 0x20) == (b | 0x20);
            if (!foldable || free != null && !free[i]) {
                return false;
            }
        }
        return true;
    }

    private static boolean isAsciiLetter(char c) {
        return c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z';
    }

    private static List<Spelling> spellings(Unit[] units) {
        List<String> all = new ArrayList<>();
        for (Unit u : units) {
            all.add(canonical(u.symbol()));
            for (String a : u.aliases()) {
                all.add(canonical(a));
            }
        }
        List<Spelling> list = new ArrayList<>();
        for (Unit u : units) {
            list.add(spelling(u, u.symbol(), all));
            for (String a : u.aliases()) {
                list.add(spelling(u, a, all));
            }
        }
        return list;
    }

    /**
     * Marks which letters of a spelling may be read in another case: the letters of runs of
     * two or more ASCII letters, except a leading SI prefix (a first letter that is a prefix
     * in front of another spelling of the kind) and except a run of exactly two letters that
     * starts with a prefix letter (a prefix and a one-letter unit, such as {@code cm}).
     */
    private static Spelling spelling(Unit u, String raw, List<String> all) {
        String s = canonical(raw);
        boolean[] free = new boolean[s.length()];
        boolean prefixed = s.length() > 1 && PREFIXES.indexOf(s.charAt(0)) >= 0 && all.contains(s.substring(1));
        int i = 0;
        while (i < s.length()) {
            if (!isAsciiLetter(s.charAt(i))) {
                i++;
                continue;
            }
            int start = i;
            while (i < s.length() && isAsciiLetter(s.charAt(i))) {
                i++;
            }
            int from = start == 0 && prefixed ? 1 : start;
            int len = i - from;
            boolean prefixAndLetter = len == 2 && PREFIXES.indexOf(s.charAt(from)) >= 0;
            if (len >= 2 && !prefixAndLetter) {
                for (int k = from; k < i; k++) {
                    free[k] = true;
                }
            }
        }
        return new Spelling(u, s, free);
    }

    /** Folds the spellings of one unit symbol together: micro signs, ohm signs, separators. */
    private static String canonical(String unit) {
        StringBuilder b = new StringBuilder(unit.length());
        boolean sep = false;
        for (int i = 0; i < unit.length(); i++) {
            char c = unit.charAt(i);
            switch (c) {
                case ' ', '\u00b7', '\u22c5', '*', '.' -> sep = true;
                default -> {
                    if (sep) {
                        b.append(SEP);
                    }
                    sep = false;
                    b.append(c == '\u03bc' ? '\u00b5' : c == '\u2126' ? '\u03a9' : c);
                }
            }
        }
        if (sep) {
            b.append(SEP);
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

    // ================================================================ writing

    /**
     * Writes a quantity's text form: the value in the display unit that puts it between 1
     * and 1000 where one does, with the fewest significant digits, at most
     * {@value #FORM_DIGITS}, that read back by {@link #parse(String, CharSequence, Unit[])}
     * to exactly {@code si}, or else rounded to {@value #FORM_DIGITS} significant digits.
     *
     * <p>Read-back bound: the text reads back to exactly {@code si} whenever some decimal of
     * at most {@value #FORM_DIGITS} digits in the chosen unit does (every value made from
     * such a decimal in a display unit, such as {@code Length.ofMillimetres(2.5)}), and
     * always within {@value #READ_BACK} relative: rounding to 15 digits errs by at most
     * 5e-15 relative, the conversion to and from the unit by two more roundings of 1.1e-16.
     * A length made in mils and shown in µm is such a case: 21 mil prints as
     * {@code "533.4 µm"}, which reads back 1 ulp away.
     *
     * @param si      the value in SI units
     * @param display the display units, smallest first; must include the SI unit
     * @param siUnit  the SI unit (factor 1, offset 0)
     * @return the text form; {@code "NaN m"} style for non-finite values, which no
     *         quantity holds
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
        if (si == 0 || display.length == 1) {
            chosen = display.length == 1 ? display[0] : siUnit;
        }
        return roundTrip(si, chosen) + " " + chosen.symbol();
    }

    /** The significant digits of a quantity's text form, at most. */
    public static final int FORM_DIGITS = 15;

    /** The relative bound within which a quantity's text form always reads back. */
    public static final double READ_BACK = 1e-14;

    /** The shortest decimal in {@code unit} of at most 15 digits that reads back to {@code si}, else 15 digits. */
    private static String roundTrip(double si, Unit unit) {
        double q = (si - unit.offset()) / unit.toSi();
        if (q == 0) {
            return "0";
        }
        BigDecimal exact = new BigDecimal(q);
        for (int digits = 1; digits <= FORM_DIGITS; digits++) {
            String s = plain(exact.round(new MathContext(digits)));
            if (Double.parseDouble(s) * unit.toSi() + unit.offset() == si) {
                return s;
            }
        }
        return plain(exact.round(new MathContext(FORM_DIGITS)));
    }

    /**
     * The shortest decimal text of a finite double that reads back to exactly that double
     * (plain between 1e-4 and 1e16, else {@code 1.5e-7}), for text forms that must read
     * back, such as a relative permeability.
     *
     * @param v the value, finite
     * @return the text; {@code "NaN"} or {@code "Infinity"} for those values
     */
    public static String exact(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v);
        for (int digits = 1; digits <= 17; digits++) {
            String s = plain(d.round(new MathContext(digits)));
            if (Double.parseDouble(s) == v) {
                return s;
            }
        }
        return plain(new BigDecimal(Double.toString(v)));
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
     * A number for messages and descriptions, rounded to {@value #MESSAGE_DIGITS}
     * significant digits, without locale: plain from 1e-4 to below 1e12 ({@code "0.0001"},
     * {@code "25000"}, {@code "-1000000"}), else with an exponent ({@code "1.5e-7"},
     * {@code "1e300"}); negative zero prints as {@code "0"}.
     *
     * @param v the value
     * @return the text; {@code "NaN"}, {@code "Infinity"} or {@code "-Infinity"} for those values
     */
    public static String number(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal t = new BigDecimal(v).round(new MathContext(MESSAGE_DIGITS)).stripTrailingZeros();
        int exponent = t.precision() - t.scale() - 1;
        if (exponent >= -4 && exponent < 12) {
            return t.toPlainString();
        }
        String digits = t.unscaledValue().abs().toString();
        String mantissa = digits.length() == 1 ? digits : digits.charAt(0) + "." + digits.substring(1);
        return (t.signum() < 0 ? "-" : "") + mantissa + "e" + exponent;
    }

    /**
     * An SI value with its unit for messages, such as {@code "0.0001 m"} or
     * {@code "25.4 µm"}: {@link #number(double)} of the value expressed in {@code unit}.
     *
     * @param si   the value in SI units
     * @param unit the unit to show it in, not null
     * @return the text
     */
    public static String show(double si, Unit unit) {
        return number((si - unit.offset()) / unit.toSi()) + " " + unit.symbol();
    }

    /**
     * An SI value for messages in the unit of {@code display} that puts it between 1 and
     * 1000 where one does, such as {@code "1 kHz"} or {@code "2.07427 mm"}, to
     * {@value #MESSAGE_DIGITS} significant digits.
     *
     * @param si      the value in SI units
     * @param display the units to choose from, smallest first, not empty
     * @return the text
     */
    public static String show(double si, Unit[] display) {
        Unit chosen = display[0];
        double mag = Math.abs(si);
        for (Unit u : display) {
            if (u.offset() == 0 && mag >= u.toSi() * (1 - 5e-7)) {
                chosen = u;
            }
        }
        if (si == 0 || !Double.isFinite(si)) {
            for (Unit u : display) {
                if (u.toSi() == 1 && u.offset() == 0) {
                    chosen = u;
                }
            }
        }
        return show(si, chosen);
    }

    /**
     * A value already in {@code unit} with that unit's text, for messages, such as
     * {@code "3 kHz"} or {@code "25000 (relative)"}.
     *
     * @param value the value in {@code unit}
     * @param unit  the unit's text, not null
     * @return the text
     */
    public static String show(double value, String unit) {
        return number(value) + " " + unit;
    }

    /**
     * A text a user gave, made safe to echo in a message: control and other unprintable
     * characters written as {@code \}{@code uXXXX}, and cut to {@value #QUOTE_LENGTH}
     * characters with {@code "…"} and the full length after it.
     *
     * @param text the text, not null
     * @return the text to put between quotes in a message
     */
    public static String clip(CharSequence text) {
        String s = text.toString();
        int n = Math.min(s.length(), QUOTE_LENGTH);
        StringBuilder b = new StringBuilder(n + 24);
        for (int i = 0; i < n; i++) {
            char c = s.charAt(i);
            if (Character.isISOControl(c) || c == '\u2028' || c == '\u2029' || Character.isSurrogate(c)
                    && !(Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1)))
                    && !(Character.isLowSurrogate(c) && i > 0 && Character.isHighSurrogate(s.charAt(i - 1)))) {
                b.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) c));
            } else {
                b.append(c);
            }
        }
        if (s.length() > QUOTE_LENGTH) {
            b.append("… (").append(s.length()).append(" characters)");
        }
        return b.toString();
    }
}
