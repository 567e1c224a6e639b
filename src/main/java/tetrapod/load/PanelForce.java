package tetrapod.load;

/**
 * The wind on one panel at one azimuth: one entry of results.json {@code wind[].panels}.
 * {@code force = responseFactor × q × cf × area} along the wind, split into Fx and Fy.
 *
 * <p>For wind normal to a pair of faces, area, solidity and cf are those of the windward face
 * (cf with its incidence factor 1). At an oblique azimuth θ the two face pairs are weighted by
 * cos²θ (faces normal to x) and sin²θ (faces normal to y): area and gross area are the weighted
 * sums, solidity their ratio, and cf the area-weighted mean of each pair's cf × incidence factor.
 *
 * @param panel          panel number, 1 at the bottom
 * @param zBottom        m
 * @param zTop           m
 * @param zRef           reference height where q is taken, m
 * @param q              pressure at zRef for this azimuth (directional factor included), Pa
 * @param solidity       solidity ratio (dimensionless)
 * @param cf             force coefficient including the incidence factor (dimensionless)
 * @param area           projected member area the coefficient applies to, m²
 * @param responseFactor c_s·c_d (EN 1991-1-4), G (ASCE 7), 1 (uniform)
 * @param fx             force along x, N
 * @param fy             force along y, N
 */
public record PanelForce(int panel, double zBottom, double zTop, double zRef, double q, double solidity, double cf,
                         double area, double responseFactor, double fx, double fy) {

    /** Size of the force, N. */
    public double magnitude() {
        return Math.hypot(fx, fy);
    }
}
