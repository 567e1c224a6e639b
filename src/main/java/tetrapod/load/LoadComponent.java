package tetrapod.load;

import java.util.List;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.LoadAction;

/**
 * One azimuth-independent load vector of a tower's loads, and the action whose factor scales it.
 * Wind components are further scaled by their basis coefficient c_k(θ).
 *
 * @param name   what it is: "dead", "ice", "nodal", or a wind basis vector's name
 * @param action the action it belongs to
 * @param loads  nodal loads in N and N·m, ascending node id
 */
public record LoadComponent(String name, LoadAction action, List<NodeForce> loads) {
    public LoadComponent {
        loads = List.copyOf(loads);
    }
}
