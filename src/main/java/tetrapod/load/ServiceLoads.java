package tetrapod.load;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.LoadAction;

/**
 * The serviceability combination: the dead load, the file's nodal loads and the service wind
 * ({@link ServiceWind}), all with factor 1.0 and no ice (EN 1990 (6.14b), the characteristic
 * combination; ASCE 7's serviceability commentary to Appendix C takes D + 0.5L + W_a, and a tower
 * has no live load). As the strength loads, it is a few azimuth-independent vectors and their
 * weights at each azimuth ({@link LoadBasis}), so that the sweep superposes and never solves again.
 */
public final class ServiceLoads {

    private final Combination combination;
    private final ServiceWind wind;
    private final WindLoads windLoads;
    private final List<NodeForce> dead;
    private final List<NodeForce> nodal;
    private final List<Double> azimuths;
    private final LoadBasis basis;

    ServiceLoads(List<NodeForce> dead, List<NodeForce> nodal, ServiceWind wind, WindLoads windLoads, List<Double> azimuths,
                 boolean asce) {
        this.dead = List.copyOf(dead);
        this.nodal = List.copyOf(nodal);
        this.wind = wind;
        this.windLoads = windLoads;
        this.azimuths = List.copyOf(azimuths);
        Map<LoadAction, Double> factors = new EnumMap<>(LoadAction.class);
        factors.put(LoadAction.DEAD, 1.0);
        StringBuilder name = new StringBuilder(asce ? "1.0D" : "1.0G");
        if (windLoads != null) {
            factors.put(LoadAction.WIND, 1.0);
            name.append(" + 1.0Ws");
        }
        if (!nodal.isEmpty()) {
            factors.put(LoadAction.NODAL, 1.0);
            name.append(" + 1.0Q");
        }
        this.combination = new Combination(name.toString(), factors);
        List<LoadComponent> fixed = new ArrayList<>();
        fixed.add(new LoadComponent("dead", LoadAction.DEAD, this.dead));
        if (!nodal.isEmpty()) {
            fixed.add(new LoadComponent("nodal", LoadAction.NODAL, this.nodal));
        }
        this.basis = new LoadBasis(fixed, windLoads == null ? null : windLoads.basis(), null);
    }

    /** The combination, e.g. {@code 1.0G + 1.0Ws}: Ws the service wind. */
    public Combination combination() {
        return combination;
    }

    /** The service wind; empty when the model has no wind (the combination is then the dead load). */
    public Optional<ServiceWind> wind() {
        return Optional.ofNullable(wind);
    }

    /** The azimuths the combination is taken at: the sweep's with wind, one (null) without. */
    public List<Double> azimuths() {
        if (windLoads == null) {
            return java.util.Collections.singletonList(null);
        }
        return azimuths;
    }

    /** The azimuth-independent load vectors, N. */
    public LoadBasis basis() {
        return basis;
    }

    /** The weights of {@link #basis()} at {@code azimuthDeg} (null without wind) into {@code out} (output). */
    public double[] weights(Double azimuthDeg, double[] out) {
        return basis.weights(combination, azimuthDeg, out);
    }

    /** The combination's load vector at {@code azimuthDeg}, formed directly (not from the basis), N. */
    public LoadCase loadCase(Double azimuthDeg) {
        CaseKey key = new CaseKey(combination, azimuthDeg);
        NodalLoads sum = new NodalLoads();
        sum.add(dead, 1);
        sum.add(nodal, 1);
        if (windLoads != null) {
            sum.add(windLoads.at(azimuthDeg), 1);
        }
        return new LoadCase(key.id(), combination.name(), azimuthDeg, sum.toList());
    }
}
