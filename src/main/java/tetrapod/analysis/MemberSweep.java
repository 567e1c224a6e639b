package tetrapod.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntToDoubleFunction;
import tetrapod.check.MemberCheckResult;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.check.MemberForces;
import tetrapod.check.MemberUtilisation;
import tetrapod.load.CaseKey;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.solve.BasisResponses;

/**
 * The member checks of the sweep: every member's check envelope over every case, and the most
 * utilised member of each case, the same as checking every member in full at every case, with
 * the numbers of {@link MemberUtilisation} and the words of {@link MemberChecker#check} only where
 * they are written.
 *
 * <p>Cases come in blocks. For each block: (1) every member's axial force in every case, by
 * superposition; (2) per member and case, its buckling state and design axial force, and the
 * utilisation of an axial-only member, or of a member with bending a lower bound (its checks of
 * the axial force alone); (3) for a member with bending, its end moments and utilisation only
 * where an upper bound reaches both the member's largest lower bound so far and the largest lower
 * bound of any member in that case: elsewhere the case can neither govern the member nor make it
 * the most utilised member of the case, since its utilisation is below another's. The upper bound
 * takes the moments at most Σ_k max|w_k| |M_k| (the weights' largest magnitudes over a few
 * consecutive cases of one combination, M_k the member's end moment in basis response k, with a
 * margin far above rounding) and C_m at its largest (ψ = 1): every strength check grows with both
 * ({@link MemberUtilisation#atMost}); (4) the most utilised member of each case.
 *
 * <p>At the end each member's envelope is made by {@link MemberEnvelope#with}, with the checks in
 * full, from the cases that decide it, in case order: the first case of each buckling state and
 * sign of the design force (the requirements depend on nothing else), the governing case, and the
 * first cases of largest tension and of largest compression. The envelope is the full sweep's:
 * every case left out has a smaller utilisation, force and requirement ratio, or an equal one
 * later. Members are shared among the threads and each member's cases are taken in order, so the
 * results are the same with any number of threads.
 */
final class MemberSweep {

    /** Block size: cases × members per block at most this (about 8 MB per block array). */
    private static final int BLOCK_ENTRIES = 1 << 20;
    /** Consecutive cases of one combination whose moments share one bound. */
    private static final int GROUP = 8;
    /** Relative margin on a bound of the moments: far above the rounding of a sum of a few thousand terms. */
    private static final double MARGIN = 1e-9;

    private final List<Member> members;
    private final int n;
    private final BasisResponses responses;
    private final MemberChecker checker;
    private final Workers workers;
    private final int chunk;
    private final int blockCases;
    private final Track[] tracks;
    private final Map<Integer, Integer> index = new HashMap<>();

    private final List<CaseKey> keys = new ArrayList<>();
    private final List<double[]> weights = new ArrayList<>();
    private int processed;
    private double[] worstUtilisation = new double[0];
    private int[] worstMember = new int[0];
    private long evaluated;
    private long skipped;

    // block buffers, [case in block × n + member]
    private double[] axial = new double[0];
    private double[] design = new double[0];
    private double[] util = new double[0];
    private int[] state = new int[0];
    private double[] caseFloor = new double[0];

    MemberSweep(Frame frame, BasisResponses responses, MemberChecker checker, int threads) {
        this.members = frame.members();
        this.n = members.size();
        this.responses = responses;
        this.checker = checker;
        this.workers = new Workers(threads);
        this.chunk = Math.max(1, (n + 4 * threads - 1) / (4 * threads));
        this.blockCases = Math.max(1, Math.min(4096, BLOCK_ENTRIES / Math.max(1, n)));
        this.tracks = new Track[n];
        for (int m = 0; m < n; m++) {
            tracks[m] = new Track(checker.utilisation(m), !members.get(m).axialOnly());
            index.put(members.get(m).id(), m);
        }
    }

