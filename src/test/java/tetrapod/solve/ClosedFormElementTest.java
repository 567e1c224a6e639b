package tetrapod.solve;

import tetrapod.model.NodeForce;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Section;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/**
 * Single members against closed-form results of elementary beam theory
 * (e.g. R.J. Roark, W.C. Young, <i>Roark's Formulas for Stress and Strain</i>, 7th ed., Table 8.1
 * case 1a; S. Timoshenko, <i>Strength of Materials</i> Part I): axial bar δ = PL/EA; cantilever
 * with an end load P: tip deflection PL³/3EI and tip rotation PL²/2EI; twist under an end torque
 * θ = TL/GJ. Every case is solved for members in random 3D orientations: the answer must rotate
 * with the problem.
 */
class ClosedFormElementTest {

    private static final double TOLERANCE = 1e-10; // relative
    private static final double L = 3.7;
    private static final double E = 210e9;
    private static final double G = 81e9;
    private static final Section SECTION = TestFrames.section("s", 4.2e-3, 9.1e-6, 2.3e-6, 3.1e-8); // Iy, Iz distinct

    /** Random orthonormal local axes (x, y, z = x × y), seeded; the first is the global frame. */
    /** Orthonormal local axes of a test member. */
    record Axes(Vec3 x, Vec3 y, Vec3 z) { }

    static Stream<Axes> orientations() {
        Random random = new Random(42);
        return IntStream.range(0, 12).mapToObj(k -> {
            if (k == 0) {
                return new Axes(Vec3.X, Vec3.Y, Vec3.Z);
            }
            Vec3 x = new Vec3(random.nextGaussian(), random.nextGaussian(), random.nextGaussian()).unit();
            Vec3 r = new Vec3(random.nextGaussian(), random.nextGaussian(), random.nextGaussian());
            Vec3 y = r.minus(x.times(r.dot(x))).unit();
            return new Axes(x, y, x.cross(y));
        });
    }

    private static Frame cantilever(Vec3 x, Vec3 y, Idealisation idealisation) {
        Vec3 tip = x.times(L);
        List<Node> nodes = List.of(new Node(1, 0, 0, 0), new Node(2, tip.x(), tip.y(), tip.z()));
        var member = idealisation == Idealisation.FRAME ? TestFrames.beam(1, 1, 2, SECTION, y)
                : TestFrames.bar(1, 1, 2, SECTION);
        return TestFrames.frame("cantilever", idealisation, TestFrames.material(E, G), nodes, List.of(member),
                List.of(new Support(1, idealisation == Idealisation.FRAME ? Restraint.FIXED : Restraint.PINNED)));
    }

    private static Solution solve(Frame frame, Vec3 force, Vec3 moment) throws Exception {
        FactoredSystem system = Solver.factor(StructuralModel.of(frame));
        return system.solve(new LoadVector("tip", List.of(new NodeForce(2, force.x(), force.y(), force.z(),
                moment.x(), moment.y(), moment.z()))));
    }

    private static void assertVec(Vec3 expected, Vec3 actual, double scale, String what) {
        assertEquals(expected.x(), actual.x(), TOLERANCE * scale, what + " x");
        assertEquals(expected.y(), actual.y(), TOLERANCE * scale, what + " y");
        assertEquals(expected.z(), actual.z(), TOLERANCE * scale, what + " z");
    }

    private static Vec3 translation(NodeDisplacement d) {
        return new Vec3(d.ux(), d.uy(), d.uz());
    }

    private static Vec3 rotation(NodeDisplacement d) {
        return new Vec3(d.rx(), d.ry(), d.rz());
    }

    @ParameterizedTest
    @MethodSource("orientations")
    void axialBarInATrussStretchesByPLOverEA(Axes axes) throws Exception {
        double p = 85e3;
        Solution s = solve(cantilever(axes.x(), axes.y(), Idealisation.TRUSS), axes.x().times(p), Vec3.ZERO);
        double delta = p * L / (E * SECTION.area()); // δ = PL/EA
        assertVec(axes.x().times(delta), translation(s.displacement(2)), delta, "tip");
        assertEquals(p, s.memberForces(1).axial(), 1e-9 * p, "N = P in tension");
        // the free end of a lone bar is a collinear node: two auto-restraints across the bar
        List<AutoRestraint> autos = StructuralModel.of(cantilever(axes.x(), axes.y(), Idealisation.TRUSS)).autoRestraints();
        assertEquals(2, autos.size());
        for (AutoRestraint a : autos) {
            assertEquals(2, a.node());
            assertEquals(0, a.direction().dot(axes.x()), 1e-12, "restrained direction is across the bar");
        }
    }

