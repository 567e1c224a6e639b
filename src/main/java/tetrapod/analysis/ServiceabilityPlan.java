package tetrapod.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.common.Units;
import tetrapod.generate.Panel;
import tetrapod.generate.PanelLevel;
import tetrapod.generate.Tower;
import tetrapod.load.CaseKey;
import tetrapod.load.ServiceLoads;
import tetrapod.load.TowerLoads;
import tetrapod.model.Face;
import tetrapod.model.Node;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.model.spec.ServiceabilitySpec.LevelLimitSpec;
import tetrapod.model.spec.ServiceabilitySpec.LimitSpec;

/**
 * What the serviceability sweep measures and against what: the serviceability loads, the places
 * (each panel level; each ancillary at its height, or along its run for a linear item) and the limits
 * of each, in SI.
 *
 * <p>An ancillary between two panel levels moves as the straight-line interpolation of the two
 * levels' rigid-body motions, each taken at the item's attachment point in plan (the middle of its
 * face, or the tower's axis): its tilt and twist are the interpolated rotations, its sway the
 * horizontal translation of that point. A linear item is measured at its two ends and at every panel
 * level between them, and takes the largest of each movement.
 */
public final class ServiceabilityPlan {

    /**
     * A place measured: the motion of levels {@code below} and {@code above} (indices into the
     * tower's levels) at plan offsets from their leg centroids, mixed as (1 − fraction) below +
     * fraction above.
     */
    record Station(int below, int above, double fraction, double[] offsetBelow, double[] offsetAbove, double z) { }

    /** An ancillary: its stations (indices into {@link #stations()}) and limits. */
    record Item(AncillarySpec spec, List<Integer> stations, ServiceLimits limits) { }

    private final ServiceLoads loads;
    private final Tower tower;
    private final List<Station> stations;
    private final List<ServiceLimits> levelLimits;
    private final List<Item> items;

    private ServiceabilityPlan(ServiceLoads loads, Tower tower, List<Station> stations, List<ServiceLimits> levelLimits,
                               List<Item> items) {
        this.loads = loads;
        this.tower = tower;
        this.stations = List.copyOf(stations);
        this.levelLimits = List.copyOf(levelLimits);
        this.items = List.copyOf(items);
    }

    /**
     * The plan of a generated tower; empty for an explicit frame (no panel levels).
     *
     * @throws BadInputException when a range of {@code serviceability.levels} holds no panel level
     */
    public static java.util.Optional<ServiceabilityPlan> of(Tower tower, TowerLoads loads, ServiceabilitySpec spec)
            throws BadInputException {
        if (!tower.isGenerated()) {
            return java.util.Optional.empty();
        }
        List<PanelLevel> levels = tower.levels();
        Map<Integer, Node> nodes = new HashMap<>();
        tower.frame().nodes().forEach(n -> nodes.put(n.id(), n));
        List<Station> stations = new ArrayList<>();
        for (int l = 0; l < levels.size(); l++) {
            stations.add(new Station(l, l, 0, new double[3], new double[3], levels.get(l).z()));
        }
        List<ServiceLimits> levelLimits = levelLimits(levels, spec.levels());
        Map<String, LimitSpec> itemLimits = new HashMap<>();
        spec.ancillaries().forEach(a -> itemLimits.put(a.name(), a.limits()));
        List<Item> items = new ArrayList<>();
        for (AncillarySpec a : loads.ancillaries()) {
            List<Integer> at = new ArrayList<>();
            double top;
            if (a instanceof AncillarySpec.Point p) {
                at.add(stations.size());
                stations.add(station(tower, nodes, p.height(), p.face()));
                top = p.height();
            } else {
                AncillarySpec.Linear line = (AncillarySpec.Linear) a;
                List<Double> heights = new ArrayList<>();
                heights.add(line.from());
                levels.stream().map(PanelLevel::z).filter(z -> z > line.from() && z < line.to()).forEach(heights::add);
                heights.add(line.to());
                for (double z : heights) {
                    at.add(stations.size());
                    stations.add(station(tower, nodes, z, line.face()));
                }
                top = Double.NaN;
            }
            items.add(new Item(a, at, limits(itemLimits.getOrDefault(a.name(), LimitSpec.NONE), top)));
        }
        return java.util.Optional.of(new ServiceabilityPlan(loads.service(spec.wind()), tower, stations, levelLimits,
                items));
    }

