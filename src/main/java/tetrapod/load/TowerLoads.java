package tetrapod.load;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.common.Units;
import tetrapod.generate.Tower;
import tetrapod.model.NodeForce;
import tetrapod.model.Node;
import tetrapod.model.spec.AncillarySpec;
import tetrapod.model.spec.CombinationSpec;
import tetrapod.model.spec.LoadAction;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.model.spec.WindSpec;

/**
 * Every load on a tower, ready to solve: the azimuth-independent parts (dead, ice, nodal), the
 * wind on the bare and on the iced tower, the combinations and the azimuths of the sweep. The
 * entry point of this package.
 *
 * <p>Two ways to the load cases:
 * <ul>
 * <li>direct: {@link #loadCase(CaseKey)} forms Σ factor × component with the wind at the case's
 *     azimuth ({@link WindLoads#at});</li>
 * <li>by superposition: {@link #basis()} gives a few azimuth-independent load vectors and, for any
 *     combination and azimuth, their weights; solve each vector once and superpose.</li>
 * </ul>
 * Both give the same load vector (a test checks it at arbitrary azimuths).
 */
public final class TowerLoads {

    private final Tower tower;
    private final List<NodeForce> selfWeight;
    private final List<NodeForce> ancillaryWeight;
    private final List<NodeForce> dead;
    private final List<NodeForce> ice;
    private final Asce7Ice icing;
    private final List<NodeForce> nodal;
    private final WindLoads wind;
    private final WindLoads windOnIce;
    private final List<Combination> combinations;
    private final List<Combination> serviceCombinations;
    private final double sweepStep;
    private final LoadBasis basis;
    private final WindSpec windSpec;
    private final Ancillaries items;
    private final boolean asce;

    private TowerLoads(Tower tower, List<NodeForce> selfWeight, List<NodeForce> ancillaryWeight, List<NodeForce> ice,
                       Asce7Ice icing, List<NodeForce> nodal, WindLoads wind, WindLoads windOnIce, List<Combination> combinations,
                       List<Combination> serviceCombinations, double sweepStep, WindSpec windSpec, Ancillaries items,
                       boolean asce) {
        this.tower = tower;
        this.windSpec = windSpec;
        this.items = items;
        this.asce = asce;
        this.serviceCombinations = List.copyOf(serviceCombinations);
        this.selfWeight = List.copyOf(selfWeight);
        this.ancillaryWeight = List.copyOf(ancillaryWeight);
        NodalLoads d = new NodalLoads();
        d.add(selfWeight, 1);
        d.add(ancillaryWeight, 1);
        this.dead = d.toList();
        this.ice = List.copyOf(ice);
        this.icing = icing;
        this.nodal = List.copyOf(nodal);
        this.wind = wind;
        this.windOnIce = windOnIce;
        this.combinations = List.copyOf(combinations);
        this.sweepStep = sweepStep;
        List<LoadComponent> fixed = new ArrayList<>();
        fixed.add(new LoadComponent("dead", LoadAction.DEAD, dead));
        if (!ice.isEmpty()) {
            fixed.add(new LoadComponent("ice", LoadAction.ICE, this.ice));
        }
        if (!nodal.isEmpty()) {
            fixed.add(new LoadComponent("nodal", LoadAction.NODAL, this.nodal));
        }
        this.basis = new LoadBasis(fixed, wind == null ? null : wind.basis(),
                windOnIce == null ? null : windOnIce.basis());
    }

