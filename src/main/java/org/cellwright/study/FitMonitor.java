package org.cellwright.study;

/**
 * Watches a fit while it runs: receives its progress and may cancel it. The fit calls both methods from its
 * own threads; a window hands progress to its event thread itself.
 */
public interface FitMonitor {

    /** A monitor that ignores progress and never cancels. */
    FitMonitor NONE = new FitMonitor() {
    };

    /**
     * Called after each iteration of the optimiser (when a new Jacobian is formed).
     *
     * @param progress where the fit stands
     */
    default void progress(FitProgress progress) {
    }

    /**
     * Asked before every model evaluation; answering true stops the fit with a {@link FitCancelledException}.
     *
     * @return true to stop the fit
     */
    default boolean cancelled() {
        return false;
    }
}
