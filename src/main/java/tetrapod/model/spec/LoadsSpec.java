package tetrapod.model.spec;

import java.util.List;

/** Loads given in the model file. Forces in kN, moments in kN·m, in tower axes. */
public record LoadsSpec(List<NodalLoadSpec> nodal) {

    public static final LoadsSpec NONE = new LoadsSpec(List.of());

    public LoadsSpec {
        nodal = nodal == null ? List.of() : List.copyOf(nodal);
    }

    /** A load at a node: Fx, Fy, Fz (kN) and Mx, My, Mz (kN·m). */
    public record NodalLoadSpec(int node, double fx, double fy, double fz, double mx, double my, double mz) { }
}
