package org.cellwright.sim;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.cellwright.cell.Scenario;
import org.cellwright.chem.ChemLibrary;
import org.cellwright.io.LibraryReader;
import org.cellwright.io.ScenarioReader;
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
 * Time of one whole 4 h run of the shipped scenarios (after warm-up). Run from the project folder:
 *
 * <pre>
 *   mvn -q -o -DskipTests test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 *   java -cp target/test-classes:target/classes:$(cat target/cp.txt) org.openjdk.jmh.Main CellRunBenchmark
 * </pre>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 5, time = 2)
@Measurement(iterations = 10, time = 2)
@Fork(1)
public class CellRunBenchmark {

    @Param({"tin-stripping-liquor", "copper-etchant-bleed", "silver-nitrate-refining"})
    public String scenario;

    private Scenario sc;
    private ChemLibrary lib;

    @Setup
    public void load() throws Exception {
        lib = LibraryReader.builtIn();
        sc = new ScenarioReader(lib).read(Path.of("scenarios", scenario + ".toml"),
                List.of("run.duration=\"4 h\"", "run.stop=[]"));
    }

    @Benchmark
    public RunSummary run() {
        return CellSimulation.withDefaults().run(sc, lib, null).summary();
    }
}