    /** One more case (its key and basis weights, input: copied). */
    void add(CaseKey key, double[] caseWeights) {
        keys.add(key);
        weights.add(caseWeights.clone());
        if (keys.size() - processed >= blockCases) {
            block();
        }
    }

    /** Member checks of every case added: each member's envelope, in frame order. */
    Result finish() {
        if (keys.size() > processed) {
            block();
        }
        MemberEnvelope[] envelopes = new MemberEnvelope[n];
        workers.run(chunks(), t -> {
            for (int m = t * chunk; m < Math.min(n, (t + 1) * chunk); m++) {
                envelopes[m] = envelope(m);
            }
        });
        return new Result(List.of(envelopes), Arrays.copyOf(worstUtilisation, keys.size()),
                Arrays.copyOf(worstMember, keys.size()), evaluated, skipped);
    }

    /**
     * The member checks of a sweep.
     *
     * @param envelopes        every member's envelope, frame order
     * @param worstUtilisation per case (in the order added), the largest member utilisation
     * @param worstMember      per case, the id of that member (the first in frame order on a tie)
     * @param evaluated        member cases whose utilisation was computed
     * @param skipped          member cases left out because they could not matter
     */
    record Result(List<MemberEnvelope> envelopes, double[] worstUtilisation, int[] worstMember, long evaluated,
                  long skipped) { }

    private int chunks() {
        return (n + chunk - 1) / chunk;
    }

    /** The cases added since the last block. */
    private void block() {
        int first = processed;
        int count = keys.size() - first;
        if (axial.length < count * n) {
            axial = new double[count * n];
            design = new double[count * n];
            util = new double[count * n];
            state = new int[count * n];
        }
        if (caseFloor.length < count) {
            caseFloor = new double[count];
        }
        workers.run(Math.min(count, 4 * workers.threads()), t -> {
            for (int b = t; b < count; b += 4 * workers.threads()) {
                responses.axialForces(weights.get(first + b), axial, b * n);
            }
        });
        long[] counts = new long[2 * chunks()];
        workers.run(chunks(), t -> axialChecks(t, first, count));
        workers.run(Math.min(count, 4 * workers.threads()), t -> {
            for (int b = t; b < count; b += 4 * workers.threads()) {
                double floor = Double.NEGATIVE_INFINITY;
                for (int m = 0; m < n; m++) {
                    floor = Math.max(floor, util[b * n + m]);
                }
                caseFloor[b] = floor;
            }
        });
        List<int[]> groups = groups(first, count);
        double[][] largestWeights = largestWeights(groups, first);
        workers.run(chunks(), t -> bendingChecks(t, first, count, groups, largestWeights, counts));
        if (worstUtilisation.length < first + count) {
            worstUtilisation = Arrays.copyOf(worstUtilisation, Math.max(first + count, 2 * worstUtilisation.length));
            worstMember = Arrays.copyOf(worstMember, worstUtilisation.length);
        }
        workers.run(Math.min(count, 4 * workers.threads()), t -> {
            for (int b = t; b < count; b += 4 * workers.threads()) {
                double worst = -1;
                int id = 0;
                for (int m = 0; m < n; m++) {
                    if (util[b * n + m] > worst) {
                        worst = util[b * n + m];
                        id = members.get(m).id();
                    }
                }
                worstUtilisation[first + b] = worst;
                worstMember[first + b] = id;
            }
        });
        for (int k = 0; k < counts.length; k += 2) {
            evaluated += counts[k];
            skipped += counts[k + 1];
        }
        processed = keys.size();
    }

