package org.cellwright.ui;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import org.tomlj.Toml;
import org.tomlj.TomlParseResult;

/**
 * A scenario shipped inside the program, to start from: the demo scenarios of {@code scenarios/}, copied
 * as resources so that the window works from the jar alone. The first is the window's default.
 *
 * @param fileName the file's name ("tin-stripping-liquor.toml")
 * @param title the scenario's title
 * @param notes the scenario's notes (what to look at)
 * @param text the scenario text
 */
record ScenarioTemplate(String fileName, String title, String notes, String text) {

    /** The shipped scenarios, the default first. */
    static final List<String> FILES = List.of("tin-stripping-liquor.toml", "copper-etchant-bleed.toml",
            "silver-nitrate-refining.toml", "tin-dilute-sponge.toml", "tin-narrow-gap-dendrites.toml",
            "tin-divided-cell.toml", "tin-shuttle-efficiency.toml", "copper-electrowinning.toml",
            "zinc-electrowinning.toml");

    private static final String FOLDER = "templates/";

    @Override
    public String toString() {
        return title.isBlank() ? fileName : title;
    }

    /** @return the default scenario: tin from a spent tin-stripping liquor */
    static ScenarioTemplate defaultTemplate() {
        return load(FILES.get(0));
    }

    /** @return every shipped scenario, the default first */
    static List<ScenarioTemplate> all() {
        List<ScenarioTemplate> out = new ArrayList<>();
        FILES.forEach(f -> out.add(load(f)));
        return out;
    }

    /**
     * @param fileName one of {@link #FILES}
     * @return that scenario
     * @throws UncheckedIOException when the resource is missing from the build (a packaging fault)
     */
    static ScenarioTemplate load(String fileName) {
        try (InputStream in = ScenarioTemplate.class.getResourceAsStream(FOLDER + fileName)) {
            if (in == null) {
                throw new UncheckedIOException(new IOException("scenario " + fileName + " is missing from the program"));
            }
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            TomlParseResult toml = Toml.parse(text);
            String title = toml.hasErrors() ? "" : String.valueOf(toml.getString("title", () -> ""));
            String notes = toml.hasErrors() ? "" : String.valueOf(toml.getString("notes", () -> ""));
            return new ScenarioTemplate(fileName, title, notes.strip(), text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
