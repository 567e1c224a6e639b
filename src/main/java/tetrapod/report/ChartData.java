package tetrapod.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import tetrapod.report.Rows.CheckRow;
import tetrapod.report.Rows.LegSweep;
import tetrapod.report.Rows.MemberRow;
import tetrapod.report.Rows.PanelRow;
import tetrapod.report.Rows.WindRow;

/** The numbers behind each chart, taken from the results (SI units, as in results.json). */
final class ChartData {

    /**
     * The lines of one movement ("sway", "tilt", "twist") against height for the serviceability chart,
     * x in mm (sway) or degrees, y the height in m: the levels' envelope (bottom to top), the ancillaries
     * at the height of their largest value, the levels' limits (a line through the levels that have
     * one, broken by a NaN point where a level has none) and the ancillaries' limits at their height.
     */
    static List<List<Point>> movementLines(List<Rows.ServiceRow> rows, String movement) {
        double scale = movement.equals("sway") ? 1e3 : 180 / Math.PI;
        List<Point> levels = new ArrayList<>();
        List<Point> items = new ArrayList<>();
        List<Point> levelLimits = new ArrayList<>();
        List<Point> itemLimits = new ArrayList<>();
        for (Rows.ServiceRow r : rows) {
            Rows.MovementRow m = r.movement(movement);
            if (r.isLevel()) {
                levels.add(new Point(m.value() * scale, r.zFrom()));
                levelLimits.add(new Point(m.hasLimit() ? m.limit() * scale : Double.NaN, r.zFrom()));
            } else {
                items.add(new Point(m.value() * scale, m.z()));
                if (m.hasLimit()) {
                    itemLimits.add(new Point(m.limit() * scale, m.z()));
                }
            }
        }
        boolean anyLevelLimit = levelLimits.stream().anyMatch(p -> !Double.isNaN(p.x()));
        return List.of(List.copyOf(levels), List.copyOf(items), anyLevelLimit ? List.copyOf(levelLimits) : List.of(),
                List.copyOf(itemLimits));
    }

    /** Utilisation bins of the histogram: [0, 0.1), [0.1, 0.2), ... [0.9, 1.0], then above 1. */
    static final int BINS = 11;

    private ChartData() { }

    /** A point of a plotted line. */
    record Point(double x, double y) { }

    /** Per leg node, the largest value at each azimuth over every combination: compression (Fz > 0) or uplift (−Fz > 0), N. */
    static Map<Integer, List<Point>> legBaseEnvelope(List<LegSweep> sweeps, boolean uplift) {
        Map<Integer, TreeMap<Double, Double>> byNode = new TreeMap<>();
        for (LegSweep s : sweeps) {
            TreeMap<Double, Double> line = byNode.computeIfAbsent(s.node(), k -> new TreeMap<>());
            for (int k = 0; k < s.azimuthDeg().size(); k++) {
                double v = uplift ? -s.fz().get(k) : s.fz().get(k);
                line.merge(s.azimuthDeg().get(k), Math.max(0, v), Math::max);
            }
        }
        return points(byNode);
    }

    /** Per leg node, the largest horizontal reaction at each azimuth over every combination, N. */
    static Map<Integer, List<Point>> legBaseShear(List<LegSweep> sweeps) {
        Map<Integer, TreeMap<Double, Double>> byNode = new TreeMap<>();
        for (LegSweep s : sweeps) {
            TreeMap<Double, Double> line = byNode.computeIfAbsent(s.node(), k -> new TreeMap<>());
            for (int k = 0; k < s.azimuthDeg().size(); k++) {
                line.merge(s.azimuthDeg().get(k), s.fh().get(k), Math::max);
            }
        }
        return points(byNode);
    }

    private static Map<Integer, List<Point>> points(Map<Integer, TreeMap<Double, Double>> byNode) {
        Map<Integer, List<Point>> out = new LinkedHashMap<>();
        byNode.forEach((node, line) -> {
            List<Point> p = new ArrayList<>();
            line.forEach((a, v) -> p.add(new Point(a, v)));
            out.put(node, List.copyOf(p));
        });
        return out;
    }

