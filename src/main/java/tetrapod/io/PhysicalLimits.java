package tetrapod.io;

/**
 * The ranges outside which a model file's numbers describe no lattice tower that this program can
 * compute (issue 13): every value the readers accept can be generated, loaded and solved without
 * overflow, without falling below the 1 µm node-merge tolerance, and within the work budget of
 * {@code cli.WorkBudget}. They are deliberately wide: they refuse nonsense, not unusual towers. No
 * standard gives them; each is our own choice, with the reason beside it, and
 * docs/tower-spec.schema.json and docs/user-guide.md ("Limits") state the same numbers (SchemaTest
 * and PhysicalLimitsTest hold the three together).
 */
final class PhysicalLimits {

    private PhysicalLimits() { }

    private static Bound closed(double min, double max) {
        return new Bound(min, true, max, true);
    }

    // geometry, m

    /** A segment's height: 0.1 m is far above the node tolerance; 1,000 m exceeds any lattice tower built. */
    static final Bound SEGMENT_HEIGHT = closed(0.1, 1000);
    /** The whole tower's height, m (the sum of the segments). */
    static final double MAX_TOWER_HEIGHT = 1000;
    /** A leg spacing at the base or at a segment top: 0.1 m (a slender mast) to 200 m (a very wide base). */
    static final Bound LEG_SPACING = closed(0.1, 200);
    /** How far a leg may lean from the vertical in a face, degrees: beyond 60° a "leg" is a beam. */
    static final double MAX_LEG_LEAN_DEGREES = 60;
    /** A panel's height: a panel shorter than 50 mm has no room for a connection. */
    static final double MIN_PANEL_HEIGHT = 0.05;
    /** A panel's height when the panels are given one by one. */
    static final Bound PANEL_HEIGHT = closed(MIN_PANEL_HEIGHT, 1000);
    /** A node coordinate of an explicit frame, m: within 10 km of the origin. */
    static final Bound COORDINATE = closed(-10_000, 10_000);
    /** A member of an explicit frame, m: a thousand times the node-merge tolerance. */
    static final double MIN_MEMBER_LENGTH = 0.001;
    /** A component of a member's orientation vector (any length: only its direction counts). */
    static final Bound ORIENTATION = closed(-1e6, 1e6);
    /** A height on the tower (plan bracing, ancillaries), m. */
    static final Bound HEIGHT_ON_TOWER = closed(0, MAX_TOWER_HEIGHT);

    // counts

    /** Segments of a generated tower. */
    static final int MAX_SEGMENTS = 200;
    /**
     * Panels of one segment, and of the whole tower: 5,000 panels are about 20,000 nodes and
     * 120,000 degrees of freedom with the redundants, well past the 50,000-DOF towers that
     * docs/performance.md measures, and still within the default heap.
     */
    static final int MAX_PANELS = 5000;
    /** Nodes and members of an explicit frame (the same order of size as {@link #MAX_PANELS}). */
    static final int MAX_FRAME_NODES = 20_000;
    static final int MAX_FRAME_MEMBERS = 100_000;
    /** Ancillaries, nodal loads and combinations of one model file. */
    static final int MAX_ANCILLARIES = 1000;
    static final int MAX_NODAL_LOADS = 20_000;
    static final int MAX_COMBINATIONS = 200;

    // material

    /** Young's modulus, MPa: aluminium alloys (about 70,000) to steels (about 210,000), with margin. */
    static final Bound YOUNGS_MODULUS = closed(50_000, 300_000);
    /** Poisson's ratio ν = E / 2G − 1 of an isotropic metal lies between 0 and 0.5: G from E/3 to E/2. */
    static final double MIN_POISSON = 0;
    static final double MAX_POISSON = 0.5;
    /** The shear modulus alone, MPa (its relation to E is checked apart). */
    static final Bound SHEAR_MODULUS = closed(16_000, 150_000);
    /** Yield and ultimate strengths, MPa: structural aluminium and steels up to high-strength grades. */
    static final Bound STRENGTH = closed(100, 1500);
    /** Density, kg/m³: aluminium (about 2,700) to steel (about 7,850), with margin. */
    static final Bound DENSITY = closed(2000, 10_000);

