package tetrapod.load;

import java.util.List;

/** The wind on every panel at one azimuth: one entry of results.json {@code wind}. */
public record AzimuthWind(double azimuthDeg, List<PanelForce> panels, List<AncillaryForce> ancillaries) {
    public AzimuthWind {
        panels = List.copyOf(panels);
        ancillaries = List.copyOf(ancillaries);
    }
}
