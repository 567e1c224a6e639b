package tetrapod.load;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Force coefficients of square lattice towers against the published expressions, each value worked
 * by hand in the comments: EN 1993-3-1 Annex B (C1 = 2.25, C2 = 1.5) and ASCE 7 trussed towers.
 */
class LatticeCoefficientsTest {

    /**
     * EN 1993-3-1 Annex B.2.2, square towers:
     * flat 1.76 C1 (1 − C2 φ + φ²) = 3.96 (1 − 1.5φ + φ²): 0.1 → 3.96 × 0.86 = 3.4056; 0.2 → 3.96 × 0.74
     * = 2.9304; 0.3 → 3.96 × 0.64 = 2.5344; 0.5 → 3.96 × 0.5 = 1.98.
     * circular subcritical C1 (1 − C2 φ) + (C1 + 0.875) φ²: 0.1 → 1.9125 + 0.03125 = 1.94375;
     * 0.2 → 1.575 + 0.125 = 1.7; 0.3 → 1.2375 + 0.28125 = 1.51875; 0.5 → 0.5625 + 0.78125 = 1.34375.
     * circular supercritical 1.9 − √((1 − φ)(2.8 − 1.14 C1 + φ)), 2.8 − 2.565 = 0.235:
     * 0.1 → 1.9 − √(0.9 × 0.335) = 1.350910; 0.2 → 1.9 − √(0.8 × 0.435) = 1.310085;
     * 0.3 → 1.9 − √(0.7 × 0.535) = 1.288036; 0.5 → 1.9 − √(0.5 × 0.735) = 1.293782.
     */
    @ParameterizedTest
    @CsvSource({"0.1, 3.4056, 1.94375, 1.350910", "0.2, 2.9304, 1.7, 1.310085", "0.3, 2.5344, 1.51875, 1.288036",
        "0.5, 1.98, 1.34375, 1.293782"})
    void en1993AnnexB(double phi, double flat, double subcritical, double supercritical) {
        assertEquals(flat, En1993LatticeCoefficients.flatSided(phi), 1e-9);
        assertEquals(subcritical, En1993LatticeCoefficients.circularSubcritical(phi), 1e-9);
        assertEquals(supercritical, En1993LatticeCoefficients.circularSupercritical(phi), 1e-6);
    }

    /**
     * ASCE 7 trussed towers, square: C_f = 4.0ε² − 5.9ε + 4.0: 0.1 → 0.04 − 0.59 + 4 = 3.45;
     * 0.2 → 0.16 − 1.18 + 4 = 2.98; 0.3 → 0.36 − 1.77 + 4 = 2.59; 0.5 → 1 − 2.95 + 4 = 2.05.
     * Rounded members 0.51ε² + 0.57 ≤ 1: 0.5751, 0.5904, 0.6159, 0.6975.
     * Diagonal wind 1 + 0.75ε ≤ 1.2: 1.075, 1.15, 1.2 (1.225 capped), 1.2.
     */
    @ParameterizedTest
    @CsvSource({"0.1, 3.45, 0.5751, 1.075", "0.2, 2.98, 0.5904, 1.15", "0.3, 2.59, 0.6159, 1.2",
        "0.5, 2.05, 0.6975, 1.2"})
    void asce7TrussedTowers(double epsilon, double cf, double rounded, double diagonal) {
        assertEquals(cf, Asce7TrussedTowerCoefficients.forceCoefficient(epsilon), 1e-9);
        assertEquals(rounded, Asce7TrussedTowerCoefficients.roundedMemberFactor(epsilon), 1e-9);
        assertEquals(diagonal, Asce7TrussedTowerCoefficients.diagonalFactor(epsilon), 1e-9);
    }

    @Test
    void roundedMemberFactorIsCappedAtOne() {
        // ε = 0.95: 0.51 × 0.9025 + 0.57 = 1.030 > 1.0
        assertEquals(1.0, Asce7TrussedTowerCoefficients.roundedMemberFactor(0.95), 0);
    }

    /** Cross-check of the two implementations: at φ = 0.2 the square-tower coefficients are 2.93 (EN) and 2.98 (ASCE). */
    @Test
    void theTwoStandardsAgreeWithinTwoPercentAtSolidityPointTwo() {
        FaceAreas face = new FaceAreas(0.2, List.of(), 1.0);
        double en = new En1993LatticeCoefficients().of(face, 30).cf();
        double asce = new Asce7TrussedTowerCoefficients().of(face, 30).cf();
        assertEquals(2.93, en, 0.005);
        assertEquals(2.98, asce, 1e-9);
        assertTrue(Math.abs(en - asce) / asce < 0.02, en + " vs " + asce);
    }

    /** EN 1993-3-1 K_θ = 1 + K1 K2 sin²2θ, K1 = 0.55 for flat members, K2 = φ for 0.2 < φ ≤ 0.5 (recalled from memory). */
    @Test
    void incidenceFactorOfFlatMembers() {
        FaceCoefficient c = new En1993LatticeCoefficients().of(new FaceAreas(0.3, List.of(), 1.0), 30);
        assertEquals(2.5344, c.cf(), 1e-9);
        assertEquals(1 + 0.55 * 0.3, c.incidenceFactor(45), 1e-12);
        assertEquals(1.0, c.incidenceFactor(0), 1e-12);
        assertEquals(1.0, c.incidenceFactor(90), 1e-12);
        // 30° from the normal: sin²60° = 0.75
        assertEquals(1 + 0.55 * 0.3 * 0.75, c.incidenceFactor(30), 1e-12);
        // K2 is 0.2 at φ ≤ 0.2 and from 0.8, 1 − φ between 0.5 and 0.8
        assertEquals(0.2, En1993LatticeCoefficients.incidenceK2(0.1), 0);
        assertEquals(0.4, En1993LatticeCoefficients.incidenceK2(0.6), 1e-15);
        assertEquals(0.2, En1993LatticeCoefficients.incidenceK2(0.9), 0);
    }

    @Test
    void mixedMembersAreWeightedByArea() {
        // half flat, half tubes of 60 mm in 10 m/s wind: Re = 0.06 × 10 / 15e-6 = 40 000 < 4e5, subcritical.
        // φ = 0.3: cf = (2.5344 + 1.51875)/2 = 2.026575; K1 = (0.55 × 0.15 + 0.8 × 0.15)/0.3 = 0.675.
        FaceAreas face = new FaceAreas(0.15, List.of(new FaceAreas.RoundArea(0.06, 0.15)), 1.0);
        FaceCoefficient c = new En1993LatticeCoefficients().of(face, 10);
        assertEquals(2.026575, c.cf(), 1e-9);
        assertEquals(0.675 * 0.3, c.incidenceAmplitude(), 1e-12);
        // a 200 mm tube at 40 m/s: Re = 0.2 × 40 / 15e-6 = 533 333 ≥ 4e5, supercritical: (2.5344 + 1.288036)/2
        FaceAreas big = new FaceAreas(0.15, List.of(new FaceAreas.RoundArea(0.2, 0.15)), 1.0);
        assertEquals((2.5344 + 1.288036) / 2, new En1993LatticeCoefficients().of(big, 40).cf(), 1e-6);
        // ASCE 7: the rounded factor on the tube share: 2.59 × (0.15 + 0.15 × 0.6159)/0.3
        assertEquals(2.59 * (1 + 0.6159) / 2, new Asce7TrussedTowerCoefficients().of(face, 10).cf(), 1e-9);
    }
}