    /**
     * The loads of {@code spec} on {@code tower}.
     *
     * @param tower the tower generated from the same model file (not modified)
     * @param spec  the file's loads, as read (kN, kN·m, m/s, kPa, mm)
     * @throws BadInputException listing every problem found with the tower in hand (nodal loads on
     *                           missing nodes, wind on an explicit frame, a profile taller than its
     *                           method allows, items outside the tower, combinations without their loads)
     */
    public static TowerLoads build(Tower tower, LoadsSpec spec) throws BadInputException {
        List<Problem> problems = check(tower, spec);
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        List<NodeForce> nodal = new ArrayList<>();
        for (LoadsSpec.NodalLoadSpec n : spec.nodal()) {
            nodal.add(new NodeForce(n.node(), n.fx() * Units.KN, n.fy() * Units.KN, n.fz() * Units.KN,
                    n.mx() * Units.KNM, n.my() * Units.KNM, n.mz() * Units.KNM));
        }
        NodalLoads mergedNodal = new NodalLoads();
        mergedNodal.add(nodal, 1);
        List<NodeForce> selfWeight = SelfWeight.of(tower.frame(), tower.connectionAllowance());
        Asce7Ice ice = WindProfiles.ice(spec.ice(), spec.wind());
        List<NodeForce> ancillaryWeight = List.of();
        List<NodeForce> iceWeight = List.of();
        WindLoads wind = null;
        WindLoads windOnIce = null;
        Ancillaries items = null;
        if (tower.isGenerated()) {
            items = Ancillaries.of(tower, spec.ancillaries());
            ancillaryWeight = items.weights();
            if (spec.hasIce()) {
                NodalLoads iced = new NodalLoads();
                iced.add(ice.memberWeights(tower.frame()), 1);
                iced.add(items.iceWeights(ice), 1);
                iceWeight = iced.toList();
            }
            if (spec.hasWind()) {
                wind = WindLoads.of(WindProfiles.of(spec.wind()), tower, Asce7Ice.NONE, items);
                if (spec.hasIce()) {
                    windOnIce = WindLoads.of(WindProfiles.withIce(spec.wind(), spec.ice()), tower, ice, items);
                }
            }
        }
        List<Combination> combinations = spec.combinations().isEmpty()
                ? DefaultCombinations.of(spec.actionFactorsOrDefault(), spec.hasWind() ? spec.wind().method() : null, spec.hasIce(),
                        !spec.nodal().isEmpty(), tower.isGenerated())
                : spec.combinations().stream().map(TowerLoads::combination).toList();
        List<Combination> service = ServiceCombinations.of(spec.actionFactorsOrDefault(),
                spec.hasWind() && tower.isGenerated() ? spec.wind().method() : null, spec.hasIce() && tower.isGenerated(),
                !spec.nodal().isEmpty());
        boolean asce = spec.hasWind() && !"uniform".equals(spec.wind().method())
                && spec.actionFactorsOrDefault().set().family() == tetrapod.model.spec.DesignBasis.US;
        return new TowerLoads(tower, selfWeight, ancillaryWeight, iceWeight, ice, mergedNodal.toList(), wind, windOnIce,
                combinations, service, spec.sweepStep(), spec.hasWind() && tower.isGenerated() ? spec.wind() : null,
                items, asce);
    }

    private static Combination combination(CombinationSpec c) {
        Map<LoadAction, Double> f = new EnumMap<>(LoadAction.class);
        f.putAll(c.factors());
        return new Combination(c.name(), f);
    }

    private static List<Problem> check(Tower tower, LoadsSpec spec) {
        List<Problem> problems = new ArrayList<>();
        Set<Integer> ids = new HashSet<>();
        for (Node n : tower.frame().nodes()) {
            ids.add(n.id());
        }
        for (int k = 0; k < spec.nodal().size(); k++) {
            int node = spec.nodal().get(k).node();
            if (!ids.contains(node)) {
                problems.add(Problem.at("loads.nodal[" + k + "].node", "node " + node + " does not exist; the tower's nodes are "
                        + tower.frame().nodes().get(0).id() + " to " + tower.frame().nodes().get(tower.frame().nodes().size() - 1).id()));
            }
        }
        if (!tower.isGenerated()) {
            if (spec.hasWind()) {
                problems.add(Problem.at("loads.wind", "applies only to a generated tower (base and segments): wind is applied panel by panel"));
            }
            if (spec.hasIce()) {
                problems.add(Problem.at("loads.ice", "applies only to a generated tower (base and segments)"));
            }
            if (!spec.ancillaries().isEmpty()) {
                problems.add(Problem.at("loads.ancillaries", "applies only to a generated tower (base and segments)"));
            }
            return problems;
        }
        if (spec.hasWind() && "en1991".equals(spec.wind().method()) && tower.height() > En1991Wind.Z_MAX + 1e-9) {
            problems.add(Problem.at("loads.wind.method", "EN 1991-1-4 §4 gives the wind profile up to "
                    + metres(En1991Wind.Z_MAX) + "; the tower is " + metres(tower.height()) + " tall"));
        }
        for (int k = 0; k < spec.ancillaries().size(); k++) {
            AncillarySpec a = spec.ancillaries().get(k);
            double top = a instanceof AncillarySpec.Linear l ? l.to() : ((AncillarySpec.Point) a).height();
            if (top > tower.height() + 1e-9) {
                String key = a instanceof AncillarySpec.Linear ? "to" : "height";
                problems.add(Problem.at("loads.ancillaries[" + k + "]." + key, "is above the tower top ("
                        + metres(tower.height()) + "), was " + metres(top)));
            }
        }
        for (int k = 0; k < spec.combinations().size(); k++) {
            CombinationSpec c = spec.combinations().get(k);
            String path = "loads.combinations[" + k + "]";
            if (c.factor(LoadAction.WIND) != 0 && !spec.hasWind()) {
                problems.add(Problem.at(path + ".wind", "the model has no wind (loads.wind)"));
            }
            if (c.factor(LoadAction.WIND_ON_ICE) != 0 && !(spec.hasWind() && spec.hasIce())) {
                problems.add(Problem.at(path + ".windOnIce", "needs both loads.wind and loads.ice"));
            }
            if (c.factor(LoadAction.ICE) != 0 && !spec.hasIce()) {
                problems.add(Problem.at(path + ".ice", "the model has no ice (loads.ice)"));
            }
        }
        return problems;
    }

