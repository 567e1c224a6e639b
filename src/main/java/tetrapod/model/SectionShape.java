package tetrapod.model;

/** The cross-section's shape, in m. Closed family: angles, round tubes, sections given by properties. */
public sealed interface SectionShape permits SectionShape.Angle, SectionShape.Tube, SectionShape.Given {

    /** Width the member presents to wind blowing normal to a tower face, m. */
    double windWidth();

    /** Flat-sided members and circular ones have different lattice force coefficients. */
    boolean flatSided();

    /**
     * A hot-rolled angle: legs {@code legA} ≥ {@code legB}, thickness {@code t}, root radius
     * {@code r1} and toe radius {@code r2}, all in m. Equal angles have legA == legB.
     */
    record Angle(double legA, double legB, double t, double r1, double r2) implements SectionShape {
        @Override
        public double windWidth() {
            return legA;
        }

        @Override
        public boolean flatSided() {
            return true;
        }

        public boolean equalLegs() {
            return legA == legB;
        }
    }

    /** A circular hollow section: outside diameter {@code d}, wall thickness {@code t}, m. */
    record Tube(double d, double t) implements SectionShape {
        @Override
        public double windWidth() {
            return d;
        }

        @Override
        public boolean flatSided() {
            return false;
        }
    }

    /** A section the user gave by its properties: only its wind width and flatness are known. */
    record Given(double width, boolean flatSided) implements SectionShape {
        @Override
        public double windWidth() {
            return width;
        }
    }
}