    @ParameterizedTest
    @MethodSource("orientations")
    void axialBeamColumnStretchesByPLOverEA(Axes axes) throws Exception {
        double p = -120e3;
        Solution s = solve(cantilever(axes.x(), axes.y(), Idealisation.FRAME), axes.x().times(p), Vec3.ZERO);
        double delta = p * L / (E * SECTION.area()); // δ = PL/EA
        assertVec(axes.x().times(delta), translation(s.displacement(2)), Math.abs(delta), "tip");
        assertVec(Vec3.ZERO, rotation(s.displacement(2)), Math.abs(delta) / L, "tip rotation");
        assertEquals(p, s.memberForces(1).axial(), 1e-9 * Math.abs(p), "N = P (compression negative)");
    }

    @ParameterizedTest
    @MethodSource("orientations")
    void cantileverLoadedAlongLocalYBendsAboutLocalZ(Axes axes) throws Exception {
        double p = 7.5e3;
        double iz = SECTION.properties().iv();
        Solution s = solve(cantilever(axes.x(), axes.y(), Idealisation.FRAME), axes.y().times(p), Vec3.ZERO);
        double deflection = p * L * L * L / (3 * E * iz); // PL³/3EI
        double slope = p * L * L / (2 * E * iz);          // PL²/2EI, positive about +z (v' = θz)
        assertVec(axes.y().times(deflection), translation(s.displacement(2)), deflection, "tip deflection");
        assertVec(axes.z().times(slope), rotation(s.displacement(2)), slope, "tip rotation");
        MemberEndForces f = s.memberForces(1);
        // end actions at the fixed end: shear −P along y, moment −P·L about z (statics of the free body)
        assertEquals(-p, f.atI().fy(), 1e-9 * p, "Vy at i");
        assertEquals(-p * L, f.atI().mz(), 1e-9 * p * L, "Mz at i");
        assertEquals(p, f.atJ().fy(), 1e-9 * p, "Vy at j");
        assertEquals(0, f.atJ().mz(), 1e-9 * p * L, "Mz at the free end");
    }

    @ParameterizedTest
    @MethodSource("orientations")
    void cantileverLoadedAlongLocalZBendsAboutLocalY(Axes axes) throws Exception {
        double p = 5.0e3;
        double iy = SECTION.properties().iu();
        Solution s = solve(cantilever(axes.x(), axes.y(), Idealisation.FRAME), axes.z().times(p), Vec3.ZERO);
        double deflection = p * L * L * L / (3 * E * iy); // PL³/3EI
        double slope = p * L * L / (2 * E * iy);          // PL²/2EI; w' = −θy so θy = −PL²/2EI
        assertVec(axes.z().times(deflection), translation(s.displacement(2)), deflection, "tip deflection");
        assertVec(axes.y().times(-slope), rotation(s.displacement(2)), slope, "tip rotation");
        MemberEndForces f = s.memberForces(1);
        assertEquals(-p, f.atI().fz(), 1e-9 * p, "Vz at i");
        assertEquals(p * L, f.atI().my(), 1e-9 * p * L, "My at i: the support's moment about +y");
    }

    @ParameterizedTest
    @MethodSource("orientations")
    void cantileverUnderEndMomentsAndTorque(Axes axes) throws Exception {
        double t = 2.0e3;
        double mz = 3.0e3;
        double j = SECTION.properties().torsion();
        double iz = SECTION.properties().iv();
        Vec3 moment = axes.x().times(t).plus(axes.z().times(mz));
        Solution s = solve(cantilever(axes.x(), axes.y(), Idealisation.FRAME), Vec3.ZERO, moment);
        double twist = t * L / (G * j);          // θ = TL/GJ
        double rot = mz * L / (E * iz);          // end moment: θ = ML/EI
        double defl = mz * L * L / (2 * E * iz); // δ = ML²/2EI
        assertVec(axes.x().times(twist).plus(axes.z().times(rot)), rotation(s.displacement(2)), twist + rot, "tip rotation");
        assertVec(axes.y().times(defl), translation(s.displacement(2)), defl, "tip deflection");
        assertEquals(-t, s.memberForces(1).atI().mx(), 1e-9 * t, "torque at i");
    }

    @Test
    void reactionsBalanceTheLoadOnARotatedCantilever() throws Exception {
        Axes axes = orientations().skip(3).findFirst().orElseThrow();
        Vec3 p = new Vec3(1.2e3, -3.4e3, 2.2e3);
        Solution s = solve(cantilever(axes.x(), axes.y(), Idealisation.FRAME), p, Vec3.ZERO);
        NodeForce r = s.reaction(1);
        Vec3 tip = axes.x().times(L);
        // statics: R = −P and M_R = −(tip × P) about the support at the origin
        assertVec(p.times(-1), r.force(), p.norm(), "reaction force");
        assertVec(tip.cross(p).times(-1), r.moment(), p.norm() * L, "reaction moment");
        assertEquals(0, s.equilibriumError(), 1e-12);
    }
}