    private static String metres(double m) {
        return PlainNumbers.of(m) + " m";
    }

    public Tower tower() {
        return tower;
    }

    /** Self-weight of the steelwork with the connection allowance, N. */
    public List<NodeForce> selfWeight() {
        return selfWeight;
    }

    /** The ancillaries of the file, as given (empty for an explicit frame). */
    public List<AncillarySpec> ancillaries() {
        return items == null ? List.of() : items.items();
    }

    /** Weight of the ancillaries, N. */
    public List<NodeForce> ancillaryWeight() {
        return ancillaryWeight;
    }

    /** The dead load: self-weight and ancillaries, N. */
    public List<NodeForce> dead() {
        return dead;
    }

    /** Weight of the ice on members and ancillaries, N; empty without ice. */
    public List<NodeForce> ice() {
        return ice;
    }

    /** The ice and its design thickness ({@link Asce7Ice#NONE} without ice). */
    public Asce7Ice icing() {
        return icing;
    }

    /** The file's nodal loads, N and N·m, merged by node. */
    public List<NodeForce> nodal() {
        return nodal;
    }

    /** The wind on the bare tower, if the model has wind. */
    public Optional<WindLoads> wind() {
        return Optional.ofNullable(wind);
    }

    /** The wind on the iced tower, if the model has wind and ice. */
    public Optional<WindLoads> windOnIce() {
        return Optional.ofNullable(windOnIce);
    }

    public List<Combination> combinations() {
        return combinations;
    }

    /** The unfactored combinations the allowable-stress footing rules take ({@link ServiceCombinations}). */
    public List<Combination> serviceCombinations() {
        return serviceCombinations;
    }

    /**
     * The serviceability combination of a generated tower: dead load, nodal loads and the service
     * wind of {@code given} (null for the wind method's default), no ice ({@link ServiceLoads}).
     *
     * @throws IllegalArgumentException for an explicit frame, or when {@code given} does not go with the wind method
     */
    public ServiceLoads service(ServiceabilitySpec.ServiceWindSpec given) {
        if (!tower.isGenerated()) {
            throw new IllegalArgumentException("serviceability needs a generated tower");
        }
        if (windSpec == null) {
            if (given != null) {
                throw new IllegalArgumentException("serviceability.wind needs loads.wind");
            }
            return new ServiceLoads(dead, nodal, null, null, azimuths(), asce);
        }
        ServiceWind w = ServiceWind.of(windSpec, given);
        return new ServiceLoads(dead, nodal, w, WindLoads.of(w.profile(), tower, Asce7Ice.NONE, items), azimuths(), asce);
    }

    /** Azimuth step of the sweep, degrees. */
    public double sweepStep() {
        return sweepStep;
    }

    /** The sweep's azimuths: 0, step, 2 step, ... below 360, degrees (exact multiples of 360/n). */
    public List<Double> azimuths() {
        int n = (int) Math.round(360 / sweepStep);
        List<Double> list = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            list.add(360.0 * i / n);
        }
        return List.copyOf(list);
    }

    /** The azimuth-independent load vectors and the weights of every case. */
    public LoadBasis basis() {
        return basis;
    }

    /** Every load case: each combination with wind at every azimuth of the sweep, each without wind once. */
    public List<CaseKey> caseKeys() {
        List<Double> azimuths = azimuths();
        List<CaseKey> keys = new ArrayList<>();
        for (Combination c : combinations) {
            if (c.hasWind()) {
                azimuths.forEach(a -> keys.add(new CaseKey(c, a)));
            } else {
                keys.add(new CaseKey(c, null));
            }
        }
        return List.copyOf(keys);
    }

    /** The factored load vector of one case, formed directly. */
    public LoadCase loadCase(CaseKey key) {
        return loadCase(key, 1.0);
    }

    /** As {@link #loadCase(CaseKey)}, with every wind force multiplied by {@code sway} (second-order amplification). */
    public LoadCase loadCase(CaseKey key, double sway) {
        Combination c = key.combination();
        NodalLoads sum = new NodalLoads();
        sum.add(dead, c.factor(LoadAction.DEAD));
        sum.add(ice, c.factor(LoadAction.ICE));
        sum.add(nodal, c.factor(LoadAction.NODAL));
        if (c.factor(LoadAction.WIND) != 0) {
            sum.add(wind.at(key.azimuthDeg()), c.factor(LoadAction.WIND) * sway);
        }
        if (c.factor(LoadAction.WIND_ON_ICE) != 0) {
            sum.add(windOnIce.at(key.azimuthDeg()), c.factor(LoadAction.WIND_ON_ICE) * sway);
        }
        return new LoadCase(key.id(), c.name(), key.azimuthDeg(), sum.toList());
    }

    /** The factored load vector of {@code combination} at {@code azimuthDeg} (null for one without wind). */
    public LoadCase loadCase(Combination combination, Double azimuthDeg) {
        return loadCase(new CaseKey(combination, azimuthDeg));
    }
}
