package tetrapod.check;

/**
 * A buckling length and what holds its two ends, for the methods whose effective slenderness
 * depends on the end connections (ASCE 10).
 *
 * @param length         m
 * @param eccentricEnds  ends (0 … 2) where the member stops and is bolted through one leg to
 *                       another member: normal framing eccentricity
 * @param continuousEnds ends (0 … 2) where the member runs on through the node (a crossing or a
 *                       redundant's node): concentric, and restrained by the continuing member
 */
public record BucklingSpan(double length, int eccentricEnds, int continuousEnds) {

    public BucklingSpan {
        if (!(length > 0) || !Double.isFinite(length)) {
            throw new IllegalArgumentException("a buckling length must be > 0 m, was " + length);
        }
        if (eccentricEnds < 0 || continuousEnds < 0 || eccentricEnds + continuousEnds > 2) {
            throw new IllegalArgumentException("a span has two ends");
        }
    }

    BucklingSpan scaled(double factor) {
        return new BucklingSpan(length * factor, eccentricEnds, continuousEnds);
    }
}
