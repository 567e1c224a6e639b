package tetrapod.section;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class SuggestionsTest {

    @Test
    void levenshteinTextbookCases() {
        // kitten → sitting: two substitutions and one insertion (the usual textbook example)
        assertEquals(3, Suggestions.levenshtein("KITTEN", "SITTING"));
        assertEquals(0, Suggestions.levenshtein("L90X8", "L90X8"));
        assertEquals(5, Suggestions.levenshtein("", "L90X8"));
        assertEquals(1, Suggestions.levenshtein("L90X8", "L90X9"));
    }

    @Test
    void nearestFirstThenAlphabetical() {
        List<String> known = List.of("L90x8", "L75x8", "L100x10", "L90x10");
        assertEquals(List.of("L75x8", "L90x8"), Suggestions.nearest("l95x8", known, 2));
        assertEquals(List.of("L75x8", "L90x8"), Suggestions.nearest("l95x8", List.of("L90x10", "L100x10", "L75x8", "L90x8"), 2));
        assertEquals(List.of(), Suggestions.nearest("L95x8", known, 0));
    }
}
