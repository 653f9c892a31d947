package org.cellwright.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * A run's warnings sorted for the caution panel: safety cautions (toxic or explosive gas, acid, a hot bath,
 * nitrogen oxides from a nitrate bath, lead, electrical hazards), which the window shows prominently, apart from notes on the chemistry and on the
 * validity of the data. The engine words each warning as "Topic: text"; the topic decides.
 *
 * @param safety the safety cautions, in the engine's order
 * @param notes the other notes, in the engine's order
 */
record CautionList(List<Caution> safety, List<Caution> notes) {

    /**
     * The topics that make a warning a safety caution (the hazards the engine checks for). A dendrite that
     * shorted the cell is an electrical hazard (the leads carry the whole current), so it is one too.
     */
    static final Set<String> SAFETY_TOPICS = Set.of("Short circuit", "Chlorine", "Hydrogen", "Acid", "Hot bath",
            "Nitrate", "Lead", "Electrical");

    /** Longest topic read before a colon (longer text before a colon is a sentence, not a topic). */
    private static final int MAX_TOPIC = 24;

    /**
     * One caution or note.
     *
     * @param topic its topic ("Chlorine"), or "" when it has none
     * @param text the rest of the sentence
     */
    record Caution(String topic, String text) {
        /** @return the full sentence as the engine wrote it */
        String full() {
            return topic.isEmpty() ? text : topic + ": " + text;
        }
    }

    CautionList {
        safety = List.copyOf(safety);
        notes = List.copyOf(notes);
    }

    /**
     * @param warnings a run's warnings ({@code RunSummary.warnings()})
     * @return them sorted into cautions and notes
     */
    static CautionList of(List<String> warnings) {
        List<Caution> safety = new ArrayList<>();
        List<Caution> notes = new ArrayList<>();
        for (String w : warnings) {
            Caution c = split(w);
            (SAFETY_TOPICS.contains(c.topic()) ? safety : notes).add(c);
        }
        return new CautionList(safety, notes);
    }

    /** @return true when there is nothing to show */
    boolean isEmpty() {
        return safety.isEmpty() && notes.isEmpty();
    }

    static Caution split(String w) {
        int colon = w.indexOf(':');
        if (colon > 0 && colon <= MAX_TOPIC) {
            return new Caution(w.substring(0, colon).strip(), w.substring(colon + 1).strip());
        }
        return new Caution("", w.strip());
    }
}
