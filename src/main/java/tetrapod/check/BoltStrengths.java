package tetrapod.check;

import tetrapod.common.Units;
import tetrapod.model.spec.BoltGrade;

/** Nominal strengths of bolt property classes, EN 1993-1-8 Table 3.1 (same as ISO 898-1), Pa. */
final class BoltStrengths {

    private BoltStrengths() { }

    /** Ultimate tensile strength f_ub, Pa. EN 1993-1-8 Table 3.1. */
    static double ultimate(BoltGrade grade) {
        return switch (grade) {
            case G4_6 -> 400 * Units.MPA;
            case G5_6 -> 500 * Units.MPA;
            case G8_8 -> 800 * Units.MPA;
            case G10_9 -> 1000 * Units.MPA;
        };
    }

    /** Yield strength f_yb, Pa. EN 1993-1-8 Table 3.1. */
    static double yield(BoltGrade grade) {
        return switch (grade) {
            case G4_6 -> 240 * Units.MPA;
            case G5_6 -> 300 * Units.MPA;
            case G8_8 -> 640 * Units.MPA;
            case G10_9 -> 900 * Units.MPA;
        };
    }

    /**
     * α_v of the shear resistance when the shear plane passes through the threads: 0.6 for classes
     * 4.6, 5.6 and 8.8, 0.5 for 10.9 (EN 1993-1-8 Table 3.4). Through the unthreaded shank it is 0.6.
     */
    static double alphaVThreads(BoltGrade grade) {
        return grade == BoltGrade.G10_9 ? 0.5 : 0.6;
    }
}
