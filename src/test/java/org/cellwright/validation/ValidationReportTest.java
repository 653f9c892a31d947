package org.cellwright.validation;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * Each validation case holds its tolerance, and docs/validation.md is exactly what the cases render: change
 * the model and the page must be written again ({@link ValidationReport#REGENERATE}).
 */
class ValidationReportTest {

    private static final Path PAGE = Path.of("docs", "validation.md");

    @TestFactory
    Stream<DynamicTest> everyCaseIsInsideItsTolerance() {
        return ValidationCatalogue.all().stream().map(c -> DynamicTest.dynamicTest(c.area() + ": " + c.check(),
                () -> assertTrue(c.passes(), c.check() + ": expected " + c.expectedText() + " (" + c.source()
                        + "), Cellwright " + c.actualText() + ", error " + c.errorText() + ", tolerance "
                        + c.toleranceText())));
    }

    @Test
    void thePageIsWhatTheCasesRender() throws Exception {
        String rendered = ValidationReport.render(ValidationCatalogue.all());
        if (Boolean.getBoolean("cellwright.writeValidation")) {
            Files.writeString(PAGE, rendered, StandardCharsets.UTF_8);
        }
        String onDisk = Files.isRegularFile(PAGE) ? Files.readString(PAGE, StandardCharsets.UTF_8) : "";
        if (!onDisk.equals(rendered)) {
            fail(PAGE + " is out of date; write it again with\n    " + ValidationReport.REGENERATE + "\n"
                    + diff(onDisk.lines().toList(), rendered.lines().toList()));
        }
    }

    /** A line diff: lines only in the page (-) and only in the rendering (+), in order. */
    static String diff(List<String> page, List<String> rendered) {
        int[][] lcs = new int[page.size() + 1][rendered.size() + 1];
        for (int i = page.size() - 1; i >= 0; i--) {
            for (int j = rendered.size() - 1; j >= 0; j--) {
                lcs[i][j] = page.get(i).equals(rendered.get(j)) ? lcs[i + 1][j + 1] + 1
                        : Math.max(lcs[i + 1][j], lcs[i][j + 1]);
            }
        }
        StringBuilder out = new StringBuilder();
        int i = 0;
        int j = 0;
        while (i < page.size() || j < rendered.size()) {
            if (i < page.size() && j < rendered.size() && page.get(i).equals(rendered.get(j))) {
                i++;
                j++;
            } else if (j < rendered.size() && (i == page.size() || lcs[i][j + 1] >= lcs[i + 1][j])) {
                out.append("+ ").append(rendered.get(j++)).append('\n');
            } else {
                out.append("- ").append(page.get(i++)).append('\n');
            }
        }
        return out.toString();
    }
}
