/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import io.shieldmath.shield.model.ValidityNote;
import java.io.PrintStream;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The distinct validity notes of a run ({@link io.shieldmath.shield.model.ShieldingResult#validityNotes()}),
 * with the frequencies where each applied, for one summary on standard error at the end.
 *
 * <p>A note's message carries numbers of its own frequency (the frequency itself, kr, |K| or
 * k0·L), so equal messages are rare and notes are grouped by their limit instead: the n-th
 * note of one limit in a result (a result holds several of one limit only for different
 * openings of an enclosure, always in the order of its openings) joins the n-th group of that
 * limit. Each group keeps the lowest and highest frequency where it applied, how many
 * frequencies it applied at, and the message at its lowest frequency, and says when the
 * messages at other frequencies differed (their numbers then are those of that frequency).
 *
 * <p>Memory is bounded by the number of limits and openings, not by the number of frequencies,
 * so a co-process may run for millions of lines. Not thread-safe; one per run.
 */
final class NoteSummary {

    /** The groups of each limit, in the order of their first appearance within a result. */
    private final Map<ValidityNote.Limit, List<Group>> groups = new EnumMap<>(ValidityNote.Limit.class);
    /** The groups in the order they first appeared in the run. */
    private final List<Group> order = new ArrayList<>();
    private long frequencies;

    /** One distinct note and where it applied. */
    private static final class Group {
        final ValidityNote.Limit limit;
        String message;
        boolean differed;
        double lowHz;
        double highHz;
        long count;

        Group(ValidityNote.Limit limit, String message, double hz) {
            this.limit = limit;
            this.message = message;
            this.lowHz = hz;
            this.highHz = hz;
        }
    }

    /**
     * Records the notes of the result at one frequency (also when there are none, to count the
     * frequencies evaluated).
     *
     * @param hz    the frequency, Hz
     * @param notes the result's notes
     */
    void add(double hz, List<ValidityNote> notes) {
        frequencies++;
        Map<ValidityNote.Limit, Integer> seen = new EnumMap<>(ValidityNote.Limit.class);
        for (ValidityNote n : notes) {
            int index = seen.merge(n.limit(), 1, Integer::sum) - 1;
            List<Group> of = groups.computeIfAbsent(n.limit(), l -> new ArrayList<>(1));
            if (index == of.size()) {
                Group g = new Group(n.limit(), n.message(), hz);
                of.add(g);
                order.add(g);
            }
            Group g = of.get(index);
            if (!g.message.equals(n.message())) {
                g.differed = true;
            }
            if (hz < g.lowHz) {
                g.lowHz = hz;
                g.message = n.message();
            }
            g.highHz = Math.max(g.highHz, hz);
            g.count++;
        }
    }

    /** Whether any result had a note. */
    boolean isEmpty() {
        return order.isEmpty();
    }

    /**
     * The summary lines, one per distinct note, without the command's name, such as
     * {@code validity note NOT_NEAR_FIELD at 2 of 4 frequencies, from 1.0e8 Hz to 1.0e9 Hz: kr = ...};
     * empty when no result had a note.
     */
    List<String> lines() {
        List<String> out = new ArrayList<>(order.size());
        for (Group g : order) {
            String where = g.lowHz == g.highHz ? "at " + ResultOutput.shortest(g.lowHz) + " Hz"
                    : "from " + ResultOutput.shortest(g.lowHz) + " Hz to " + ResultOutput.shortest(g.highHz) + " Hz";
            out.add("validity note " + g.limit + " at " + g.count + " of " + frequencies
                    + (frequencies == 1 ? " frequency, " : " frequencies, ") + where + ": " + g.message
                    + (g.differed ? " (as at " + ResultOutput.shortest(g.lowHz) + " Hz; its numbers change with the "
                    + "frequency)" : ""));
        }
        return out;
    }

    /** Writes {@link #lines()} to standard error, each after the command's name, made safe for a terminal. */
    void report(PrintStream err) {
        for (String line : lines()) {
            err.println(BatchCommand.NAME + ": " + Messages.clean(line));
        }
        err.flush();
    }
}