    /**
     * The strictest limits of the ranges holding each level above the base (the base stands on the
     * supports); every range must hold one.
     */
    private static List<ServiceLimits> levelLimits(List<PanelLevel> levels, List<LevelLimitSpec> ranges)
            throws BadInputException {
        List<ServiceLimits> out = new ArrayList<>();
        levels.forEach(l -> out.add(ServiceLimits.NONE));
        List<Problem> problems = new ArrayList<>();
        for (int k = 0; k < ranges.size(); k++) {
            LevelLimitSpec r = ranges.get(k);
            double from = Double.isNaN(r.from()) ? Double.NEGATIVE_INFINITY : r.from() - 1e-9;
            double to = Double.isNaN(r.to()) ? Double.POSITIVE_INFINITY : r.to() + 1e-9;
            boolean any = false;
            for (int l = 1; l < levels.size(); l++) { // the base stands on the supports
                double z = levels.get(l).z();
                if (z >= from && z <= to) {
                    out.set(l, out.get(l).strictest(limits(r.limits(), z)));
                    any = true;
                }
            }
            if (!any) {
                problems.add(Problem.at("serviceability.levels[" + k + "]", "holds no panel level above the base; the levels are at "
                        + String.join(", ", levels.stream().skip(1).map(l -> CaseKey.degrees(l.z())).toList()) + " m"));
            }
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return out;
    }

    /** The limits in SI at height z (NaN: a linear item, whose sway limit is in mm only). */
    private static ServiceLimits limits(LimitSpec s, double z) {
        double sway = s.swayMm() * Units.MM;
        if (!Double.isNaN(s.swayHeightRatio()) && !Double.isNaN(z)) {
            double byHeight = z / s.swayHeightRatio();
            sway = Double.isNaN(sway) ? byHeight : Math.min(sway, byHeight);
        }
        return new ServiceLimits(sway, Math.toRadians(s.tiltDeg()), Math.toRadians(s.twistDeg()));
    }

    /** The station at height z on {@code face}, between the levels around z. */
    private static Station station(Tower tower, Map<Integer, Node> nodes, double z, Face face) {
        List<PanelLevel> levels = tower.levels();
        Panel panel = tower.panelAt(z).orElseThrow(() -> new IllegalArgumentException("height " + z + " m is outside the tower"));
        int below = levels.indexOf(panel.bottom());
        int above = levels.indexOf(panel.top());
        double fraction = Math.min(1, Math.max(0, (z - panel.zBottom()) / panel.height()));
        return new Station(below, above, fraction, offset(nodes, panel.bottom(), face), offset(nodes, panel.top(), face), z);
    }

    /** The middle of {@code face} at a level, from the centroid of its leg nodes (0 for {@link Face#NONE}), m. */
    private static double[] offset(Map<Integer, Node> nodes, PanelLevel level, Face face) {
        double[] out = new double[3];
        if (face == Face.NONE) {
            return out;
        }
        double[] centroid = new double[3];
        for (int id : level.legNodes()) {
            add(centroid, xyz(nodes.get(id)), 0.25);
        }
        for (int leg : Panel.legsOf(face)) {
            add(out, xyz(nodes.get(level.legNodes().get(leg))), 0.5);
        }
        add(out, centroid, -1);
        out[2] = 0;
        return out;
    }

    private static double[] xyz(Node n) {
        return new double[] {n.x(), n.y(), n.z()};
    }

    private static void add(double[] sum, double[] v, double factor) {
        for (int k = 0; k < 3; k++) {
            sum[k] += factor * v[k];
        }
    }

    public ServiceLoads loads() {
        return loads;
    }

    Tower tower() {
        return tower;
    }

    List<Station> stations() {
        return stations;
    }

    /** The limits of each panel level, bottom to top. */
    List<ServiceLimits> levelLimits() {
        return levelLimits;
    }

    List<Item> items() {
        return items;
    }
}
