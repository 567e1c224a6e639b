package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import tetrapod.generate.Tower;
import tetrapod.model.NodeForce;

/**
 * The wind on a generated tower from any azimuth, by one {@link WindProfile}.
 *
 * <h2>Panel force at azimuth θ</h2>
 * For each panel the two pairs of opposite faces are measured ({@link PanelExposure}) and each
 * pair's face-normal force is formed by the method: F_X = r q(z_ref) c_f,X A_X for wind along x
 * (r the response factor, A_X the projected member area of a face normal to x, c_f,X from its
 * solidity), F_Y likewise. For wind blowing towards θ (0° = +x, 90° = +y) the panel force along
 * the wind is
 * <pre>  F(θ) = d(θ) [F_X K_X(θ) cos²θ + F_Y K_Y(θ) sin²θ],   K(θ) = 1 + a sin²2θ</pre>
 * with d(θ) the directional factor and a the pair's incidence amplitude (EN 1993-3-1's K_θ;
 * ASCE 7's diagonal factor spread between face and diagonal). For a square tower F_X = F_Y and
 * this is K_θ F_X, the codes' rule; for a rectangular one it passes from one face pair's value
 * to the other's, weighting each by the square of the wind's component normal to it.
 * F(θ) acts along the wind: Fx = F cos θ, Fy = F sin θ.
 *
 * <h2>Distribution</h2>
 * A panel's force acts at its reference height (the centroid of its projected member area) and
 * goes to the eight leg nodes at its bottom and top levels: split between the levels by the lever
 * rule, a quarter to each leg (the plan centre of the projected areas of a four-leg panel is on the
 * tower axis, so no torsion is applied). Ancillaries act at their own heights ({@link Ancillaries}).
 */
public final class WindLoads {

    private final WindProfile profile;
    private final List<PanelState> panels;
    private final List<PointState> points;
    private final WindBasis basis;

    /** A panel with everything that does not depend on the azimuth worked out. */
    private record PanelState(PanelExposure exposure, double q, FaceCoefficient x, FaceCoefficient y,
                              double forceX, double forceY) { }

    private record PointState(WindPoint point, double q, double force) { }

    private WindLoads(WindProfile profile, List<PanelState> panels, List<PointState> points) {
        this.profile = profile;
        this.panels = List.copyOf(panels);
        this.points = List.copyOf(points);
        this.basis = buildBasis();
    }

    /**
     * The wind on a generated tower, bare or iced, and on its ancillaries.
     *
     * @param profile the method (not modified)
     * @param tower   a generated tower
     * @param ice     the ice on members and items ({@link Asce7Ice#NONE} for none)
     * @param items   the tower's ancillaries
     */
    public static WindLoads of(WindProfile profile, Tower tower, Asce7Ice ice, Ancillaries items) {
        return of(profile, PanelExposures.of(tower, ice), items.windPoints(ice));
    }

    /** The wind on panels and points already measured. */
    public static WindLoads of(WindProfile profile, List<PanelExposure> panels, List<WindPoint> points) {
        Objects.requireNonNull(profile, "profile");
        LatticeCoefficients coefficients = profile.coefficients();
        double r = profile.responseFactor();
        List<PanelState> states = new ArrayList<>(panels.size());
        for (PanelExposure p : panels) {
            double q = profile.pressure(p.zRef());
            double v = profile.flowVelocity(p.zRef());
            FaceCoefficient cx = coefficients.of(p.xFaces(), v);
            FaceCoefficient cy = coefficients.of(p.yFaces(), v);
            states.add(new PanelState(p, q, cx, cy, r * q * cx.cf() * p.xFaces().total(),
                    r * q * cy.cf() * p.yFaces().total()));
        }
        List<PointState> pointStates = new ArrayList<>(points.size());
        for (WindPoint w : points) {
            double q = profile.pressure(w.z());
            pointStates.add(new PointState(w, q, r * q * w.effectiveArea()));
        }
        return new WindLoads(profile, states, pointStates);
    }

    public WindProfile profile() {
        return profile;
    }

    /** The panels' force components at θ, bottom to top: the results.json {@code wind} record. */
    public List<PanelForce> panelForces(double azimuthDeg) {
        Direction dir = new Direction(azimuthDeg, profile.directionalFactor(azimuthDeg));
        List<PanelForce> out = new ArrayList<>(panels.size());
        for (PanelState p : panels) {
            out.add(panelForce(p, dir));
        }
        return List.copyOf(out);
    }

    /** The ancillaries' forces at θ. */
    public List<AncillaryForce> ancillaryForces(double azimuthDeg) {
        Direction dir = new Direction(azimuthDeg, profile.directionalFactor(azimuthDeg));
        List<AncillaryForce> out = new ArrayList<>(points.size());
        for (PointState p : points) {
            double f = dir.d * p.force;
            out.add(new AncillaryForce(p.point.item(), p.point.name(), p.point.z(), dir.d * p.q,
                    p.point.effectiveArea(), f * dir.c, f * dir.s));
        }
        return List.copyOf(out);
    }