    /**
     * Step (2) for the members of chunk {@code t}: state, design force, extremes and requirement
     * classes; the utilisation of axial-only members; a lower bound for members with bending.
     */
    private void axialChecks(int t, int first, int count) {
        BlockRow row = new BlockRow(axial);
        for (int m = t * chunk; m < Math.min(n, (t + 1) * chunk); m++) {
            Track track = tracks[m];
            for (int b = 0; b < count; b++) {
                int at = b * n + m;
                int c = first + b;
                row.base = b * n;
                double own = axial[at];
                int s = track.u.state(row);
                double d = track.u.designAxial(own, row);
                state[at] = s;
                design[at] = d;
                track.extremes(own, c);
                track.classOf(2 * s + (d < 0 ? 1 : 0), c);
                if (track.bending) {
                    util[at] = track.u.atLeast(s, d);
                } else {
                    double u = track.u.of(s, d, 0, 0, 0, 0);
                    util[at] = checked(u, m, c);
                    track.offer(u, c);
                }
            }
        }
    }

    /** Step (3) for the members with bending of chunk {@code t}. */
    private void bendingChecks(int t, int first, int count, List<int[]> groups, double[][] largestWeights,
                               long[] counts) {
        long done = 0;
        long left = 0;
        for (int m = t * chunk; m < Math.min(n, (t + 1) * chunk); m++) {
            Track track = tracks[m];
            if (!track.bending) {
                done += count;
                continue;
            }
            double floor = track.best;
            for (int b = 0; b < count; b++) {
                floor = Math.max(floor, util[b * n + m]);
            }
            for (int g = 0; g < groups.size(); g++) {
                double[] w = largestWeights[g];
                double momentY = Math.max(bound(m, 4, w), bound(m, 10, w));
                double momentZ = Math.max(bound(m, 5, w), bound(m, 11, w));
                for (int b = groups.get(g)[0]; b < groups.get(g)[1]; b++) {
                    int at = b * n + m;
                    int c = first + b;
                    double most = track.u.atMost(state[at], design[at], momentY, momentZ);
                    if (most < floor && most < caseFloor[b]) {
                        util[at] = Double.NEGATIVE_INFINITY;
                        left++;
                        continue;
                    }
                    double[] wc = weights.get(c);
                    double u = track.u.of(state[at], design[at], responses.endForce(m, 4, wc), responses.endForce(m, 10, wc),
                            responses.endForce(m, 5, wc), responses.endForce(m, 11, wc));
                    util[at] = checked(u, m, c);
                    track.offer(u, c);
                    done++;
                }
            }
        }
        counts[2 * t] = done;
        counts[2 * t + 1] = left;
    }

    /** Runs of at most {@link #GROUP} consecutive cases of one combination in the block, as [from, to). */
    private List<int[]> groups(int first, int count) {
        List<int[]> out = new ArrayList<>();
        int from = 0;
        for (int b = 1; b <= count; b++) {
            if (b == count || b - from == GROUP
                    || !keys.get(first + b).combination().equals(keys.get(first + from).combination())) {
                out.add(new int[] {from, b});
                from = b;
            }
        }
        return out;
    }

    /** Per group, the largest magnitude of each basis weight over its cases. */
    private double[][] largestWeights(List<int[]> groups, int first) {
        double[][] out = new double[groups.size()][];
        for (int g = 0; g < groups.size(); g++) {
            double[] w = new double[responses.size()];
            for (int b = groups.get(g)[0]; b < groups.get(g)[1]; b++) {
                double[] wc = weights.get(first + b);
                for (int k = 0; k < w.length; k++) {
                    w[k] = Math.max(w[k], Math.abs(wc[k]));
                }
            }
            out[g] = w;
        }
        return out;
    }

    /** An upper bound of |end force component {@code component}| of member m over cases whose weights are at most {@code w}. */
    private double bound(int m, int component, double[] w) {
        double sum = 0;
        for (int k = 0; k < w.length; k++) {
            if (w[k] != 0) {
                sum += w[k] * Math.abs(responses.basisEndForce(k, m, component));
            }
        }
        return sum * (1 + MARGIN) + Double.MIN_NORMAL;
    }

    private double checked(double u, int m, int c) {
        if (Double.isNaN(u)) {
            throw new IllegalStateException("member " + members.get(m).id() + ": no utilisation in case "
                    + keys.get(c).id());
        }
        return u;
    }

