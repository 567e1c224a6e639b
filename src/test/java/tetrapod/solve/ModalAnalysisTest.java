package tetrapod.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Member;
import tetrapod.model.Node;
import tetrapod.model.Restraint;
import tetrapod.model.Support;
import tetrapod.model.Vec3;

/** Natural frequencies by subspace iteration against closed forms. */
class ModalAnalysisTest {

    private static final double E = 210e9;

    /**
     * Two equal bars in a line, fixed at one end, mass m at each free node: K = k [[2, −1], [−1, 1]],
     * M = m I, k = EA/L, so ω² = (k/m)(3 ∓ √5)/2 (the classic two-degree-of-freedom chain, solved in
     * closed form from det(K − ω² M) = 0).
     */
    @Test
    void aTwoMassChainHasItsClosedFormFrequencies() throws Exception {
        var bar = TestFrames.section("bar", 1e-4, 1e-8, 1e-8, 1e-9);
        Frame frame = TestFrames.frame("chain", Idealisation.TRUSS, TestFrames.STEEL,
                List.of(new Node(1, 0, 0, 0), new Node(2, 2, 0, 0), new Node(3, 4, 0, 0)),
                List.of(TestFrames.bar(1, 1, 2, bar), TestFrames.bar(2, 2, 3, bar)),
                List.of(new Support(1, Restraint.FIXED)));
        FactoredSystem system = Solver.factor(StructuralModel.of(frame));
        double m = 50;
        List<ModalAnalysis.Mode> modes = ModalAnalysis.lowest(system, new double[] {0, m, m}, 2);
        double k = E * 1e-4 / 2;
        assertEquals(k / m * (3 - Math.sqrt(5)) / 2, modes.get(0).omegaSquared(), 1e-9 * k / m);
        assertEquals(k / m * (3 + Math.sqrt(5)) / 2, modes.get(1).omegaSquared(), 1e-9 * k / m);
        // mass-normalised: Σ m φ² = 1
        double[] phi = modes.get(0).shape();
        assertEquals(1, m * (phi[6] * phi[6] + phi[12] * phi[12]), 1e-9);
        assertTrue(modes.get(0).residual() < 1e-9, "residual " + modes.get(0).residual());
    }

    /**
     * A. K. Chopra, <i>Dynamics of Structures</i>, the two-storey shear frame of Chapter 10's first
     * worked examples (example number recalled from memory as 10.4): lower storey mass 2m and
     * stiffness 2k, upper mass m and stiffness k give ω₁² = k/(2m), ω₂² = 2k/m, with modes (½, 1)
     * and (−1, 1). Worked again here from det(K − ω²M) = 0, K = [[3k, −k], [−k, k]],
     * M = diag(2m, m): 2m²ω⁴ − 5kmω² + 2k² = 0. The storeys are two bars in a line, k = EA/L.
     */
    @Test
    void theTwoStoreyShearFrameOfTheTextbookHasItsFrequenciesAndModes() throws Exception {
        var stiff = TestFrames.section("lower", 2e-4, 1e-8, 1e-8, 1e-9);
        var soft = TestFrames.section("upper", 1e-4, 1e-8, 1e-8, 1e-9);
        Frame frame = TestFrames.frame("shear frame", Idealisation.TRUSS, TestFrames.STEEL,
                List.of(new Node(1, 0, 0, 0), new Node(2, 3, 0, 0), new Node(3, 6, 0, 0)),
                List.of(TestFrames.bar(1, 1, 2, stiff), TestFrames.bar(2, 2, 3, soft)),
                List.of(new Support(1, Restraint.FIXED)));
        double m = 1200;
        double k = E * 1e-4 / 3;
        List<ModalAnalysis.Mode> modes = ModalAnalysis.lowest(Solver.factor(StructuralModel.of(frame)),
                new double[] {0, 2 * m, m}, 2);
        assertEquals(k / (2 * m), modes.get(0).omegaSquared(), 1e-9 * k / m);
        assertEquals(2 * k / m, modes.get(1).omegaSquared(), 1e-9 * k / m);
        double[] first = modes.get(0).shape();
        double[] second = modes.get(1).shape();
        assertEquals(0.5, first[6] / first[12], 1e-9);      // node 2 over node 3, along the line
        assertEquals(-1.0, second[6] / second[12], 1e-9);
    }

