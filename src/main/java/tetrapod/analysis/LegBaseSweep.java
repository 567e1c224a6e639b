package tetrapod.analysis;

import java.util.List;

/**
 * A leg base's reaction against wind azimuth for one combination: vertical component Fz (N,
 * positive when the support pushes up, i.e. the leg is in compression; negative for uplift) and
 * the horizontal resultant Fh = √(Fx² + Fy²) (N).
 */
public record LegBaseSweep(int node, String combination, List<Double> azimuthDeg, List<Double> fz, List<Double> fh) {
    public LegBaseSweep {
        azimuthDeg = List.copyOf(azimuthDeg);
        fz = List.copyOf(fz);
        fh = List.copyOf(fh);
        if (fz.size() != azimuthDeg.size() || fh.size() != azimuthDeg.size()) {
            throw new IllegalArgumentException("sweep arrays of node " + node + " differ in length");
        }
    }
}
