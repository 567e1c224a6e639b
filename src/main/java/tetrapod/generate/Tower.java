package tetrapod.generate;

import java.util.List;
import java.util.Optional;
import tetrapod.model.Frame;

/**
 * A tower ready for analysis: its frame, and for a generated tower its panel levels and panels
 * (both bottom to top). An explicit frame has no levels and no panels.
 *
 * @param connectionAllowance fraction added to the bare steel mass for bolts, gussets, galvanising
 */
public record Tower(Frame frame, List<PanelLevel> levels, List<Panel> panels, double connectionAllowance) {

    public Tower {
        levels = List.copyOf(levels);
        panels = List.copyOf(panels);
        if (!Double.isFinite(connectionAllowance) || connectionAllowance < 0) {
            throw new IllegalArgumentException("connection allowance must be >= 0, was " + connectionAllowance);
        }
    }

    /** Whether the tower was generated from segments (and so has levels and panels). */
    public boolean isGenerated() {
        return !panels.isEmpty();
    }

    /** Height of the top level, m (0 for an explicit frame). */
    public double height() {
        return levels.isEmpty() ? 0 : levels.get(levels.size() - 1).z();
    }

    /** The panel containing height z: zBottom ≤ z < zTop, the top panel for z at the very top. */
    public Optional<Panel> panelAt(double z) {
        for (Panel panel : panels) {
            if (z >= panel.zBottom() && z < panel.zTop()) {
                return Optional.of(panel);
            }
        }
        return panels.isEmpty() || z != height() ? Optional.empty() : Optional.of(panels.get(panels.size() - 1));
    }

    /** Σ mass per metre × length over all members, kg. */
    public double steelMass() {
        return SteelMass.bare(frame);
    }

    /** The bare steel mass × (1 + connection allowance), kg. */
    public double steelMassWithAllowance() {
        return SteelMass.withAllowance(frame, connectionAllowance);
    }
}
