package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;

/** "Did you mean" suggestions: close names are offered, unrelated short ones are not. */
class SpellingTest {

    private static final List<String> KEYS = List.of("duration", "output_interval", "stop", "target");

    @Test
    void levenshteinDistance() {
        // textbook example: kitten -> sitting needs 3 edits (2 substitutions, 1 insertion)
        assertEquals(3, Spelling.distance("kitten", "sitting"));
        assertEquals(0, Spelling.distance("", ""));
        assertEquals(4, Spelling.distance("", "stop"));
    }

    @Test
    void suggestsCloseNames() {
        assertEquals(Optional.of("duration"), Spelling.closest("duraton", KEYS));
        assertEquals(Optional.of("target"), Spelling.closest("traget", KEYS));
        assertEquals(Optional.of("stop"), Spelling.closest("STOP", KEYS));
        assertEquals(Optional.of("output_interval"), Spelling.closest("output", KEYS));
        assertEquals(Optional.of("cm"), Spelling.closest("cn", List.of("m", "cm", "mm")));
    }

    @Test
    void doesNotSuggestUnrelatedNames() {
        assertEquals(Optional.empty(), Spelling.closest("voltage", KEYS));
        assertEquals(Optional.empty(), Spelling.closest("Q", List.of("A", "mA", "kA")));
        assertEquals(Optional.empty(), Spelling.closest("duration", KEYS));
        assertEquals("", Spelling.suggestion("colour", KEYS));
    }
}
