package org.cellwright.io;

import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Path;

/** Locates the test scenario files under src/test/resources/scenarios. */
final class ScenarioFiles {

    private ScenarioFiles() {
    }

    /** @return the path of a test resource, e.g. "valid/defaults.toml" */
    static Path path(String name) {
        URL url = ScenarioFiles.class.getResource("/scenarios/" + name);
        if (url == null) {
            throw new IllegalArgumentException("no test scenario " + name);
        }
        try {
            return Path.of(url.toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }
}
