package tetrapod.solve;

import tetrapod.model.NodeForce;
import java.util.List;
import java.util.Objects;

/**
 * One complete set of nodal loads to solve for (a load case, a combination at one azimuth ...).
 * Several entries for the same node add up. Tower axes; N and N·m.
 *
 * @param name  identifies the vector in results and error messages
 * @param loads the nodal loads
 */
public record LoadVector(String name, List<NodeForce> loads) {

    public LoadVector {
        Objects.requireNonNull(name, "name");
        loads = List.copyOf(loads);
    }

    /** a·this + b·other, entries concatenated (they add up when solved). */
    public LoadVector combine(double a, LoadVector other, double b, String name) {
        List<NodeForce> all = new java.util.ArrayList<>(loads.size() + other.loads.size());
        loads.forEach(f -> all.add(f.times(a)));
        other.loads.forEach(f -> all.add(f.times(b)));
        return new LoadVector(name, all);
    }
}
