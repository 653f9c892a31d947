package org.cellwright.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.cellwright.sim.RunResult;

/**
 * Where the charge went: each electrode reaction's share of the charge passed, largest first, in plain
 * words ("cathode: depositing Sn 61 %, hydrogen 27 %, reducing Sn4+ back to Sn2+ 12 %").
 */
public final class ChargeShares {

    private ChargeShares() {
    }

    /**
     * @param r a run
     * @return one line per electrode, shares above 0.05 % of the charge
     */
    public static List<String> lines(RunResult r) {
        double q = r.summary().chargeC();
        List<String> out = new ArrayList<>();
        for (String electrode : new String[] {"cathode", "anode"}) {
            List<Map.Entry<String, Double>> parts = new ArrayList<>();
            for (Map.Entry<String, Double> e : r.summary().reactionChargeC().entrySet()) {
                if (e.getKey().startsWith(electrode + ":")) {
                    parts.add(e);
                }
            }
            Map<String, Double> byWords = new java.util.LinkedHashMap<>();
            for (Map.Entry<String, Double> e : parts) {
                String couple = e.getKey().substring(electrode.length() + 1);
                String words = org.cellwright.sim.PlainWords.of(couple, e.getValue() < 0);
                byWords.merge(words, q > 0 ? Math.abs(e.getValue()) / q : 0, Double::sum);
            }
            List<Map.Entry<String, Double>> shares = new ArrayList<>(byWords.entrySet());
            shares.sort((a, b) -> Double.compare(b.getValue(), a.getValue()));
            StringBuilder sb = new StringBuilder();
            for (Map.Entry<String, Double> e : shares) {
                if (e.getValue() < 5e-4) {
                    continue;
                }
                sb.append(sb.length() == 0 ? "" : ", ").append(e.getKey())
                        .append(String.format(Locale.ROOT, " %.1f %%", e.getValue() * 100));
            }
            out.add(String.format(Locale.ROOT, "    %-8s %s", electrode, sb.length() == 0 ? "-" : sb.toString()));
        }
        return out;
    }
}
