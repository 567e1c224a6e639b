package tetrapod.load;

import java.util.List;
import tetrapod.model.NodalLoad;

/** A load vector that does not depend on the azimuth, with a name saying what it is (N, N·m). */
public record BasisVector(String name, List<NodalLoad> loads) {
    public BasisVector {
        loads = List.copyOf(loads);
    }
}
