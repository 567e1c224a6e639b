package tetrapod.load;

import java.util.List;
import tetrapod.model.NodeForce;

/** A load vector that does not depend on the azimuth, with a name saying what it is (N, N·m). */
public record BasisVector(String name, List<NodeForce> loads) {
    public BasisVector {
        loads = List.copyOf(loads);
    }
}