    /**
     * A 10 m cantilever of 40 beam-columns with the mass of 100 kg/m lumped at the nodes: the first
     * bending frequencies f = β² / (2π L²) √(EI / m̄), β₁ = 1.8751, β₂ = 4.6941 (Euler–Bernoulli
     * cantilever; e.g. R.D. Blevins, Formulas for Natural Frequency and Mode Shape, Table 8-1,
     * recalled from memory). Bending about the weaker axis first; lumped masses converge to within
     * 0.2 % here.
     */
    @Test
    void aCantileverHasTheEulerBernoulliFrequencies() throws Exception {
        int elements = 40;
        double length = 10;
        double iWeak = 2e-6;
        double iStrong = 8e-6;
        double perMetre = 100;
        var section = TestFrames.section("beam", 5e-3, iStrong, iWeak, 5e-6);
        List<Node> nodes = new ArrayList<>();
        List<Member> members = new ArrayList<>();
        double[] mass = new double[elements + 1];
        double lump = perMetre * length / elements;
        for (int k = 0; k <= elements; k++) {
            nodes.add(new Node(k + 1, 0, 0, length * k / elements));
            mass[k] = k == 0 ? 0 : k == elements ? lump / 2 : lump;
            if (k > 0) {
                members.add(TestFrames.beam(k, k, k + 1, section, Vec3.X));
            }
        }
        Frame frame = TestFrames.frame("cantilever", Idealisation.FRAME, TestFrames.STEEL, nodes, members,
                List.of(new Support(1, Restraint.FIXED)));
        List<ModalAnalysis.Mode> modes = ModalAnalysis.lowest(Solver.factor(StructuralModel.of(frame)), mass, 3);
        double weak = 1.8751 * 1.8751 / (2 * Math.PI * length * length) * Math.sqrt(E * iWeak / perMetre);
        double strong = 1.8751 * 1.8751 / (2 * Math.PI * length * length) * Math.sqrt(E * iStrong / perMetre);
        double second = 4.6941 * 4.6941 / (2 * Math.PI * length * length) * Math.sqrt(E * iWeak / perMetre);
        assertEquals(weak, modes.get(0).frequencyHz(), 0.002 * weak);
        assertEquals(strong, modes.get(1).frequencyHz(), 0.002 * strong);
        assertEquals(second, modes.get(2).frequencyHz(), 0.002 * second);
    }

    @Test
    void moreModesThanMassedTranslationsAreRefused() throws Exception {
        var bar = TestFrames.section("bar", 1e-4, 1e-8, 1e-8, 1e-9);
        Frame frame = TestFrames.frame("one bar", Idealisation.TRUSS, TestFrames.STEEL,
                List.of(new Node(1, 0, 0, 0), new Node(2, 2, 0, 0)), List.of(TestFrames.bar(1, 1, 2, bar)),
                List.of(new Support(1, Restraint.FIXED)));
        FactoredSystem system = Solver.factor(StructuralModel.of(frame));
        // node 2 of a lone bar: only its axial translation is free (the other two are auto-restrained)
        assertEquals(1, ModalAnalysis.lowest(system, new double[] {0, 10}, 1).size());
        assertThrows(IllegalArgumentException.class, () -> ModalAnalysis.lowest(system, new double[] {0, 10}, 2));
        assertThrows(IllegalArgumentException.class, () -> ModalAnalysis.lowest(system, new double[] {0, 10}, 0));
    }
}
