package tetrapod.check;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.IntToDoubleFunction;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;

/**
 * The nominal design force of redundant (secondary bracing) members: a redundant carries almost
 * nothing in a linear analysis, yet it must hold the member it braces against buckling. Tower codes
 * give it a design force that is a fraction of the compression in the member it braces
 * ({@link MemberCheck#redundantForceFraction()}). The members a redundant braces are taken as the
 * legs, diagonals, horizontals and plan members that meet it at either end; the nominal force is
 * the fraction of the largest compression among them in the same case, and it acts on the
 * redundant as compression when it exceeds the redundant's own.
 */
final class RedundantForces {

    private final Map<Integer, int[]> braced = new HashMap<>();
    /** Per member (frame order): the frame indices of the members it braces; null when not a redundant. */
    private final int[][] bracedIndices;
    private final double fraction;
    private final String clause;

    RedundantForces(Frame frame, MemberCheck method) {
        this.fraction = method.redundantForceFraction();
        this.clause = method.redundantForceClause();
        Map<Integer, List<Member>> atNode = new HashMap<>();
        Map<Integer, Integer> index = new HashMap<>();
        for (int k = 0; k < frame.members().size(); k++) {
            index.put(frame.members().get(k).id(), k);
        }
        this.bracedIndices = new int[frame.members().size()][];
        for (Member m : frame.members()) {
            atNode.computeIfAbsent(m.i(), k -> new ArrayList<>()).add(m);
            atNode.computeIfAbsent(m.j(), k -> new ArrayList<>()).add(m);
        }
        for (Member m : frame.members()) {
            if (m.role() != Role.REDUNDANT) {
                continue;
            }
            List<Integer> ids = new ArrayList<>();
            for (int node : new int[] {m.i(), m.j()}) {
                for (Member other : atNode.get(node)) {
                    if (isMain(other.role()) && !ids.contains(other.id())) {
                        ids.add(other.id());
                    }
                }
            }
            braced.put(m.id(), ids.stream().mapToInt(Integer::intValue).toArray());
            bracedIndices[index.get(m.id())] = ids.stream().mapToInt(index::get).toArray();
        }
    }

    private static boolean isMain(Role role) {
        return role == Role.LEG || role == Role.DIAGONAL || role == Role.HORIZONTAL || role == Role.PLAN;
    }

    /** Whether member {@code id} gets a nominal force (a redundant bracing some member). */
    boolean applies(int id) {
        int[] ids = braced.get(id);
        return ids != null && ids.length > 0 && fraction > 0;
    }

    /**
     * The design forces of member {@code id}: its own, or, for a redundant whose nominal force
     * exceeds its own compression, that nominal force as compression (moments kept).
     *
     * @param axial the axial force (N, tension positive) of every member in the same case
     */
    MemberForces designForces(int id, MemberForces own, IntToDoubleFunction axial) {
        if (!applies(id)) {
            return own;
        }
        double nominal = fraction * bracedCompression(id, axial);
        if (nominal <= own.compression()) {
            return own;
        }
        return new MemberForces(-nominal, own.myI(), own.myJ(), own.mzI(), own.mzJ());
    }

    /**
     * The design axial force (N, tension positive) of the member at frame index {@code index}: its
     * own {@code axial}, or a redundant's nominal force as compression when that is larger; as
     * {@link #designForces}, to the last bit.
     *
     * @param axialByIndex the axial force (N) of every member in the same case, by frame index
     */
    double designAxial(int index, double axial, IntToDoubleFunction axialByIndex) {
        int[] ids = bracedIndices[index];
        if (ids == null || ids.length == 0 || !(fraction > 0)) {
            return axial;
        }
        double worst = 0;
        for (int other : ids) {
            worst = Math.max(worst, -axialByIndex.applyAsDouble(other));
        }
        double nominal = fraction * worst;
        return nominal <= Math.max(0, -axial) ? axial : -nominal;
    }

    /** The largest compression (N, ≥ 0) among the members that redundant {@code id} braces. */
    double bracedCompression(int id, IntToDoubleFunction axial) {
        double worst = 0;
        for (int other : braced.get(id)) {
            worst = Math.max(worst, -axial.applyAsDouble(other));
        }
        return worst;
    }

    /** The words that go beside each strength check of a redundant whose nominal force governs. */
    String note(double bracedCompression) {
        return String.format(Locale.ROOT, "nominal force of a redundant: %.1f %% of %.1f kN, the largest compression "
                + "of the members it braces (%s)", 100 * fraction, bracedCompression / 1e3, clause);
    }
}