    /**
     * Every panel's and ancillary's c_f × A for wind towards θ (the panel's with its incidence factor),
     * with no pressure, response factor or directional factor: the drag that the aerodynamic damping
     * of a mode along θ takes (EN 1991-1-4 F.16).
     */
    public List<DragArea> dragAreas(double azimuthDeg) {
        Direction dir = new Direction(azimuthDeg, 1);
        List<DragArea> out = new ArrayList<>(panels.size() + points.size());
        for (PanelState p : panels) {
            PanelForce f = panelForce(p, dir);
            out.add(new DragArea(f.cf() * f.area(), p.exposure.shares()));
        }
        for (PointState p : points) {
            out.add(new DragArea(p.point.effectiveArea(), p.point.shares()));
        }
        return List.copyOf(out);
    }

    /** Panel and ancillary forces at θ together. */
    public AzimuthWind azimuth(double azimuthDeg) {
        return new AzimuthWind(azimuthDeg, panelForces(azimuthDeg), ancillaryForces(azimuthDeg));
    }

    /** The complete wind load vector at θ, N, merged by node in ascending node id (computed directly, not from the basis). */
    public List<NodeForce> at(double azimuthDeg) {
        Direction dir = new Direction(azimuthDeg, profile.directionalFactor(azimuthDeg));
        NodalLoads sum = new NodalLoads();
        for (PanelState p : panels) {
            PanelForce f = panelForce(p, dir);
            sum.add(p.exposure.shares(), f.fx(), f.fy(), 0);
        }
        for (PointState p : points) {
            double f = dir.d * p.force;
            sum.add(p.point.shares(), f * dir.c, f * dir.s, 0);
        }
        return sum.toList();
    }

    /** The azimuth-independent basis of this wind: {@code at(θ) = Σ c_k(θ) B_k}. */
    public WindBasis basis() {
        return basis;
    }

    private record Direction(double c, double s, double k, double d) {
        Direction(double azimuthDeg, double d) {
            this(Math.cos(Math.toRadians(azimuthDeg)), Math.sin(Math.toRadians(azimuthDeg)),
                    Math.pow(Math.sin(Math.toRadians(2 * azimuthDeg)), 2), d);
        }
    }

    private PanelForce panelForce(PanelState p, Direction dir) {
        double wx = dir.c * dir.c;
        double wy = dir.s * dir.s;
        double kx = 1 + p.x.incidenceAmplitude() * dir.k;
        double ky = 1 + p.y.incidenceAmplitude() * dir.k;
        double force = dir.d * (p.forceX * kx * wx + p.forceY * ky * wy);
        FaceAreas ax = p.exposure.xFaces();
        FaceAreas ay = p.exposure.yFaces();
        double area = wx * ax.total() + wy * ay.total();
        double gross = wx * ax.gross() + wy * ay.gross();
        double cf = area > 0 ? (wx * p.x.cf() * kx * ax.total() + wy * p.y.cf() * ky * ay.total()) / area : 0;
        PanelExposure e = p.exposure;
        return new PanelForce(e.panel(), e.zBottom(), e.zTop(), e.zRef(), dir.d * p.q, Math.min(1, area / gross), cf,
                area, profile.responseFactor(), force * dir.c, force * dir.s);
    }

    private WindBasis buildBasis() {
        int n = WindBasis.termCount();
        NodalLoads[] sums = new NodalLoads[n];
        boolean[] used = new boolean[n];
        for (int t = 0; t < n; t++) {
            sums[t] = new NodalLoads();
        }
        for (PanelState p : panels) {
            double ax = p.x.incidenceAmplitude();
            double ay = p.y.incidenceAmplitude();
            double[] amounts = {p.forceX, p.forceX * ax, p.forceY, p.forceY * ay};
            for (int j = 0; j < 4; j++) {
                if (amounts[j] != 0) {
                    sums[j].add(p.exposure.shares(), amounts[j], 0, 0);
                    sums[j + 4].add(p.exposure.shares(), 0, amounts[j], 0);
                    used[j] = true;
                    used[j + 4] = true;
                }
            }
        }
        for (PointState p : points) {
            if (p.force != 0) {
                sums[8].add(p.point.shares(), p.force, 0, 0);
                sums[9].add(p.point.shares(), 0, p.force, 0);
                used[8] = true;
                used[9] = true;
            }
        }
        List<BasisVector> vectors = new ArrayList<>();
        List<Integer> terms = new ArrayList<>();
        for (int t = 0; t < n; t++) {
            if (used[t]) {
                vectors.add(new BasisVector(profile.method() + ": " + WindBasis.NAMES.get(t), sums[t].toList()));
                terms.add(t);
            }
        }
        return new WindBasis(profile, vectors, terms.stream().mapToInt(Integer::intValue).toArray());
    }
}
