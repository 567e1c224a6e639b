package tetrapod.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntPredicate;
import tetrapod.model.spec.LoadsSpec;
import tetrapod.model.spec.LoadsSpec.NodalLoadSpec;

/** Reads {@code loads}: forces (kN) and moments (kN·m) at nodes. */
final class LoadsReader {

    static final List<String> LOADS_KEYS = List.of("nodal");
    static final List<String> NODAL_KEYS = List.of("node", "F");

    private final Problems problems;

    LoadsReader(Problems problems) {
        this.problems = problems;
    }

    /**
     * The loads, or null (reported).
     *
     * @param nodeExists whether a node id exists; null when the ids are not known yet (generated towers)
     */
    LoadsSpec read(Fields loads, IntPredicate nodeExists) {
        int before = problems.count();
        loads.allowOnly(LOADS_KEYS);
        JsonNode nodal = loads.array("nodal", false);
        List<NodalLoadSpec> list = new ArrayList<>();
        if (nodal != null) {
            for (int k = 0; k < nodal.size(); k++) {
                Fields f = Fields.of(nodal.get(k), JsonPaths.index(loads.path("nodal"), k), problems);
                NodalLoadSpec load = f == null ? null : nodal(f, nodeExists);
                if (load != null) {
                    list.add(load);
                }
            }
        }
        return problems.count() == before ? new LoadsSpec(list) : null;
    }

    private NodalLoadSpec nodal(Fields f, IntPredicate nodeExists) {
        int before = problems.count();
        f.allowOnly(NODAL_KEYS);
        Integer node = f.requiredWhole("node", Integer.MIN_VALUE, Integer.MAX_VALUE);
        if (node != null && nodeExists != null && !nodeExists.test(node)) {
            problems.add(f.path("node"), "node " + node + " does not exist");
        }
        double[] c = new double[6];
        JsonNode array = f.array("F", true);
        if (array != null) {
            String path = f.path("F");
            if (array.size() != 3 && array.size() != 6) {
                problems.add(path, "must be [Fx, Fy, Fz] in kN or [Fx, Fy, Fz, Mx, My, Mz] in kN and kN·m; had "
                        + array.size() + " values");
            } else {
                for (int k = 0; k < array.size(); k++) {
                    c[k] = Values.number(array.get(k), JsonPaths.index(path, k), Bound.ANY, k < 3 ? "kN" : "kN·m", problems);
                }
            }
        }
        return problems.count() == before ? new NodalLoadSpec(node, c[0], c[1], c[2], c[3], c[4], c[5]) : null;
    }
}
