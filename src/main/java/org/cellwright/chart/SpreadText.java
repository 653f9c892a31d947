package org.cellwright.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.cellwright.study.Percentiles;
import org.cellwright.study.SpreadResult;
import org.cellwright.study.SummaryFigure;
import org.cellwright.study.UncertainInput;

/** A spread study's ranges as plain text for people: what the command line prints after the run's summary. */
public final class SpreadText {

    private SpreadText() {
    }

    /**
     * @param s the study
     * @return the inputs sampled, then each figure's nominal value and 5-95 % range with its median
     */
    public static List<String> lines(SpreadResult s) {
        List<String> out = new ArrayList<>();
        out.add(String.format(Locale.ROOT, "  spread           %d of %d samples ran (seed %d)%s", s.ran(), s.samples(),
                s.seed(), s.cancelled() ? ", cancelled" : ""));
        for (UncertainInput in : UncertainInput.values()) {
            out.add(String.format(Locale.ROOT, "    %-28s %s", in.description(), in.distribution()));
        }
        out.add(String.format(Locale.ROOT, "    %-28s %12s   %s", "figure", "nominal", "5-95 % (median)"));
        for (SummaryFigure f : SummaryFigure.values()) {
            Percentiles p = s.figures().get(f);
            double nominal = f.display(s.nominal().summary());
            if (p == null || !Double.isFinite(p.p50())) {
                continue;
            }
            out.add(String.format(Locale.ROOT, "    %-28s %12s   %s to %s (%s)", f.label(), num(nominal),
                    num(f.toDisplay(p.p5())), num(f.toDisplay(p.p95())), num(f.toDisplay(p.p50()))));
        }
        for (String failure : s.failures().subList(0, Math.min(5, s.failures().size()))) {
            out.add("    ! " + failure);
        }
        if (s.failures().size() > 5) {
            out.add("    ! ... and " + (s.failures().size() - 5) + " more samples failed");
        }
        return out;
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "-";
    }
}
