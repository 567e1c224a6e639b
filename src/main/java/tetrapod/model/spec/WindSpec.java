package tetrapod.model.spec;

import java.util.List;
import java.util.Objects;

/** The wind method and its parameters, in file units (m/s, kPa, kg/m³). Closed family: one record per method. */
public sealed interface WindSpec permits WindSpec.En1991, WindSpec.Asce7, WindSpec.Uniform {

    /** The method's name in the file: en1991, asce7 or uniform. */
    String method();

    /**
     * EN 1991-1-4 §4 peak velocity pressure with EN 1993-3-1 Annex B lattice coefficients.
     *
     * @param basicSpeed       fundamental basic wind velocity v_b,0, m/s
     * @param terrain          terrain category (Table 4.1)
     * @param directionFactors c_dir for the 12 azimuth sectors of 30° centred on 0°, 30°, ... 330°
     *                         (azimuth as everywhere in Tetrapod: the direction the wind blows
     *                         towards); empty for c_dir = 1 in every direction
     * @param seasonFactor     c_season
     * @param orography        orography factor c0
     * @param structuralFactor c_s·c_d as the user gave it, or NaN when it is to be computed from the
     *                         tower's first sway frequency (EN 1991-1-4 §6.3.1, Annex B)
     * @param turbulenceFactor k_I
     * @param airDensity       ρ, kg/m³
     * @param structuralDamping δ_s, the logarithmic decrement of structural damping that the computed
     *                         c_s·c_d takes (EN 1991-1-4 F.5, Table F.2); used only when c_s·c_d is computed
     */
    record En1991(double basicSpeed, TerrainCategory terrain, List<Double> directionFactors, double seasonFactor,
                  double orography, double structuralFactor, double turbulenceFactor, double airDensity,
                  double structuralDamping)
            implements WindSpec {

        public static final double DEFAULT_AIR_DENSITY = 1.25;
        /**
         * δ_s of a lattice steel tower with welded joints, the lowest EN 1991-1-4 Table F.2 gives for
         * lattice steel towers (0.03 with high-resistance bolts, 0.05 with ordinary bolts; values
         * recalled): the side of a larger resonant response when the joints are not stated.
         */
        public static final double DEFAULT_STRUCTURAL_DAMPING = 0.02;

        public En1991 {
            Objects.requireNonNull(terrain, "terrain");
            directionFactors = directionFactors == null ? List.of() : List.copyOf(directionFactors);
        }

        /** With the default structural damping. */
        public En1991(double basicSpeed, TerrainCategory terrain, List<Double> directionFactors, double seasonFactor,
                      double orography, double structuralFactor, double turbulenceFactor, double airDensity) {
            this(basicSpeed, terrain, directionFactors, seasonFactor, orography, structuralFactor, turbulenceFactor,
                    airDensity, DEFAULT_STRUCTURAL_DAMPING);
        }

        @Override
        public String method() {
            return "en1991";
        }

        /** Whether c_s·c_d is to be computed from the tower rather than taken as given. */
        public boolean structuralFactorComputed() {
            return Double.isNaN(structuralFactor);
        }

        public En1991 withStructuralFactor(double value) {
            return new En1991(basicSpeed, terrain, directionFactors, seasonFactor, orography, value, turbulenceFactor,
                    airDensity, structuralDamping);
        }
    }

    /**
     * ASCE 7 velocity pressure (§26.10) with the trussed-tower force coefficients.
     *
     * @param edition               7-16 or 7-22
     * @param speed                 basic wind speed V, m/s
     * @param exposure              exposure category
     * @param topographicFactor     K_zt
     * @param elevationFactor       K_e
     * @param directionalityFactor  K_d
     * @param gustFactor            G as the user gave it, or NaN when it is to be computed from the tower's
     *                              first sway frequency (§26.11: 0.85 when rigid, G_f when flexible)
     * @param dampingRatio          β, fraction of critical, that a computed G_f takes (26.11-12); used only
     *                              when G is computed
     */
    record Asce7(Asce7Edition edition, double speed, Exposure exposure, double topographicFactor,
                 double elevationFactor, double directionalityFactor, double gustFactor, double dampingRatio)
            implements WindSpec {

        /**
         * β = δ/2π of {@link En1991#DEFAULT_STRUCTURAL_DAMPING} (0.0032): ASCE 7 gives no value for
         * lattice towers in its provisions; the lowest lattice-tower damping of EN 1991-1-4 Table F.2 is
         * the side of a larger resonant response (Tetrapod's choice).
         */
        public static final double DEFAULT_DAMPING_RATIO = En1991.DEFAULT_STRUCTURAL_DAMPING / (2 * Math.PI);

        public Asce7 {
            Objects.requireNonNull(edition, "edition");
            Objects.requireNonNull(exposure, "exposure");
        }

        /** With the default damping ratio. */
        public Asce7(Asce7Edition edition, double speed, Exposure exposure, double topographicFactor,
                     double elevationFactor, double directionalityFactor, double gustFactor) {
            this(edition, speed, exposure, topographicFactor, elevationFactor, directionalityFactor, gustFactor,
                    DEFAULT_DAMPING_RATIO);
        }

        /** Whether G is to be computed from the tower rather than taken as given. */
        public boolean gustFactorComputed() {
            return Double.isNaN(gustFactor);
        }

        public Asce7 withGustFactor(double value) {
            return new Asce7(edition, speed, exposure, topographicFactor, elevationFactor, directionalityFactor, value,
                    dampingRatio);
        }

        @Override
        public String method() {
            return "asce7";
        }
    }

    /**
     * A constant pressure on the members' projected areas, for historical or hand calculations.
     *
     * @param pressure         kPa
     * @param forceCoefficient dimensionless factor on the windward face's projected member area
     */
    record Uniform(double pressure, double forceCoefficient) implements WindSpec {
        @Override
        public String method() {
            return "uniform";
        }
    }
}
