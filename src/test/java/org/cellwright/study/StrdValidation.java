package org.cellwright.study;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

import org.cellwright.validation.ValidationCase;

/**
 * The fitter's checks for the validation report (docs/validation.md): NIST StRD nonlinear regression datasets
 * Misra1a (lower difficulty) and Thurber (higher difficulty) from NIST's first, far starting point, as in
 * {@link StrdNonlinearRegressionTest}: the largest relative error over the certified parameter values and over
 * their certified standard deviations, and the certified residual sum of squares.
 */
public final class StrdValidation {

    private StrdValidation() {
    }

    /** @return the fitter's cases, freshly computed */
    public static List<ValidationCase> cases() {
        List<ValidationCase> out = new ArrayList<>();
        for (String name : List.of("Misra1a", "Thurber")) {
            StrdDataset d;
            try {
                d = StrdDataset.load(name);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            FitOutcome o = StrdNonlinearRegressionTest.fit(d, 1);
            double worstValue = 0;
            double worstSd = 0;
            for (int j = 0; j < d.certified().length; j++) {
                FittedParameter p = o.parameters().get(j);
                worstValue = Math.max(worstValue, Math.abs(p.value() / d.certified()[j] - 1));
                worstSd = Math.max(worstSd, Math.abs(p.standardError() / d.certifiedSd()[j] - 1));
            }
            String source = "NIST/ITL StRD nonlinear regression, " + name + " (certified values)";
            // source: NIST/ITL StRD certified values; NIST asks a good solver for 4 to 6 significant digits:
            // values to 1e-6, standard deviations to 1e-5 (central-difference Jacobian), RSS to 1e-8
            out.add(ValidationCase.absolute("Fitting", name + " from start 1: worst parameter, relative", source, "",
                    0, worstValue, 1e-6, 2));
            out.add(ValidationCase.absolute("Fitting", name + " from start 1: worst standard deviation, relative",
                    source, "", 0, worstSd, 1e-5, 2));
            out.add(ValidationCase.relative("Fitting", name + " from start 1: residual sum of squares", source, "",
                    d.residualSumOfSquares(), o.sumOfSquares(), 1e-8, 6));
        }
        return out;
    }
}
