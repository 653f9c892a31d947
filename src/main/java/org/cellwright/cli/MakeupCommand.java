package org.cellwright.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

import org.cellwright.io.FeedReader;
import org.cellwright.io.MakeupWriter;
import org.cellwright.io.ScenarioException;
import org.cellwright.study.makeup.BathMakeup;
import org.cellwright.study.makeup.Feed;
import org.cellwright.study.makeup.MakeupResult;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/**
 * {@code makeup FEED.toml}: the electrolyte a bath make-up gives (docs/makeup.md), as a ready
 * {@code [electrolyte.composition]} block with the steps, precipitates and cautions as comments.
 */
@Command(name = "makeup",
        mixinStandardHelpOptions = true,
        description = "Works out the electrolyte a bath make-up gives (salts and metals dissolved, acids added,"
                + " solids filtered off) and prints a ready [electrolyte.composition] block, flagging solubility"
                + " and hydrolysis limits.",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success (cautions are printed as comments)", "1:internal failure",
            "2:bad input (feed file, or a step that cannot be done)"})
public final class MakeupCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "FEED", description = "Make-up feed file (TOML, docs/makeup.md).")
    Path file;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return CommandRun.of("makeup", "output").call(spec, this::makeup);
    }

    private int makeup(PrintWriter out, PrintWriter err) throws ScenarioException {
        Feed feed = FeedReader.read(file);
        MakeupResult r;
        try {
            r = BathMakeup.compute(feed);
        } catch (IllegalArgumentException e) {
            err.println(e.getMessage());
            return Main.BAD_INPUT;
        }
        MakeupWriter.lines(file.getFileName().toString(), r).forEach(out::println);
        return 0;
    }
}
