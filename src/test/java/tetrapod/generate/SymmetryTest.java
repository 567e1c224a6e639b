package tetrapod.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.Vec3;
import tetrapod.model.spec.Bracing;
import tetrapod.model.spec.Horizontals;
import tetrapod.model.spec.SegmentSpec;

/**
 * A square tower maps onto itself under a 90° rotation about z, (x, y) → (−y, x), which takes
 * leg k to leg k+1: the node set and the member set (as pairs of end points, with their roles)
 * both map onto themselves within 1e-9 m.
 */
class SymmetryTest {

    private static final double TOL = 1e-9;

    static Stream<Arguments> towers() {
        List<Arguments> towers = new ArrayList<>();
        for (Bracing bracing : Bracing.values()) {
            for (int r = 0; r <= 2; r++) {
                towers.add(Arguments.of(bracing, r));
            }
        }
        return towers.stream();
    }

    @ParameterizedTest(name = "{0} redundants={1}")
    @MethodSource("towers")
    void squareTowerIsSymmetricUnderQuarterTurn(Bracing bracing, int redundants) throws Exception {
        List<SegmentSpec> segments = List.of(
                Specs.segment(12.0, 4.0, 4.0, 3, bracing, Horizontals.ALL, true, redundants),
                Specs.segment(6.0, 4.0, 4.0, 2, bracing, Horizontals.ENDS, false, redundants),
                Specs.segment(5.0, 2.0, 2.0, 3, Bracing.SINGLE, Horizontals.NONE, false, 0));
        Frame frame = Specs.generate(Specs.tower(6.0, 6.0, segments, List.of(0.0, 12.0, 18.0))).frame();

        List<Vec3> nodes = frame.nodes().stream().map(n -> n.position()).toList();
        for (Vec3 p : nodes) {
            Vec3 turned = quarterTurn(p);
            assertTrue(nodes.stream().anyMatch(q -> q.distanceTo(turned) < TOL), "no node at the image of " + p);
        }

        List<Bar> bars = frame.members().stream().map(m -> Bar.of(frame, m)).toList();
        for (Bar bar : bars) {
            Bar turned = new Bar(quarterTurn(bar.a()), quarterTurn(bar.b()), bar.role());
            assertEquals(1, bars.stream().filter(other -> other.sameAs(turned)).count(),
                    "image of a " + bar.role() + " from " + bar.a() + " to " + bar.b());
        }
    }

    private static Vec3 quarterTurn(Vec3 p) {
        return new Vec3(-p.y(), p.x(), p.z());
    }

    private record Bar(Vec3 a, Vec3 b, Role role) {
        static Bar of(Frame frame, Member m) {
            return new Bar(FrameChecks.at(frame, m.i()), FrameChecks.at(frame, m.j()), m.role());
        }

        boolean sameAs(Bar o) {
            return role == o.role && (a.distanceTo(o.a) < TOL && b.distanceTo(o.b) < TOL
                    || a.distanceTo(o.b) < TOL && b.distanceTo(o.a) < TOL);
        }
    }
}
