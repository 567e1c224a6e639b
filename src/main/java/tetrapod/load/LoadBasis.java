package tetrapod.load;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import tetrapod.model.spec.LoadAction;

/**
 * Every load case of a tower as a linear combination of a few azimuth-independent load vectors:
 * {@code load(combination, θ) = Σ_j w_j(combination, θ) · components[j]}, with
 * w_j = factor(action_j) for dead, ice and nodal loads and w_j = factor(action_j) · c_k(θ) for the
 * k-th wind basis vector. Solve each component once with the one factorisation, then superpose.
 */
public final class LoadBasis {

    private final List<LoadComponent> components;
    private final WindBasis wind;
    private final WindBasis windOnIce;
    private final int windStart;
    private final int windOnIceStart;

    LoadBasis(List<LoadComponent> fixed, WindBasis wind, WindBasis windOnIce) {
        List<LoadComponent> all = new ArrayList<>(fixed);
        windStart = all.size();
        if (wind != null) {
            wind.vectors().forEach(v -> all.add(new LoadComponent(v.name(), LoadAction.WIND, v.loads())));
        }
        windOnIceStart = all.size();
        if (windOnIce != null) {
            windOnIce.vectors().forEach(v -> all.add(new LoadComponent("with ice, " + v.name(), LoadAction.WIND_ON_ICE,
                    v.loads())));
        }
        this.components = List.copyOf(all);
        this.wind = wind;
        this.windOnIce = windOnIce;
    }

    /** The azimuth-independent load vectors, N. */
    public List<LoadComponent> components() {
        return components;
    }

    public int size() {
        return components.size();
    }

    /** The weights of the components for {@code combination} at {@code azimuthDeg} (null when it has no wind). */
    public double[] weights(Combination combination, Double azimuthDeg) {
        return weights(combination, azimuthDeg, new double[components.size()]);
    }

    /**
     * The weights into {@code out} (output, length at least {@link #size()}); allocates nothing.
     *
     * @return {@code out}
     */
    public double[] weights(Combination combination, Double azimuthDeg, double[] out) {
        if (combination.hasWind() && azimuthDeg == null) {
            throw new IllegalArgumentException(combination.name() + " has wind: give an azimuth");
        }
        for (int j = 0; j < windStart; j++) {
            out[j] = combination.factor(components.get(j).action());
        }
        fill(out, windStart, wind, combination.factor(LoadAction.WIND), azimuthDeg);
        fill(out, windOnIceStart, windOnIce, combination.factor(LoadAction.WIND_ON_ICE), azimuthDeg);
        return out;
    }

    private static void fill(double[] out, int start, WindBasis basis, double factor, Double azimuthDeg) {
        if (basis == null) {
            return;
        }
        if (factor == 0) {
            Arrays.fill(out, start, start + basis.size(), 0.0);
        } else {
            basis.coefficients(azimuthDeg, out, start, factor);
        }
    }
}
