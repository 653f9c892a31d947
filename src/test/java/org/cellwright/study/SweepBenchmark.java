package org.cellwright.study;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioVariants;
import org.cellwright.io.SweepAxisParser;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * JMH benchmark of the 400-run sweep of the brief: {@code scenarios/copper-etchant-bleed.toml} (8 h runs) over
 * gap 10-60 mm x current density 0.5-4 A/dm2, 20 x 20, each point read from the file with its --set values and
 * run, on 1 or 2 threads. The goal: well under 30 s on two cores. Run it as the other benchmarks (see
 * {@code RobertsonBenchmark}): {@code org.openjdk.jmh.Main SweepBenchmark -f 1 -wi 1 -i 3}. The score is the
 * time of one whole sweep.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
@Fork(1)
public class SweepBenchmark {

    /** Worker threads. */
    @Param({"1", "2"})
    public int threads;

    private Sweep sweep;

    /** Reads the library and the scenario once. */
    @Setup
    public void setUp() throws Exception {
        ChemLibrary lib = LibraryReader.builtIn();
        List<SweepAxis> axes = List.of(SweepAxisParser.parse("cell.gap=10mm:60mm:20"),
                SweepAxisParser.parse("supply.current_density=0.5:4 A/dm2:20"));
        ScenarioVariants variants = ScenarioVariants.of(lib, Path.of("scenarios", "copper-etchant-bleed.toml"),
                List.of(), axes);
        sweep = new Sweep(axes, variants, ScenarioRunner.engine(lib));
    }

    /** One sweep of 400 runs; returns the count of runs that finished. */
    @Benchmark
    public long fourHundredRuns() {
        return sweep.run(threads, StudyProgress.NONE, Cancellation.none()).okCount();
    }
}
