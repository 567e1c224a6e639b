package tetrapod.load;

import java.util.List;
import tetrapod.model.NodeForce;

/**
 * One combination at one azimuth: the complete factored nodal load vector to solve.
 *
 * @param id          stable identifier: the combination's name, and {@code @θ} for a wind case
 * @param combination the combination's name
 * @param azimuthDeg  the wind's azimuth in degrees, or null for a combination without wind
 * @param loads       N and N·m, merged by node in ascending node id
 */
public record LoadCase(String id, String combination, Double azimuthDeg, List<NodeForce> loads) {
    public LoadCase {
        loads = List.copyOf(loads);
    }
}
