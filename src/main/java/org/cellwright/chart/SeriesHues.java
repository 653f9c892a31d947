package org.cellwright.chart;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;

/**
 * Which palette slot ({@link ChartStyle#series(int)}, {@link ChartStyle#seriesStroke(int)}) each species or
 * metal of a chart gets, keyed by its name, so that a species keeps its colour from run to run, in a pinned
 * run, in the anolyte and in every export.
 *
 * <p>Each species of the library has a hue it prefers (our own choice): hydrogen ion vermillion, the main
 * anions green, hydroxide graphite, the metal ions blue, their other oxidation state sky, ferrous olive,
 * ferric pink, lead, aluminium, the alkali ions and dissolved chlorine plum. A metal takes the hue of its
 * ion (Sn of Sn2+, Cu of Cu2+). The species of one chart claim their hues in a fixed order (the order of
 * {@link #PREFERRED}, then others by name), so two species that prefer the same hue (Cu2+ in a tin bath) never
 * share it: the later one takes the first hue still free. Beyond the eight hues a slot repeats a hue with
 * another stroke. The shipped baths (tin chloride with iron, copper sulfate with iron, silver nitrate, zinc
 * sulfate) all get eight different hues and every species its preferred one.
 */
public final class SeriesHues {

    private static final int BLUE = 0;
    private static final int VERMILLION = 1;
    private static final int GREEN = 2;
    private static final int PINK = 3;
    private static final int OLIVE = 4;
    private static final int SKY = 5;
    private static final int PLUM = 6;
    private static final int GRAPHITE = 7;
    private static final int HUES = 8;

    /** Preferred hue of each library species and metal. */
    static final Map<String, Integer> PREFERRED;
    /** The order in which the names of {@link #PREFERRED} claim their hue. */
    private static final List<String> CLAIM_ORDER;

    static {
        Map<String, Integer> m = preferred();
        PREFERRED = java.util.Collections.unmodifiableMap(m);
        CLAIM_ORDER = List.copyOf(m.keySet());
    }

    private SeriesHues() {
    }

    private static Map<String, Integer> preferred() {
        Map<String, Integer> m = new LinkedHashMap<>();
        m.put("H+", VERMILLION);
        m.put("OH-", GRAPHITE);
        m.put("Cl-", GREEN);
        m.put("SO4^2-", GREEN);
        m.put("NO3-", GREEN);
        m.put("Sn2+", BLUE);
        m.put("Cu2+", BLUE);
        m.put("Zn2+", BLUE);
        m.put("Ni2+", BLUE);
        m.put("Ag+", BLUE);
        m.put("Sn4+", SKY);
        m.put("Cu+", SKY);
        m.put("Fe2+", OLIVE);
        m.put("Fe3+", PINK);
        m.put("HSO4-", SKY);
        m.put("Pb2+", PLUM);
        m.put("Cl2", PLUM);
        m.put("Al3+", PLUM);
        m.put("Na+", PLUM);
        m.put("K+", PLUM);
        m.put("Sn", BLUE);
        m.put("Cu", BLUE);
        m.put("Zn", BLUE);
        m.put("Ni", BLUE);
        m.put("Ag", BLUE);
        m.put("Fe", OLIVE);
        m.put("Pb", PLUM);
        m.put("Al", PLUM);
        return m;
    }

    /**
     * @param names the species (or metals) one chart shows, e.g. those of the live run and of a pinned one
     * @return each distinct name, in the order given, with its palette slot (0-7 solid, 8 and beyond repeat a
     *     hue with another stroke); the same set of names always gives the same slots
     */
    public static Map<String, Integer> assign(Collection<String> names) {
        List<String> distinct = new ArrayList<>(new LinkedHashSet<>(names));
        List<String> order = new ArrayList<>(distinct);
        order.sort(Comparator.comparingInt(SeriesHues::rank).thenComparing(Comparator.naturalOrder()));
        Map<String, Integer> slots = new HashMap<>();
        boolean[] taken = new boolean[HUES];
        List<String> left = new ArrayList<>();
        for (String n : order) {
            Integer want = PREFERRED.get(n);
            if (want != null && !taken[want]) {
                taken[want] = true;
                slots.put(n, want);
            } else {
                left.add(n);
            }
        }
        int extra = HUES;
        for (String n : left) {
            int free = 0;
            while (free < HUES && taken[free]) {
                free++;
            }
            if (free < HUES) {
                taken[free] = true;
                slots.put(n, free);
            } else {
                slots.put(n, extra++);
            }
        }
        Map<String, Integer> inGivenOrder = new LinkedHashMap<>();
        distinct.forEach(n -> inGivenOrder.put(n, slots.get(n)));
        return inGivenOrder;
    }

    /**
     * Slots for the names of a live run and of a pinned one: the live run's names get exactly the slots
     * {@link #assign(Collection)} gives them alone (pinning a run never recolours the live curves); names only
     * the pinned run has take the hues left free (their preferred one if it is), then slots beyond the hues.
     *
     * @param live the names of the live run
     * @param pinned the names of the pinned run
     * @return each distinct name of both with its slot, the live run's first
     */
    public static Map<String, Integer> assign(Collection<String> live, Collection<String> pinned) {
        Map<String, Integer> slots = assign(live);
        List<String> more = new ArrayList<>(new LinkedHashSet<>(pinned));
        more.removeAll(slots.keySet());
        if (more.isEmpty()) {
            return slots;
        }
        boolean[] taken = new boolean[HUES];
        int next = HUES;
        for (int slot : slots.values()) {
            if (slot < HUES) {
                taken[slot] = true;
            }
            next = Math.max(next, slot + 1);
        }
        more.sort(Comparator.comparingInt(SeriesHues::rank).thenComparing(Comparator.naturalOrder()));
        Map<String, Integer> out = new LinkedHashMap<>(slots);
        for (String n : more) {
            Integer want = PREFERRED.get(n);
            int slot;
            if (want != null && !taken[want]) {
                slot = want;
            } else {
                slot = 0;
                while (slot < HUES && taken[slot]) {
                    slot++;
                }
                if (slot == HUES) {
                    slot = next++;
                }
            }
            if (slot < HUES) {
                taken[slot] = true;
            }
            out.put(n, slot);
        }
        return out;
    }

    /** Library names first, in the order of {@link #PREFERRED}; any other name after them. */
    private static int rank(String name) {
        int i = CLAIM_ORDER.indexOf(name);
        return i < 0 ? CLAIM_ORDER.size() : i;
    }
}
