package org.cellwright.sim.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.junit.jupiter.api.Test;

/**
 * Problems VDPOL and HIRES of the Test Set for IVP Solvers (F. Mazzia, C. Magherini et al., University of Bari,
 * release 2.4), against the reference solutions printed in the test set's problem files.
 */
class IvpTestSetTest {

    /** Van der Pol in Lienard scaled form, eps = 1e-6, i.e. mu = 1/sqrt(eps) = 1000. */
    static final class VanDerPol implements FirstOrderDifferentialEquations {
        static final double EPS = 1.0e-6;

        @Override
        public int getDimension() {
            return 2;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            yDot[0] = y[1];
            yDot[1] = ((1.0 - y[0] * y[0]) * y[1] - y[0]) / EPS;
        }
    }

    /** HIRES: "High Irradiance RESponse" of plant morphogenesis, 8 species (Schafer 1975). */
    static final class Hires implements FirstOrderDifferentialEquations {
        @Override
        public int getDimension() {
            return 8;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            yDot[0] = -1.71 * y[0] + 0.43 * y[1] + 8.32 * y[2] + 0.0007;
            yDot[1] = 1.71 * y[0] - 8.75 * y[1];
            yDot[2] = -10.03 * y[2] + 0.43 * y[3] + 0.035 * y[4];
            yDot[3] = 8.32 * y[1] + 1.71 * y[2] - 1.12 * y[3];
            yDot[4] = -1.745 * y[4] + 0.43 * y[5] + 0.43 * y[6];
            yDot[5] = -280.0 * y[5] * y[7] + 0.69 * y[3] + 1.71 * y[4] - 0.43 * y[5] + 0.69 * y[6];
            yDot[6] = 280.0 * y[5] * y[7] - 1.81 * y[6];
            yDot[7] = -yDot[6];
        }
    }

    @Test
    void vanDerPolWithMuOneThousandAtTimeTwo() {
        double tol = 1.0e-6;
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 2.0, tol, tol);
        integrator.setAutonomous(true);
        double[] y = {2.0, 0.0};
        integrator.integrate(new VanDerPol(), 0.0, y, 2.0, y);
        // source: Test Set for IVP Solvers, vdpol.f, subroutine solut: y(1) = 0.1706167732170483D+01,
        // y(2) = -0.8928097010247975D+00 (computed with RADAU at rtol = atol = 1.1e-18); tolerance 10 * tol
        // as in RobertsonTest (the solution passes two sharp turns where errors grow)
        assertEquals(0.1706167732170483e1, y[0], 10.0 * tol * (1.0 + 1.71));
        assertEquals(-0.8928097010247975e0, y[1], 10.0 * tol * (1.0 + 0.89));
        RosenbrockStatistics stats = integrator.getStatistics();
        // every accepted step costs 4 RHS calls; the rest goes to Jacobians (2 calls each) and rejected attempts
        assertTrue(stats.rhsEvaluations() >= 4 * stats.acceptedSteps(), stats.toString());
    }

    @Test
    void hiresAtTheTestSetEndTime() {
        double[] absTol = new double[8];
        double[] relTol = new double[8];
        java.util.Arrays.fill(absTol, 1.0e-10);
        java.util.Arrays.fill(relTol, 1.0e-7);
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 321.8122, absTol, relTol);
        integrator.setAutonomous(true);
        integrator.setNonNegative(0, 1, 2, 3, 4, 5, 6, 7);
        double[] y = {1.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0, 0.0057};
        integrator.integrate(new Hires(), 0.0, y, 321.8122, y);
        // source: Test Set for IVP Solvers, hires.f, subroutine solut (computed with RADAU5 on a Cray C90,
        // rtol = atol = h0 = 1.1e-18)
        double[] reference = {
            0.7371312573325668e-3, 0.1442485726316185e-3, 0.5888729740967575e-4, 0.1175651343283149e-2,
            0.2386356198831331e-2, 0.6238968252742796e-2, 0.2849998395185769e-2, 0.2850001604814231e-2};
        for (int i = 0; i < 8; i++) {
            // 10 * (absTol + relTol |y|), as in RobertsonTest
            double allowed = 10.0 * (absTol[i] + relTol[i] * Math.abs(reference[i]));
            assertEquals(reference[i], y[i], allowed, "y" + (i + 1));
        }
        // y7 + y8 = 0.0057 is a linear invariant of HIRES
        assertEquals(0.0057, y[6] + y[7], 1.0e-15);
    }
}
