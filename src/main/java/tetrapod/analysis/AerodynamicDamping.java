package tetrapod.analysis;

import java.util.List;
import java.util.Map;
import tetrapod.load.DragArea;
import tetrapod.load.NodeShare;
import tetrapod.model.Frame;

/**
 * The ratio c_f b / m_e that the aerodynamic damping of EN 1991-1-4 F.5 (4), (F.16)
 * δ_a = c_f ρ b v_m(z_s) / (2 n_1 m_e) takes, for a lattice tower from its own sway mode. (F.16) is
 * written for a member of constant section, with m_e the equivalent mass per unit length of (F.17),
 * m_e = ∫ m Φ² / ∫ Φ²; the drag per unit height c_f b is weighted the same way here, which is where
 * (F.16) comes from (the linearised along-wind drag ½ ρ c_f b (v_m − ẋ)² gives the damping force
 * ρ v_m c_f b ẋ per unit height, and its modal share over the modal mass is the damping ratio):
 * <pre>  c_f b / m_e = Σ_p (c_f A)_p φ_p² / Σ_i m_i φ_i²</pre>
 * over the panels and ancillaries p, φ_p = Σ s_i φ_i the mode's displacement along the wind where the
 * drag acts (the same node shares that take its force), and over the nodes i with their lumped
 * masses m_i. For a prismatic tower with even mass and drag this is c_f b / m of (F.16) exactly
 * (Tetrapod's generalisation; the mode shape replaces the straight line of (F.17)'s usual
 * approximation).
 */
final class AerodynamicDamping {

    private AerodynamicDamping() { }

    /**
     * c_f b / m_e, m²/kg, of a sway mode along its own direction; 0 for a mode that is not sway (no
     * along-wind motion to damp).
     *
     * @param mass  the lumped mass of each node in frame order, kg (input, not modified)
     * @param drags the panels' and ancillaries' c_f A for wind along the mode's sway direction
     */
    static double dragPerMass(NaturalMode mode, Frame frame, double[] mass, List<DragArea> drags) {
        if (mode.kind() != NaturalMode.Kind.SWAY || mode.swayDirectionDeg() == null) {
            return 0;
        }
        double ex = Math.cos(Math.toRadians(mode.swayDirectionDeg()));
        double ey = Math.sin(Math.toRadians(mode.swayDirectionDeg()));
        double[] phi = mode.shape();
        double[] along = new double[frame.nodes().size()];
        double modal = 0;
        for (int n = 0; n < along.length; n++) {
            along[n] = ex * phi[6 * n] + ey * phi[6 * n + 1];
            modal += mass[n] * along[n] * along[n];
        }
        Map<Integer, Integer> index = frame.nodeIndex();
        double drag = 0;
        for (DragArea d : drags) {
            double at = 0;
            for (NodeShare s : d.shares()) {
                at += s.fraction() * along[index.get(s.node())];
            }
            drag += d.area() * at * at;
        }
        return modal > 0 ? drag / modal : 0;
    }
}