    // sections, as the file gives them

    /** A plate thickness, leg length, tube diameter, section width, mm. */
    static final Bound SECTION_MM = closed(1, 5000);
    /** A root or toe radius, mm. */
    static final Bound RADIUS_MM = closed(0, 500);
    /** A cross-section area, cm². */
    static final Bound AREA_CM2 = closed(0.01, 10_000);
    /** A second moment of area or torsion constant, cm⁴. */
    static final Bound SECOND_MOMENT_CM4 = closed(1e-4, 1e10);
    /** Mass per length, kg/m. */
    static final Bound MASS_PER_LENGTH = closed(0.01, 100_000);

    // loads

    /** A nodal force component, kN, or moment, kN·m: 100 MN is beyond any load on a tower. */
    static final Bound NODAL_FORCE = closed(-100_000, 100_000);
    /**
     * The orography factor c_o of EN 1991-1-4 4.3.3, dimensionless: 1 on flat ground and above 1
     * on hills (Annex A.3); the turbulence intensity divides by it (4.4), so it may not approach 0.
     */
    static final Bound OROGRAPHY = closed(0.5, 3);
    /**
     * The logarithmic decrement of structural damping δ_s (EN 1991-1-4 F.5), dimensionless: above 0
     * (the resonance factor (B.6) divides by it) and at most 0.3, twice the largest value Table F.2
     * lists for any structure (lattice steel towers 0.02 to 0.05; values recalled).
     */
    static final Bound LOG_DECREMENT = new Bound(0, false, 0.3, true);
    /** A damping ratio β (ASCE 7 (26.11-12) divides by it), fraction of critical: above 0, at most 0.05 (δ ≈ 0.3). */
    static final Bound DAMPING_RATIO = new Bound(0, false, 0.05, true);
    /** An ancillary's weight, kN (a 1,000 t item). */
    static final Bound ANCILLARY_WEIGHT = closed(0, 10_000);
    /** An ancillary's projected area, m². */
    static final Bound ANCILLARY_AREA = closed(0, 1000);
    /** A linear ancillary's weight, kN/m, and its width, m. */
    static final Bound LINEAR_WEIGHT = closed(0, 100);
    static final Bound LINEAR_WIDTH = closed(0, 10);

    // checks

    /** A partial factor on resistance or load (γ_M, γ_stb), dimensionless. */
    static final Bound PARTIAL_FACTOR = closed(0.5, 3);
    /** A factor of safety of an allowable-stress rule, dimensionless. */
    static final Bound FACTOR_OF_SAFETY = closed(1, 10);
    /** A buckling length factor, dimensionless. */
    static final Bound BUCKLING_FACTOR = closed(0.1, 5);
    /** Bolt and anchor rod diameters, mm. */
    static final Bound BOLT_DIAMETER_MM = closed(5, 100);
    static final Bound ROD_DIAMETER_MM = closed(6, 200);
    /** A hole clearance, mm. */
    static final Bound HOLE_CLEARANCE_MM = closed(0, 10);
    /** An end or edge distance or a pitch, mm. */
    static final Bound BOLT_DISTANCE_MM = closed(1, 1000);
    /** An allowable stress of an anchor rod, MPa. */
    static final Bound ALLOWABLE_STRESS = closed(1, 2000);
    /** A footing block's plan width and its height, m, and its depth below ground, m. */
    static final Bound BLOCK_SIZE = closed(0.1, 50);
    static final Bound BLOCK_DEPTH = closed(0, 50);
    /** Unit weights of concrete and soil, kN/m³. */
    static final Bound CONCRETE_UNIT_WEIGHT = closed(10, 30);
    static final Bound SOIL_UNIT_WEIGHT = closed(0, 30);
    /** An allowable bearing pressure, kPa. */
    static final Bound BEARING = closed(1, 10_000);
    /** A friction coefficient between footing and soil, dimensionless (the sliding check divides by it). */
    static final Bound FRICTION = closed(0.05, 2);
}
