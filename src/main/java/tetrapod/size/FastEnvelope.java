package tetrapod.size;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import tetrapod.check.BucklingLength;
import tetrapod.check.BucklingLengths;
import tetrapod.check.Connection;
import tetrapod.check.MemberCheck;
import tetrapod.check.MemberCheckInput;
import tetrapod.check.MemberCheckResult;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.check.MemberForces;
import tetrapod.common.UnstableStructureException;
import tetrapod.generate.Tower;
import tetrapod.load.CaseKey;
import tetrapod.load.Combination;
import tetrapod.load.LoadComponent;
import tetrapod.load.TowerLoads;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.solve.BasisResponses;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.LoadVector;
import tetrapod.model.NodeForce;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * Every member's check envelope over every load case (each combination at each azimuth of the
 * sweep), the same as {@code Analysis.run} finds, with far fewer member checks.
 *
 * <p>Why it may skip cases: an axial-only member's checks depend on the case only through its
 * axial force N and its buckling lengths, and those only through which of its crossing partners
 * are in tension. Within one class of cases (one sign of N, one partner state) every check of
 * either method is non-decreasing in |N|: tension, net section, bolt shear, bearing and end
 * distance are proportional to it, buckling is proportional to it at fixed lengths, and the
 * slenderness and width-to-thickness limits do not depend on it. So the largest utilisation of a
 * class is reached at its largest |N|. The sweep forms every case's axial forces by superposition
 * (a few multiply-adds per member) and keeps, per member and class, the first case and the case
 * of largest |N|; only those are checked, in case order, so that the envelope (ties keep the
 * earlier case) comes out as the full sweep's. Members carrying bending (the legs of a frame
 * idealisation) are checked at every case.
 *
 * <p>It also keeps each member's {@link Demand}s: the cases that can govern that member whatever
 * its section (per class the largest |N|, and for members with bending the cases no other case
 * dominates), from which sizing tries other sections without re-analysing.
 */
public final class FastEnvelope {

    /** A member with more crossing partners than fit in a mask is checked at every case. */
    static final int MAX_PARTNERS = 63;

    private FastEnvelope() { }

    /**
     * Factors the tower's stiffness once, solves its load basis once and sweeps every case.
     *
     * @param tower  input
     * @param loads  the tower's loads (input)
     * @param checks how members are checked
     * @throws UnstableStructureException when the tower is a mechanism
     */
    public static Evaluation evaluate(Tower tower, TowerLoads loads, ChecksSpec checks)
            throws UnstableStructureException {
        StructuralModel model = StructuralModel.of(tower.frame());
        FactoredSystem system = Solver.factor(model);
        List<LoadVector> vectors = new ArrayList<>(loads.basis().size());
        for (LoadComponent c : loads.basis().components()) {
            vectors.add(vector(c.name(), c.loads()));
        }
        BasisResponses responses = BasisResponses.of(system, vectors);
        return evaluate(tower.frame(), loads, responses, MemberChecker.of(tower, checks));
    }

    /**
     * Sweeps every case of {@code loads} with responses already solved.
     *
     * @param frame     the frame that {@code responses} belong to (input)
     * @param responses the responses to {@code loads.basis()}, in its order (input)
     * @param checker   the member checks of {@code frame}
     */
    public static Evaluation evaluate(Frame frame, TowerLoads loads, BasisResponses responses, MemberChecker checker)
            throws UnstableStructureException {
        return new Sweep(frame, loads, responses, checker).run();
    }

    private static LoadVector vector(String name, List<NodeForce> loads) {
        List<NodeForce> forces = new ArrayList<>(loads.size());
        for (NodeForce l : loads) {
            forces.add(new NodeForce(l.node(), l.fx(), l.fy(), l.fz(), l.mx(), l.my(), l.mz()));
        }
        return new LoadVector(name, forces);
    }

    /** One sweep's working state. */
    private static final class Sweep {
        private final Frame frame;
        private final TowerLoads loads;
        private final BasisResponses responses;
        private final MemberChecker checker;
        private final MemberCheck method;
        private final BucklingLengths buckling;
        private final List<Member> members;
        private final int[][] partners;
        private final List<Map<Integer, Integer>> partnerBits = new ArrayList<>();
        private final List<Map<Long, BucklingLength>> lengthsByMask = new ArrayList<>();
        private final boolean[] everyCase;
        private final boolean[] maskable;
        private final Map<Integer, Integer> index = new HashMap<>();
        private final MemberEnvelope[] envelopes;
        private final CaseClasses[] classes;
        private final List<List<Demand>> demands = new ArrayList<>();
        private final double[] axial;
        private final double[] ends = new double[12];
        private long checkCount;

        Sweep(Frame frame, TowerLoads loads, BasisResponses responses, MemberChecker checker) {
            this.frame = frame;
            this.loads = loads;
            this.responses = responses;
            this.checker = checker;
            this.method = checker.method();
            this.buckling = checker.bucklingLengths();
            this.members = frame.members();
            int n = members.size();
            for (int m = 0; m < n; m++) {
                index.put(members.get(m).id(), m);
            }
            partners = new int[n][];
            everyCase = new boolean[n];
            maskable = new boolean[n];
            envelopes = new MemberEnvelope[n];
            classes = new CaseClasses[n];
            axial = new double[n];
            for (int m = 0; m < n; m++) {
                Member member = members.get(m);
                Set<Integer> ids = new LinkedHashSet<>(buckling.crossingPartners(member.id()));
                Map<Integer, Integer> bits = new HashMap<>();
                partners[m] = new int[Math.min(ids.size(), MAX_PARTNERS)];
                int b = 0;
                for (int id : ids) {
                    if (b < MAX_PARTNERS) {
                        partners[m][b] = index.get(id);
                        bits.put(id, b);
                    }
                    b++;
                }
                partnerBits.add(bits);
                lengthsByMask.add(new HashMap<>());
                maskable[m] = ids.size() <= MAX_PARTNERS;
                everyCase[m] = !member.axialOnly() || !maskable[m] || checker.hasNominalForce(member.id());
                envelopes[m] = MemberEnvelope.empty(member.id());
                classes[m] = everyCase[m] ? null : new CaseClasses();
                demands.add(new ArrayList<>());
            }
        }

