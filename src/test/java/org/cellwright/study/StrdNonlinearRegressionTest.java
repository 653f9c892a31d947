package org.cellwright.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiFunction;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The fitter against the NIST Statistical Reference Datasets for nonlinear regression: from both of NIST's
 * starting points it must find the certified values, the certified residual sum of squares and the certified
 * standard deviations of the parameters (which are s sqrt(diag((J^T J)^-1)), the same statistics our
 * confidence intervals are built on), with the finite-difference Jacobian the engine fits use.
 *
 * <p>Tolerances: NIST certifies 11 significant digits and asks a good solver for at least 4 to 6 (NIST/ITL
 * StRD, "Nonlinear Regression: background"); a central-difference Jacobian with steps of 1e-6 is accurate to
 * about 1e-8 relative on these smooth models, which bounds the standard deviations' accuracy, and the
 * optimum itself depends on the Jacobian only through the stopping point.
 */
class StrdNonlinearRegressionTest {

    private static final BiFunction<double[], Double, Double> MISRA1A = (b, x) -> b[0] * (1 - Math.exp(-b[1] * x));
    private static final BiFunction<double[], Double, Double> THURBER = (b, x) ->
            (b[0] + b[1] * x + b[2] * x * x + b[3] * x * x * x) / (1 + b[4] * x + b[5] * x * x + b[6] * x * x * x);

    @ParameterizedTest(name = "{0} from start {1}")
    @CsvSource({"Misra1a, 1", "Misra1a, 2", "Thurber, 1", "Thurber, 2"})
    void findsTheCertifiedValuesAndStandardDeviations(String name, int start) throws Exception {
        StrdDataset d = StrdDataset.load(name);
        double[] from = start == 1 ? d.start1() : d.start2();
        FitOutcome o = fit(d, start);

        assertTrue(o.converged(), name + " did not converge");
        for (int j = 0; j < from.length; j++) {
            FittedParameter p = o.parameters().get(j);
            // source: NIST/ITL StRD, certified values (file in src/test/resources/org/cellwright/study/strd)
            double certified = d.certified()[j];
            assertEquals(certified, p.value(), 1e-6 * Math.abs(certified), p.key() + " value");
            // source: same, certified standard deviation; the linear-scale standard error is directly comparable
            double sd = d.certifiedSd()[j];
            assertEquals(sd, p.standardError(), 1e-5 * sd, p.key() + " standard deviation");
        }
        // source: same, certified residual sum of squares and residual standard deviation
        assertEquals(d.residualSumOfSquares(), o.sumOfSquares(), 1e-8 * d.residualSumOfSquares());
        assertEquals(d.residualSd(), o.residualSd(), 1e-8 * d.residualSd());
        assertEquals(d.y().length - from.length, o.degreesOfFreedom());
    }

    /**
     * @param d the NIST dataset (Misra1a or Thurber)
     * @param start NIST's starting point, 1 or 2
     * @return the fit from that start, with the finite-difference Jacobian of the engine fits
     */
    static FitOutcome fit(StrdDataset d, int start) {
        BiFunction<double[], Double, Double> model = d.name().equals("Misra1a") ? MISRA1A : THURBER;
        double[] from = start == 1 ? d.start1() : d.start2();
        List<FreeParameter> params = new ArrayList<>();
        for (int j = 0; j < from.length; j++) {
            params.add(FreeParameter.of("b" + (j + 1), from[j], ParameterScale.LINEAR));
        }
        return new LeastSquaresFit(params, b -> {
            double[] r = new double[d.y().length];
            for (int i = 0; i < r.length; i++) {
                r[i] = model.apply(b, d.x()[i]) - d.y()[i];
            }
            return r;
        }, LeastSquaresFit.Options.forFormula(), FitMonitor.NONE).fit();
    }
}