    /** Member m's envelope from the checks in full at the cases that decide it. */
    private MemberEnvelope envelope(int m) {
        Track track = tracks[m];
        Member member = members.get(m);
        int[] picks = track.picks();
        MemberEnvelope e = MemberEnvelope.empty(member.id());
        for (int c : picks) {
            double[] w = weights.get(c);
            double own = responses.axialForce(m, w);
            MemberForces forces = member.axialOnly() ? MemberForces.axial(own)
                    : new MemberForces(own, responses.endForce(m, 4, w), responses.endForce(m, 10, w),
                            responses.endForce(m, 5, w), responses.endForce(m, 11, w));
            IntToDoubleFunction byId = id -> responses.axialForce(index.get(id), w);
            MemberCheckResult result = checker.check(member.id(), forces, byId);
            CaseKey key = keys.get(c);
            e = e.with(result, forces, key.id(), key.azimuthDeg());
        }
        if (track.bestCase >= 0 && (!keys.get(track.bestCase).id().equals(e.governingWhere().caseId())
                || Double.compare(e.governing().utilisation(), track.best) != 0)) {
            throw new IllegalStateException("member " + member.id() + ": the sweep found " + track.best + " in case "
                    + keys.get(track.bestCase).id() + ", the checks in full " + e.governing().utilisation() + " in case "
                    + e.governingWhere().caseId());
        }
        return e;
    }

    /** Reads one case's row of the block's axial forces by frame index. */
    private static final class BlockRow implements IntToDoubleFunction {
        private final double[] axial;
        int base;

        BlockRow(double[] axial) {
            this.axial = axial;
        }

        @Override
        public double applyAsDouble(int memberIndex) {
            return axial[base + memberIndex];
        }
    }

    /** What one member's envelope needs from the cases seen so far; touched by one thread at a time. */
    private static final class Track {
        final MemberUtilisation u;
        final boolean bending;
        double best = -1;
        int bestCase = -1;
        double tension;
        int tensionCase = -1;
        double compression;
        int compressionCase = -1;
        int[] classes = new int[0];
        int[] classFirst = new int[0];
        int lastClass = Integer.MIN_VALUE;

        Track(MemberUtilisation u, boolean bending) {
            this.u = u;
            this.bending = bending;
        }

        /** The governing case: the first of largest utilisation. */
        void offer(double utilisation, int c) {
            if (utilisation > best) {
                best = utilisation;
                bestCase = c;
            }
        }

        /** The first cases of largest tension and compression, as {@link tetrapod.check.Extreme} keeps them. */
        void extremes(double axial, int c) {
            double t = Math.max(0, axial);
            if (tensionCase < 0 || t > tension) {
                tension = t;
                tensionCase = c;
            }
            double p = Math.max(0, -axial);
            if (compressionCase < 0 || p > compression) {
                compression = p;
                compressionCase = c;
            }
        }

        /** Notes the first case of each class (buckling state and sign of the design force). */
        void classOf(int key, int c) {
            if (key == lastClass) {
                return;
            }
            lastClass = key;
            for (int k : classes) {
                if (k == key) {
                    return;
                }
            }
            classes = Arrays.copyOf(classes, classes.length + 1);
            classFirst = Arrays.copyOf(classFirst, classFirst.length + 1);
            classes[classes.length - 1] = key;
            classFirst[classFirst.length - 1] = c;
        }

        /** The cases whose checks in full make the envelope, ascending. */
        int[] picks() {
            int[] all = Arrays.copyOf(classFirst, classFirst.length + 3);
            all[classFirst.length] = bestCase;
            all[classFirst.length + 1] = tensionCase;
            all[classFirst.length + 2] = compressionCase;
            return Arrays.stream(all).filter(c -> c >= 0).sorted().distinct().toArray();
        }
    }
}
