package tetrapod.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Marks of values without a published source: taken out of a row, listed once with their reference. */
class RecalledTest {

    @Test
    void aMarkAfterAClauseKeepsTheClause() {
        String note = "N_b,Rd = 6.3 kN; nominal force: 2.5 % of 239.0 kN (EN 1993-3-1 Annex H, fraction recalled from memory)";
        assertEquals("N_b,Rd = 6.3 kN; nominal force: 2.5 % of 239.0 kN (EN 1993-3-1 Annex H)", Recalled.strip(note));
        assertEquals(List.of(new Recalled.Source("EN 1993-3-1 Annex H", "fraction recalled from memory")),
                Recalled.find(note));
    }

    @Test
    void aMarkAloneRefersToTheRuleBeforeIt() {
        assertEquals("H × FS ≤ μ N", Recalled.strip("H × FS ≤ μ N (common practice)"));
        assertEquals(List.of(new Recalled.Source("H × FS ≤ μ N", "common practice")),
                Recalled.find("H × FS ≤ μ N (common practice)"));
    }

    @Test
    void wordsBesideTheMarkThatNameNoClauseStayWithTheSubject() {
        String clause = "EN 1993-3-1 Annex H (informative; limit recalled from memory)";
        assertEquals("EN 1993-3-1 Annex H (informative)", Recalled.strip(clause));
        assertEquals(List.of(new Recalled.Source("EN 1993-3-1 Annex H (informative)", "limit recalled from memory")),
                Recalled.find(clause));
    }

    @Test
    void textWithoutMarksIsUnchanged() {
        assertEquals("EN 1993-1-8 Table 3.4 (F_t,Rd)", Recalled.strip("EN 1993-1-8 Table 3.4 (F_t,Rd)"));
        assertEquals(List.of(), Recalled.find("EN 1993-1-8 Table 3.4 (F_t,Rd)"));
    }
}
