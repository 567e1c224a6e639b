package tetrapod.analysis;

/**
 * One natural mode of the tower.
 *
 * @param number          1 for the lowest
 * @param frequencyHz     natural frequency, Hz
 * @param kind            what the mode mostly does, from its effective modal masses
 * @param swayDirectionDeg for a sway mode, the direction of its horizontal participation, degrees
 *                        from +x towards +y in [0, 180); null otherwise
 * @param massX           effective modal mass in x over the total mass (dimensionless, 0…1); likewise y, z
 * @param inertiaZ        effective rotational inertia about the tower's axis over the total (0…1)
 * @param residual        ‖K φ − ω² M φ‖ / ‖ω² M φ‖ of the computed mode (dimensionless)
 * @param shape           nodes × 6 (ux uy uz rx ry rz, tower axes, frame node order), mass-normalised
 *                        (Σ m φ·φ = 1), in m/√kg and rad/√kg
 */
public record NaturalMode(int number, double frequencyHz, Kind kind, Double swayDirectionDeg, double massX,
                          double massY, double massZ, double inertiaZ, double residual, double[] shape) {

    /** What a mode mostly does. */
    public enum Kind {
        SWAY("sway"), TORSION("torsion"), VERTICAL("vertical"),
        /**
         * Moves parts of the tower against each other with almost no net sway, twist or lift (a
         * member's vibration, a distortion of the cross-section): effective modal masses below 5 %
         * in all ({@code NaturalModes}).
         */
        INTERNAL("internal");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /** Period, s. */
    public double periodS() {
        return 1 / frequencyHz;
    }
}