        Evaluation run() throws UnstableStructureException {
            double[] restraintForces = new double[frame.nodes().size() * 6];
            List<String> caseIds = new ArrayList<>();
            List<Double> azimuths = new ArrayList<>();
            double[] weights = new double[loads.basis().size()];
            int c = 0;
            for (Combination combination : loads.combinations()) {
                List<Double> sweep = combination.hasWind() ? loads.azimuths() : java.util.Collections.singletonList(null);
                for (Double azimuth : sweep) {
                    String caseId = new CaseKey(combination, azimuth).id();
                    caseIds.add(caseId);
                    azimuths.add(azimuth);
                    loads.basis().weights(combination, azimuth, weights);
                    responses.requireLoadCarried(caseId, weights, restraintForces);
                    addCase(c++, caseId, azimuth, weights);
                }
            }
            for (int m = 0; m < members.size(); m++) {
                if (!everyCase[m]) {
                    finishClasses(m, caseIds, azimuths);
                }
            }
            List<List<Demand>> reduced = new ArrayList<>(members.size());
            for (List<Demand> list : demands) {
                reduced.add(Demands.reduce(list));
            }
            return new Evaluation(frame, checker, Arrays.asList(envelopes), reduced, caseIds.size(), checkCount);
        }

        private void addCase(int caseIndex, String caseId, Double azimuth, double[] weights) {
            responses.axialForces(weights, axial);
            for (int m = 0; m < members.size(); m++) {
                long mask = mask(m);
                if (!everyCase[m]) {
                    classes[m].add(caseIndex, axial[m], mask);
                    continue;
                }
                Member member = members.get(m);
                MemberForces forces;
                if (member.axialOnly()) {
                    forces = MemberForces.axial(axial[m]);
                } else {
                    responses.endForces(m, weights, ends);
                    forces = MemberForces.ofEndActions(axial[m], ends);
                }
                BucklingLength lengths = maskable[m] ? lengths(m, mask)
                        : buckling.forCase(member.id(), id -> axial[index.get(id)]);
                checkCount++;
                envelopes[m] = envelopes[m].with(checker.check(member, lengths, forces, id -> axial[index.get(id)]),
                        forces, caseId, azimuth);
                demands.get(m).add(new Demand(member, lengths,
                        checker.designForces(member.id(), forces, id -> axial[index.get(id)]), caseId));
            }
        }

        /** A case chosen for checking: its number, its partner state and the member's axial force in it. */
        private record Pick(int caseIndex, long mask, double axial) { }

        /** Checks the chosen cases of an axial-only member in case order, and keeps each class's worst as a demand. */
        private void finishClasses(int m, List<String> caseIds, List<Double> azimuths) {
            CaseClasses cc = classes[m];
            Member member = members.get(m);
            List<Pick> picks = new ArrayList<>(2 * cc.size());
            for (int s = 0; s < cc.size(); s++) {
                picks.add(new Pick(cc.firstCase(s), cc.mask(s), cc.firstAxial(s)));
                if (cc.extremeCase(s) != cc.firstCase(s)) {
                    picks.add(new Pick(cc.extremeCase(s), cc.mask(s), cc.extremeAxial(s)));
                }
                demands.get(m).add(new Demand(member, lengths(m, cc.mask(s)), MemberForces.axial(cc.extremeAxial(s)),
                        caseIds.get(cc.extremeCase(s))));
            }
            picks.sort(java.util.Comparator.comparingInt(Pick::caseIndex)); // each case is in one class only
            for (Pick p : picks) {
                MemberForces forces = MemberForces.axial(p.axial());
                envelopes[m] = envelopes[m].with(check(member, lengths(m, p.mask()), forces), forces,
                        caseIds.get(p.caseIndex()), azimuths.get(p.caseIndex()));
            }
        }

        private MemberCheckResult check(Member member, BucklingLength lengths, MemberForces forces) {
            checkCount++;
            Connection connection = checker.connectionOf(member.id());
            return method.check(new MemberCheckInput(member, frame.material(), lengths, connection, forces));
        }

        /** Bit b set when crossing partner b is in tension in the current case. */
        private long mask(int m) {
            int[] p = partners[m];
            long mask = 0;
            for (int b = 0; b < p.length; b++) {
                if (axial[p[b]] > 0) {
                    mask |= 1L << b;
                }
            }
            return mask;
        }

        /** The buckling lengths of member m when its partners' tension state is {@code mask}. */
        private BucklingLength lengths(int m, long mask) {
            Map<Long, BucklingLength> cache = lengthsByMask.get(m);
            BucklingLength known = cache.get(mask);
            if (known != null) {
                return known;
            }
            Map<Integer, Integer> bits = partnerBits.get(m);
            BucklingLength found = buckling.forCase(members.get(m).id(), id -> {
                Integer b = bits.get(id);
                if (b == null) {
                    throw new IllegalStateException("member " + members.get(m).id() + ": the crossing rule asked for "
                            + "member " + id + ", which is not one of its crossing partners");
                }
                return (mask & (1L << b)) != 0 ? 1.0 : -1.0;
            });
            cache.put(mask, found);
            return found;
        }
    }
}
