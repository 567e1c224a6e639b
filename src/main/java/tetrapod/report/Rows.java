package tetrapod.report;

import java.util.List;

/**
 * The rows of a results document the report and the CSV tables read, as typed values. SI units as
 * in results.json: N, m, Pa, degrees for azimuths.
 */
public final class Rows {

    private Rows() { }

    /** The largest value of something over the load cases, N, and where (case null when it never occurs). */
    public record Peak(double value, String caseId, Double azimuthDeg) {
        public boolean occurs() {
            return caseId != null;
        }
    }

    /** A member of the model with its geometry: length and the heights of its ends, m. */
    public record MemberRow(int id, int i, int j, String role, int segment, int panel, String face, String section,
                            double area, double iy, double iz, double length, double zLow, double zHigh) {
        public double zMid() {
            return (zLow + zHigh) / 2;
        }
    }

    /** A member's governing check over every case, and its largest tension and compression (both ≥ 0, N). */
    public record CheckRow(int member, double utilisation, String mode, String clause, String note, String caseId,
                           Double azimuthDeg, Peak maxTension, Peak maxCompression) { }

    /**
     * One requirement of one member (a rule that does not depend on the load): its ratio to the
     * limit and whether it is met.
     */
    public record RequirementRow(int member, String rule, double ratio, boolean met, String clause, String note) {

        /** The rule's name for people. */
        public String ruleLabel() {
            for (tetrapod.check.CheckMode m : tetrapod.check.CheckMode.values()) {
                if (m.jsonName().equals(rule)) {
                    return m.label();
                }
            }
            return rule;
        }
    }

    /** One footing check of a leg base; reactions "factored" or "service" (the rule's level). */
    public record FootingCheck(String name, double utilisation, String clause, String note, String caseId,
                               Double azimuthDeg, String reactions) { }

    /** A leg base's footing checks; concrete volume in m³. */
    public record FootingRow(int node, List<FootingCheck> checks, double concreteVolumeRequired) {
        public FootingRow {
            checks = List.copyOf(checks);
        }
    }

    /** A leg base at (x, y) (m) with its governing compression, uplift and shear, N. */
    public record LegBaseRow(int node, double x, double y, Peak compression, Peak uplift, Peak shear) { }

    /** The wind on one panel at one azimuth: heights m, q Pa, area m², forces N. */
    public record PanelRow(int panel, double zBottom, double zTop, double zRef, double q, double solidity, double cf,
                           double area, double fx, double fy) {
        public double force() {
            return Math.hypot(fx, fy);
        }
    }

    /** The panels' wind at one reported azimuth. */
    public record WindRow(double azimuthDeg, List<PanelRow> panels) {
        public WindRow {
            panels = List.copyOf(panels);
        }
    }

    /** A leg base's vertical and horizontal reaction against azimuth for one combination, N. */
    public record LegSweep(int node, String combination, List<Double> azimuthDeg, List<Double> fz, List<Double> fh) {
        public LegSweep {
            azimuthDeg = List.copyOf(azimuthDeg);
            fz = List.copyOf(fz);
            fh = List.copyOf(fh);
        }
    }

    /** The largest member utilisation at one azimuth of the sweep. */
    public record AzimuthPeak(double azimuthDeg, double utilisation, int member, String combination) { }

    /**
     * One natural mode: frequency in Hz, period in s, kind, sway direction in degrees (null unless
     * sway) and effective modal mass fractions in x, y, z and about the vertical axis.
     */
    public record ModeRow(int number, double frequencyHz, double periodS, String kind, Double swayDirectionDeg,
                          double massX, double massY, double massZ, double inertiaZ) { }

    /**
     * The hand method beside the analysis in one case: total vertical load N (N), horizontal
     * resultant H (N) at height zH (m), moment M (N·m), base diagonal d (m); hand and analysis leg
     * compression and uplift (N).
     */
    public record HandRow(String combination, double azimuthDeg, double n, double h, double zH, double m, double d,
                          double handCompression, double handUplift, double feCompression, double feUplift,
                          double compressionDiffPct, double upliftDiffPct) { }

    /**
     * One hand-method comparison in the case where the analysis' value is largest: the combination
     * that governs the quantity, the azimuth, N (N), M (N·m), the hand and analysis values (N) and
     * their difference (percent).
     */
    public record HandCase(String combination, double azimuthDeg, double n, double m, double hand, double fe,
                           double differencePct) { }

    /**
     * The ice the analysis used: the rule ("asce7": from the map values; "given"), the map's nominal
     * thickness (m), I_i and K_zt (NaN for the given rule), whether it grows with height, and the
     * design thickness (m) at the reference height and at the top (heights in m).
     */
    public record IceRow(String rule, double nominal, double importanceFactor, double topographicFactor,
                         boolean heightFactor, double referenceHeight, double atReference, double topHeight,
                         double atTop) { }

    /**
     * One movement of a level or an ancillary over the serviceability sweep: the largest value (m for
     * sway, rad for tilt and twist), the wind azimuth (degrees, null without wind) and height (m) where
     * it occurs, the limit (same unit; NaN for none) and whether it is met (null without a limit).
     */
    public record MovementRow(double value, Double azimuthDeg, double z, double limit, Boolean met) {
        public boolean hasLimit() {
            return !Double.isNaN(limit);
        }
    }

    /**
     * A level ({@code kind} "level", {@code level} its index, zFrom = zTo its height) or an ancillary
     * ("point" or "linear", level −1) with its sway, tilt and twist; heights in m.
     */
    public record ServiceRow(String kind, String name, int level, String face, double zFrom, double zTo,
                             MovementRow sway, MovementRow tilt, MovementRow twist) {

        public boolean isLevel() {
            return kind.equals("level");
        }

        /** The movement called {@code label} (sway, tilt, twist). */
        public MovementRow movement(String label) {
            return switch (label) {
                case "sway" -> sway;
                case "tilt" -> tilt;
                case "twist" -> twist;
                default -> throw new IllegalArgumentException("no movement '" + label + "'");
            };
        }

        public boolean hasLimits() {
            return sway.hasLimit() || tilt.hasLimit() || twist.hasLimit();
        }
    }

    /**
     * The serviceability combination and its wind: the rule for people (empty without wind), the
     * return period (years), c_prob, speed (m/s) and pressure ratio, each NaN where it does not apply.
     */
    public record ServiceCase(String combination, String windRule, double returnPeriod, double probabilityFactor,
                              double speed, double pressureRatio) { }

    /** A load combination and its factors by action name. */
    public record CombinationRow(String name, java.util.Map<String, Double> factors, boolean wind) {
        public CombinationRow {
            factors = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(factors));
        }
    }
}
