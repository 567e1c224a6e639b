package tetrapod.load;

import java.util.List;

/**
 * What one face of a panel shows the wind blowing normal to it: the projected area of its
 * flat-sided members, of its circular members (by diameter, for their flow regime), and the gross
 * area of the face's outline. m².
 *
 * @param flat  projected area of flat-sided members (angles, given sections marked flat), m²
 * @param round projected area of circular members, per diameter
 * @param gross area enclosed by the face's outline, projected on a vertical plane, m²
 */
public record FaceAreas(double flat, List<RoundArea> round, double gross) {

    /** Projected area {@code area} (m²) of circular members of diameter {@code diameter} (m). */
    public record RoundArea(double diameter, double area) { }

    public FaceAreas {
        round = List.copyOf(round);
        if (!(gross > 0) || !(flat >= 0)) {
            throw new IllegalArgumentException("a face needs a gross area > 0 and member areas >= 0");
        }
    }

    /** Projected area of the circular members, m². */
    public double roundTotal() {
        return round.stream().mapToDouble(RoundArea::area).sum();
    }

    /** Projected area of all members, A_s (EN 1993-3-1) or A_f (ASCE 7), m². */
    public double total() {
        return flat + roundTotal();
    }

    /**
     * Solidity ratio φ = A / A_gross (EN 1993-3-1 Annex B.2.2; ε in ASCE 7), capped at 1: a face
     * cannot be more than solid (member areas overlap at joints and crossings).
     */
    public double solidity() {
        return Math.min(1.0, total() / gross);
    }
}
