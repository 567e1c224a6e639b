package tetrapod.size;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import tetrapod.check.BucklingLength;
import tetrapod.check.MemberForces;
import tetrapod.model.Role;

/**
 * Drops the demands that cannot govern whatever the section. Within one class (same sign of the
 * axial force, same buckling lengths, same role and connection) every check of either method is
 * non-decreasing in |N|, in each end moment's magnitude and in the ratio ψ of the end moments
 * (through C_m = 0.6 + 0.4ψ): so a demand that another of its class matches or exceeds in all of
 * them governs no section. (One exception, ignored on purpose: ASCE 10 (3.12-1) turns into a fixed
 * "no resistance" value once P reaches the Euler load, which can be lower than the value just
 * below it; sizing re-checks every chosen design in full, so an inexact drop there only costs an
 * iteration.)
 */
final class Demands {

    private Demands() { }

    /** The demands of {@code all} (input) that no other of their class dominates, classes in first-seen order. */
    static List<Demand> reduce(List<Demand> all) {
        Map<ClassKey, List<Demand>> classes = new LinkedHashMap<>();
        for (Demand d : all) {
            classes.computeIfAbsent(ClassKey.of(d), k -> new ArrayList<>()).add(d);
        }
        List<Demand> kept = new ArrayList<>();
        for (List<Demand> members : classes.values()) {
            kept.addAll(frontier(members));
        }
        return List.copyOf(kept);
    }

    private static List<Demand> frontier(List<Demand> demands) {
        List<Demand> sorted = new ArrayList<>(demands);
        sorted.sort(Comparator.comparingDouble((Demand d) -> -Math.abs(d.forces().axial())));
        List<Demand> kept = new ArrayList<>();
        for (Demand d : sorted) {
            boolean dominated = false;
            for (Demand k : kept) {
                if (dominates(k.forces(), d.forces())) {
                    dominated = true;
                    break;
                }
            }
            if (!dominated) {
                kept.add(d);
            }
        }
        return kept;
    }

    /** Whether every check gives at least as much under {@code a} as under {@code b} (same class). */
    static boolean dominates(MemberForces a, MemberForces b) {
        if (Math.abs(a.axial()) < Math.abs(b.axial())) {
            return false;
        }
        if (!b.hasMoments()) {
            return true;
        }
        return a.maxMomentY() >= b.maxMomentY() && a.maxMomentZ() >= b.maxMomentZ()
                && a.psiY() >= b.psiY() && a.psiZ() >= b.psiZ();
    }

    /** Sign of N, buckling lengths, role and segment (which fix the connection): what makes two demands comparable. */
    private record ClassKey(int sign, BucklingLength buckling, Role role, int segment) {
        static ClassKey of(Demand d) {
            return new ClassKey(d.sign(), d.buckling(), d.member().role(), d.member().segment());
        }

        ClassKey {
            Objects.requireNonNull(buckling, "buckling");
        }
    }
}
