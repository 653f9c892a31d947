package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The corpus of malformed scenarios in src/test/resources/scenarios/malformed. Each file starts with
 * comment lines: {@code # expect: <fragment>} (part of the formatted problem), optionally {@code # at: <line>}
 * (the line the problem must be reported on), {@code # severity: warning} (the file is valid but must warn)
 * and {@code # set: key=value} (options applied as --set).
 */
class MalformedScenarioTest {

    private final ScenarioReader reader = new ScenarioReader(LibraryFixture.library());

    /** What a corpus file expects, from its header comments. */
    record Expectation(Path file, String fragment, Integer line, boolean warning, List<String> sets) {
        @Override
        public String toString() {
            return file.getFileName().toString();
        }
    }

    static Stream<Expectation> corpus() throws IOException {
        Path dir = ScenarioFiles.path("malformed");
        List<Expectation> out = new ArrayList<>();
        try (Stream<Path> files = Files.list(dir)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".toml")).sorted().toList()) {
                out.add(expectation(f));
            }
        }
        return out.stream();
    }

    private static Expectation expectation(Path f) throws IOException {
        String fragment = null;
        Integer line = null;
        boolean warning = false;
        List<String> sets = new ArrayList<>();
        for (String l : Files.readAllLines(f, StandardCharsets.UTF_8)) {
            if (!l.startsWith("#")) {
                break;
            }
            if (l.startsWith("# expect: ")) {
                fragment = l.substring("# expect: ".length());
            } else if (l.startsWith("# at: ")) {
                line = Integer.valueOf(l.substring("# at: ".length()).strip());
            } else if (l.startsWith("# severity: warning")) {
                warning = true;
            } else if (l.startsWith("# set: ")) {
                sets.add(l.substring("# set: ".length()));
            }
        }
        if (fragment == null) {
            throw new IllegalStateException(f + " has no '# expect:' line");
        }
        return new Expectation(f, fragment, line, warning, sets);
    }

    @Test
    void theCorpusIsLargeEnough() throws IOException {
        assertTrue(corpus().count() >= 35, "at least 35 malformed scenarios");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void eachIsReportedWithItsMessageAndLine(Expectation e) {
        List<Problem> problems;
        if (e.warning()) {
            try {
                problems = reader.load(e.file(), e.sets()).warnings();
            } catch (ScenarioException ex) {
                fail("expected a valid scenario with a warning, got:\n" + ex.getMessage());
                return;
            }
        } else {
            try {
                reader.load(e.file(), e.sets());
                fail("expected a ScenarioException for " + e.file().getFileName());
                return;
            } catch (ScenarioException ex) {
                problems = ex.problems();
                assertFalse(ex.errors().isEmpty());
            }
        }
        List<Problem> matching = problems.stream().filter(p -> p.format().contains(e.fragment())).toList();
        assertFalse(matching.isEmpty(), () -> "no problem contains '" + e.fragment() + "' in:\n"
                + String.join("\n", problems.stream().map(Problem::format).toList()));
        if (e.line() != null) {
            assertTrue(matching.stream().anyMatch(p -> p.line() == e.line()), () -> "expected line " + e.line()
                    + ", got: " + String.join("\n", matching.stream().map(Problem::format).toList()));
        }
        for (Problem p : problems) {
            String where = e.sets().isEmpty() ? e.file().toString() : p.file();
            assertTrue(p.file().equals(e.file().toString()) || p.file().equals(SourceLocation.FROM_SET), where);
            assertEquals(e.warning() ? Problem.Severity.WARNING : p.severity(), p.severity());
        }
    }
}
