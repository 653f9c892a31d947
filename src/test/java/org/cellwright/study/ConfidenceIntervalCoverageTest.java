package org.cellwright.study;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * The 95 % intervals cover the true values about 95 % of the time: many datasets drawn from a known model
 * with seeded Gaussian noise are fitted, and the share of intervals that hold the truth is counted, on both
 * scales (log for the rate constant, linear for the amplitude).
 */
class ConfidenceIntervalCoverageTest {

    /** Predictor values of NIST StRD Misra1a (file strd/Misra1a.dat). */
    private static final double[] X = {77.6, 114.9, 141.1, 190.8, 239.9, 289.0, 332.8, 378.4, 434.8, 477.3, 536.8,
            593.1, 689.1, 760.0};

    @Test
    void ninetyFivePercentIntervalsCoverTheTruthNinetyFivePercentOfTheTime() {
        // source: NIST/ITL StRD Misra1a certified values and residual standard deviation, used as the truth
        double b1 = 238.94212918;
        double b2 = 5.5015643181e-4;
        double sigma = 0.10187876330;
        int trials = 400;
        long seed = 20_261_201L;
        SplittableRandom rnd = new SplittableRandom(seed);
        int[] covered = new int[2];
        for (int k = 0; k < trials; k++) {
            double[] y = new double[X.length];
            for (int i = 0; i < X.length; i++) {
                y[i] = b1 * (1 - Math.exp(-b2 * X[i])) + sigma * rnd.nextGaussian();
            }
            List<FreeParameter> params = List.of(FreeParameter.of("b1", 200, ParameterScale.LINEAR),
                    FreeParameter.of("b2", 4e-4, ParameterScale.LOG));
            FitOutcome o = new LeastSquaresFit(params, b -> {
                double[] r = new double[X.length];
                for (int i = 0; i < X.length; i++) {
                    r[i] = b[0] * (1 - Math.exp(-b[1] * X[i])) - y[i];
                }
                return r;
            }, LeastSquaresFit.Options.forFormula(), FitMonitor.NONE).fit();
            covered[0] += o.parameters().get(0).covers(b1) ? 1 : 0;
            covered[1] += o.parameters().get(1).covers(b2) ? 1 : 0;
        }
        // source: binomial distribution; 400 trials at p = 0.95 have a standard deviation of
        // sqrt(0.95 * 0.05 / 400) = 1.1 %, so 3.5 standard deviations either side is 91.2 % to 98.8 %
        for (int j = 0; j < 2; j++) {
            double share = covered[j] / (double) trials;
            assertTrue(share > 0.912 && share < 0.988, "b" + (j + 1) + " covered " + share + " (seed " + seed + ")");
        }
    }
}
