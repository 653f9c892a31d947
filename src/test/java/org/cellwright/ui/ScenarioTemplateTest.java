package org.cellwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

class ScenarioTemplateTest {

    @Test
    void theDefaultIsTheTinScenario() {
        ScenarioTemplate t = ScenarioTemplate.defaultTemplate();
        assertEquals("tin-stripping-liquor.toml", t.fileName());
        assertFalse(t.title().isBlank());
        assertFalse(t.notes().isBlank());
    }

    /** The resources are copies of scenarios/: a scenario changed there must be copied here too. */
    @Test
    void theShippedCopiesMatchTheScenariosFolder() throws Exception {
        Path folder = Path.of("scenarios");
        assumeTrue(Files.isDirectory(folder), "run from the project folder");
        List<String> files;
        try (Stream<Path> s = Files.list(folder)) {
            files = s.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".toml")).sorted().toList();
        }
        assertEquals(files, ScenarioTemplate.FILES.stream().sorted().toList(), "every demo scenario is shipped");
        for (String f : files) {
            assertEquals(Files.readString(folder.resolve(f), StandardCharsets.UTF_8), ScenarioTemplate.load(f).text(), f);
        }
    }
}
