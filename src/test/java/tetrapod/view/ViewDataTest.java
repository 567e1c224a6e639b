package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Vec3;

class ViewDataTest {

    private final Frame frame = ViewFixtures.ridge();
    private final int members = frame.members().size();

    private ViewCase at(double azimuth) {
        return new ViewCase("wind " + azimuth, OptionalDouble.of(azimuth),
                Map.of(Colouring.AXIAL, MemberScalars.of(new double[members])), List.of(), List.of(), List.of());
    }

    @Test
    void casesAreFoundByAzimuthModulo360() {
        ViewData data = new ViewData(frame, List.of(at(0), at(45), at(90)), Colouring.AXIAL);
        assertEquals(OptionalInt.of(1), data.caseAt(45));
        assertEquals(OptionalInt.of(0), data.caseAt(360));
        assertEquals(OptionalInt.of(2), data.caseAt(-270));
        assertEquals(OptionalInt.empty(), data.caseAt(30));
        assertEquals(List.of(0.0, 45.0, 90.0), data.azimuths());
        assertEquals(List.of(Colouring.ROLE, Colouring.AXIAL), data.colourings(1));
    }

    @Test
    void mismatchedResultsAreRefused() {
        ViewCase short1 = new ViewCase("short", OptionalDouble.empty(),
                Map.of(Colouring.UTILISATION, MemberScalars.of(1, 2)), List.of(), List.of(), List.of());
        assertThrows(IllegalArgumentException.class, () -> new ViewData(frame, List.of(short1), Colouring.ROLE));
        ViewCase notes = new ViewCase("notes", OptionalDouble.empty(), Map.of(), List.of(), List.of(), List.of("a"));
        assertThrows(IllegalArgumentException.class, () -> new ViewData(frame, List.of(notes), Colouring.ROLE));
        int notASupport = frame.nodes().get(frame.nodes().size() - 1).id();
        ViewCase reaction = new ViewCase("r", OptionalDouble.empty(), Map.of(), List.of(),
                List.of(new NodeVector(notASupport, Vec3.Z)), List.of());
        assertThrows(IllegalArgumentException.class, () -> new ViewData(frame, List.of(reaction), Colouring.ROLE));
        assertThrows(IllegalArgumentException.class, () -> new ViewData(frame, List.of(at(0)), Colouring.UTILISATION));
        assertThrows(IllegalArgumentException.class, () -> new ViewData(frame, List.of(), Colouring.ROLE));
        assertThrows(IllegalArgumentException.class, () -> MemberScalars.of(1, Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> new ViewCase("role", OptionalDouble.empty(),
                Map.of(Colouring.ROLE, MemberScalars.of(new double[members])), List.of(), List.of(), List.of()));
    }

    @Test
    void aPickedMemberIsDescribedWithItsResultsInPeoplesUnits() {
        double[] n = new double[members];
        double[] u = new double[members];
        n[3] = -123_456;
        u[3] = 1.234;
        u[4] = Double.NaN;
        List<String> notes = new java.util.ArrayList<>(java.util.Collections.nCopies(members, ""));
        notes.set(3, "flexural buckling, EN 1993-1-1 6.3.1");
        ViewCase c = new ViewCase("wind 45°", OptionalDouble.of(45),
                Map.of(Colouring.AXIAL, MemberScalars.of(n), Colouring.UTILISATION, MemberScalars.of(u),
                        Colouring.AZIMUTH, MemberScalars.of(new double[members])), List.of(), List.of(), notes);
        ViewData data = new ViewData(frame, List.of(c), Colouring.UTILISATION);
        Member m = frame.members().get(3);
        Map<Integer, Integer> index = frame.nodeIndex();
        Node i = frame.nodes().get(index.get(m.i()));
        Node j = frame.nodes().get(index.get(m.j()));
        double length = Math.sqrt(Math.pow(i.x() - j.x(), 2) + Math.pow(i.y() - j.y(), 2) + Math.pow(i.z() - j.z(), 2));
        String text = MemberDescription.of(data, 0, 3);
        assertTrue(text.startsWith("member " + m.id() + " · " + m.role().jsonName() + " · " + m.section().name()), text);
        assertTrue(text.contains(String.format(java.util.Locale.ROOT, "length %.3f m", length)), text);
        assertTrue(text.contains("N = -123.5 kN (compression)"), text);
        assertTrue(text.contains("utilisation 1.23 (over the limit)"), text);
        assertTrue(text.contains("governing azimuth 0°"), text);
        assertTrue(text.contains("flexural buckling, EN 1993-1-1 6.3.1"), text);
        String unchecked = MemberDescription.of(data, 0, 4);
        assertTrue(unchecked.contains("utilisation: not checked"), unchecked);
        assertTrue(!unchecked.contains("NaN"), unchecked);
    }
}
