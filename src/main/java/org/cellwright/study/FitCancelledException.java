package org.cellwright.study;

import java.util.concurrent.CancellationException;

/** Thrown out of a fit when its {@link FitMonitor} asked to stop. */
public final class FitCancelledException extends CancellationException {

    /** Creates the exception. */
    public FitCancelledException() {
        super("the fit was cancelled");
    }
}
