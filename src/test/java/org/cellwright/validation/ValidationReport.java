package org.cellwright.validation;

import java.util.List;

/** Renders the validation cases as the markdown page docs/validation.md. */
public final class ValidationReport {

    /** The command that writes the page again. */
    public static final String REGENERATE =
            "mvn -o -q -B test -Dtest=ValidationReportTest -Dcellwright.writeValidation=true";

    private ValidationReport() {
    }

    /**
     * @param cases the cases, in the page's order
     * @return the page
     */
    public static String render(List<ValidationCase> cases) {
        StringBuilder s = new StringBuilder();
        s.append("# Validation: Cellwright against the outside world\n\n");
        s.append("""
                Every row below is a check that the test suite makes against something outside the project: an \
                analytic solution, a handbook table, a textbook worked example, a standard or a plant's operating \
                figures. The page is generated: `ValidationReportTest` computes each case afresh with the engine \
                (the fixtures of the engine's own tests, the built-in library, the shipped scenarios), fails the \
                build when a case is outside its tolerance, and fails when this page differs from what it renders. \
                To write it again after a change of the model:

                """);
        s.append("    ").append(REGENERATE).append("\n\n");
        s.append("""
                How to read it. *Expected* is the outside value (or range) and *Cellwright* what the program \
                gives. *Error* is relative (in per cent) where the tolerance is in per cent, in the value's unit \
                where the tolerance is absolute, and for a handbook range "inside" or the distance to its nearer \
                end; an error far below its tolerance is shown as a bound (it is round-off). The tolerance is the \
                one the test asserts; each one is justified in the test's source (`// source:` comments beside \
                the expected value). A source marked "from memory" was not re-checked against the printed book. \
                Plant figures are checked against the handbook's own range: the model meets it with typical plant \
                inputs (docs/tankhouse.md explains the choices), not with fitted ones.

                """);
        s.append("Cases: ").append(cases.size()).append(", passing: ")
                .append(cases.stream().filter(ValidationCase::passes).count()).append(".\n\n");
        s.append("| area | what is checked | source | expected | Cellwright | error | tolerance |\n");
        s.append("|---|---|---|---:|---:|---:|---:|\n");
        for (ValidationCase c : cases) {
            s.append("| ").append(cell(c.area())).append(" | ").append(cell(c.check())).append(" | ")
                    .append(cell(c.source())).append(" | ").append(cell(c.expectedText())).append(" | ")
                    .append(cell(c.actualText())).append(" | ").append(cell(c.errorText())).append(" | ")
                    .append(cell(c.toleranceText())).append(" |\n");
        }
        return s.toString();
    }

    private static String cell(String text) {
        return text.replace("|", "\\|");
    }
}
