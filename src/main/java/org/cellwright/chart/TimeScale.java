package org.cellwright.chart;

/**
 * The unit of the time axis of run charts: minutes for runs up to three hours, hours beyond. The engine
 * works in seconds; the charts store their x values in this unit so that the axis picks round ticks.
 */
public enum TimeScale {
    /** Minutes, for runs up to {@link #HOURS_FROM_S}. */
    MINUTES("min", 60.0),
    /** Hours, for longer runs. */
    HOURS("h", 3600.0);

    /** Span (s) from which the axis switches to hours: 3 h (common practice: keeps ticks at 10-30 min below). */
    public static final double HOURS_FROM_S = 3 * 3600.0;

    private final String symbol;
    private final double seconds;

    TimeScale(String symbol, double seconds) {
        this.symbol = symbol;
        this.seconds = seconds;
    }

    /**
     * @param spanS the time span the axis must show (s)
     * @return minutes for spans up to three hours, hours above
     */
    public static TimeScale forSpan(double spanS) {
        return spanS > HOURS_FROM_S ? HOURS : MINUTES;
    }

    /** @return the unit symbol as printed in axis labels ("min", "h") */
    public String symbol() {
        return symbol;
    }

    /**
     * @param timeS a time (s)
     * @return the same time in this unit
     */
    public double fromSeconds(double timeS) {
        return timeS / seconds;
    }

    /** @return the axis label, e.g. "time (min)" */
    public String axisLabel() {
        return "time (" + symbol + ")";
    }
}
