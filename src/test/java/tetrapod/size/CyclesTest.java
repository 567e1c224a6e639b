package tetrapod.size;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import tetrapod.model.Role;
import tetrapod.model.Section;
import tetrapod.section.SectionCatalogue;

class CyclesTest {

    private static final SizingGroup LEG = new SizingGroup(1, Role.LEG);
    private static final SizingGroup DIAGONAL = new SizingGroup(1, Role.DIAGONAL);

    private static Section s(String name) {
        return SectionCatalogue.standard().find(name).orElseThrow();
    }

    private static Map<SizingGroup, Section> design(String leg, String diagonal) {
        return Map.of(LEG, s(leg), DIAGONAL, s(diagonal));
    }

    @Test
    void aDesignComingBackClosesACycleAndEachGroupIsHeldAtItsHeaviestInIt() {
        var a = design("L100x10", "L60x6");
        var b = design("L90x9", "L70x7");
        var c = design("L80x8", "L60x5");
        // a → b → c → b: the cycle is b, c
        var floors = Cycles.raisedFloors(List.of(a, b, c), b, Map.of()).orElseThrow();
        assertEquals(s("L90x9"), floors.get(LEG));       // about 12.2 kg/m > L80x8 about 9.6 kg/m
        assertEquals(s("L70x7"), floors.get(DIAGONAL)); // about 7.4 kg/m > L60x5 about 4.6 kg/m
        // the cycle a → b → c → a includes a: the leg floor becomes L100x10
        var all = Cycles.raisedFloors(List.of(a, b, c), a, Map.of()).orElseThrow();
        assertEquals(s("L100x10"), all.get(LEG));
        assertEquals(s("L70x7"), all.get(DIAGONAL));
    }

    @Test
    void floorsNeverFall() {
        var a = design("L100x10", "L60x6");
        var b = design("L90x9", "L60x5");
        var floors = Cycles.raisedFloors(List.of(a, b), a, Map.of(DIAGONAL, s("L80x8"))).orElseThrow();
        assertEquals(s("L80x8"), floors.get(DIAGONAL));
    }

    @Test
    void convergenceAndNewDesignsAreNoCycle() {
        var a = design("L100x10", "L60x6");
        var b = design("L90x9", "L60x5");
        assertTrue(Cycles.raisedFloors(List.of(a, b), b, Map.of()).isEmpty(), "the same design again: converged");
        assertTrue(Cycles.raisedFloors(List.of(a, b), design("L80x8", "L50x5"), Map.of()).isEmpty());
        assertTrue(Cycles.raisedFloors(List.of(), a, Map.of()).isEmpty());
    }
}
