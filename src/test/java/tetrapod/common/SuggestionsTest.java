package tetrapod.common;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.junit.jupiter.api.Test;

class SuggestionsTest {

    @Test
    void editDistance() {
        // the textbook Levenshtein example: kitten → sitting takes 3 edits (2 substitutions, 1 insertion)
        assertEquals(3, Suggestions.distance("kitten", "sitting"));
        assertEquals(0, Suggestions.distance("", ""));
        assertEquals(4, Suggestions.distance("", "abcd"));
        // swapped neighbours count as one edit: hieght → height
        assertEquals(1, Suggestions.distance("hieght", "height"));
        // letter case is ignored
        assertEquals(0, Suggestions.distance("topwidthx", "topWidthX"));
    }

    @Test
    void nearestWithinTolerance() {
        List<String> keys = List.of("height", "topWidthX", "topWidthY", "panels", "panelHeights");
        assertEquals("height", Suggestions.nearest("hieght", keys));
        assertEquals("panels", Suggestions.nearest("pannels", keys));
        assertEquals(List.of("topWidthX", "topWidthY"), Suggestions.nearest("topWidth", keys, 3));
        assertNull(Suggestions.nearest("colour", keys));
    }

    @Test
    void closestRanksEveryKnownNameNearestFirstThenAlphabetically() {
        // kitten → sitting: two substitutions and one insertion (the usual textbook example)
        assertEquals(3, Suggestions.distance("KITTEN", "SITTING"));
        assertEquals(1, Suggestions.distance("L90X8", "L90X9"));
        List<String> known = List.of("L90x8", "L75x8", "L100x10", "L90x10");
        assertEquals(List.of("L75x8", "L90x8"), Suggestions.closest("l95x8", known, 2));
        assertEquals(List.of("L75x8", "L90x8"),
                Suggestions.closest("l95x8", List.of("L90x10", "L100x10", "L75x8", "L90x8"), 2));
        assertEquals(List.of(), Suggestions.closest("L95x8", known, 0));
    }
}