    /**
     * The legs' axial force envelope against height: for each band of height between leg nodes, the
     * largest tension (x ≥ 0) and the largest compression (x ≤ 0, tension positive) over the four
     * legs, N; as staircases (two points per band, bottom and top).
     */
    static List<List<Point>> legAxialEnvelope(Results results) {
        TreeMap<Double, double[]> bands = new TreeMap<>(); // zLow → [zHigh, tension, compression]
        for (CheckRow c : results.checks()) {
            MemberRow m = results.member(c.member());
            if (!"leg".equals(m.role())) {
                continue;
            }
            double key = Math.round(m.zLow() * 1e6) / 1e6;
            double[] band = bands.computeIfAbsent(key, k -> new double[] {m.zHigh(), 0, 0});
            band[0] = Math.max(band[0], m.zHigh());
            band[1] = Math.max(band[1], c.maxTension().value());
            band[2] = Math.max(band[2], c.maxCompression().value());
        }
        List<Point> tension = new ArrayList<>();
        List<Point> compression = new ArrayList<>();
        bands.forEach((zLow, b) -> {
            tension.add(new Point(b[1], zLow));
            tension.add(new Point(b[1], b[0]));
            compression.add(new Point(-b[2], zLow));
            compression.add(new Point(-b[2], b[0]));
        });
        return List.of(List.copyOf(tension), List.copyOf(compression));
    }

    /** Members per utilisation bin, per role in the order of {@link tetrapod.model.Role}: role → counts[BINS]. */
    static Map<String, int[]> histogram(Results results) {
        Map<String, int[]> out = new LinkedHashMap<>();
        for (tetrapod.model.Role role : tetrapod.model.Role.values()) {
            for (CheckRow c : results.checks()) {
                if (results.member(c.member()).role().equals(role.jsonName())) {
                    out.computeIfAbsent(role.jsonName(), k -> new int[BINS]);
                    break;
                }
            }
        }
        for (CheckRow c : results.checks()) {
            String role = results.member(c.member()).role();
            out.computeIfAbsent(role, k -> new int[BINS])[bin(c.utilisation())]++;
        }
        return out;
    }

    /** The histogram bin of utilisation u: 0.1 wide up to 1.0 (1.0 itself in the last of them), then one above 1. */
    static int bin(double u) {
        if (u > 1.0) {
            return BINS - 1;
        }
        return Math.min((int) Math.floor(u * 10), BINS - 2);
    }

    /** The label of bin k: "0.0–0.1", ..., "0.9–1.0", "> 1.0". */
    static String binLabel(int k) {
        return k == BINS - 1 ? "> 1.0" : Format.fixed(k / 10.0, 1) + "–" + Format.fixed((k + 1) / 10.0, 1);
    }

    /**
     * The pressure profiles q against height as staircases over each panel (x = q in Pa, y = z in m),
     * one per reported azimuth whose profile differs from every earlier one.
     */
    static Map<Double, List<Point>> pressureProfiles(List<WindRow> wind) {
        Map<Double, List<Point>> out = new LinkedHashMap<>();
        List<List<Double>> seen = new ArrayList<>();
        for (WindRow w : wind) {
            List<Double> qs = w.panels().stream().map(PanelRow::q).toList();
            if (seen.stream().anyMatch(s -> same(s, qs))) {
                continue;
            }
            seen.add(qs);
            List<Point> line = new ArrayList<>();
            for (PanelRow p : w.panels()) {
                line.add(new Point(p.q(), p.zBottom()));
                line.add(new Point(p.q(), p.zTop()));
            }
            out.put(w.azimuthDeg(), List.copyOf(line));
        }
        return out;
    }

    private static boolean same(List<Double> a, List<Double> b) {
        if (a.size() != b.size()) {
            return false;
        }
        for (int k = 0; k < a.size(); k++) {
            if (Math.abs(a.get(k) - b.get(k)) > 1e-9 * Math.max(1, Math.abs(a.get(k)))) {
                return false;
            }
        }
        return true;
    }
}
