package org.cellwright.sim.ode;

import java.util.concurrent.TimeUnit;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * JMH benchmark of {@link Ros34Pw2Integrator} on Robertson's problem from t = 0 to 4e5 (rtol 1e-6, the settings
 * of {@code RobertsonTest}), with the Jacobian by finite differences or in closed form.
 *
 * <p>For developers, how to run benchmarks: JMH 1.37 annotations are processed when the tests compile, and
 * Surefire skips classes named *Benchmark*, so {@code mvn verify} never runs them. From the project root:
 * <pre>
 *   mvn -o -q -B test-compile
 *   java -cp target/test-classes:target/classes:$(mvn -o -q dependency:build-classpath \
 *       -Dmdep.outputFile=/dev/stdout) org.openjdk.jmh.Main RobertsonBenchmark -f 1 -wi 3 -i 5
 * </pre>
 * {@code -f} forks, {@code -wi} warm-up and {@code -i} measured iterations (1 s each); add {@code -p jacobian=analytic}
 * to run one case. The score is the mean time of one whole integration. Runtimes depend on the machine: compare
 * before/after figures from the same machine only.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class RobertsonBenchmark {

    /** "difference" for the finite-difference Jacobian, "analytic" for {@link AnalyticJacobian}. */
    @Param({"difference", "analytic"})
    public String jacobian;

    private static final double RTOL = 1.0e-6;

    /** One integration to t = 4e5; returns y1 so that the work cannot be optimised away. */
    @Benchmark
    public double robertsonToFourHundredThousandSeconds() {
        FirstOrderDifferentialEquations problem = "analytic".equals(jacobian)
                ? new RobertsonProblem.WithJacobian() : new RobertsonProblem();
        Ros34Pw2Integrator integrator = new Ros34Pw2Integrator(0.0, 1.0e6, new double[] {1.0e-10, 1.0e-14, 1.0e-10},
                new double[] {RTOL, RTOL, RTOL});
        integrator.setAutonomous(true);
        integrator.setNonNegative(0, 1, 2);
        double[] y = {1.0, 0.0, 0.0};
        integrator.integrate(problem, 0.0, y, 4.0e5, y);
        return y[0];
    }
}
