package tetrapod.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import tetrapod.check.Extreme;
import tetrapod.check.FoundationCheck;
import tetrapod.check.FoundationEnvelope;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.check.ReactionLevel;
import tetrapod.common.BadInputException;
import tetrapod.common.ProgressListener;
import tetrapod.common.SideTask;
import tetrapod.common.UnstableStructureException;
import tetrapod.generate.Tower;
import tetrapod.load.AzimuthWind;
import tetrapod.load.CaseKey;
import tetrapod.load.Combination;
import tetrapod.load.LoadBasis;
import tetrapod.load.LoadCase;
import tetrapod.load.LoadComponent;
import tetrapod.load.TowerLoads;
import tetrapod.model.spec.ChecksSpec;
import tetrapod.model.spec.LoadAction;
import tetrapod.model.spec.ServiceabilitySpec;
import tetrapod.solve.BasisResponses;
import tetrapod.solve.CriticalLoad;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.LoadVector;
import tetrapod.solve.Solution;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/** Runs the analysis of a tower under its loads. */
public final class Analysis {

    /** Azimuths reported in full, degrees. */
    public static final List<Double> REPORTED_AZIMUTHS = List.of(0.0, 45.0, 90.0, 135.0, 180.0, 225.0, 270.0, 315.0);

    private Analysis() { }

    /**
     * Factors the stiffness once, solves the load basis once, sweeps every combination over every
     * azimuth by superposition, and solves the reported cases directly.
     *
     * @throws UnstableStructureException when the structure is a mechanism
     */
    public static AnalysisResult run(Tower tower, TowerLoads loads, ChecksSpec checks, ProgressListener progress)
            throws UnstableStructureException {
        return run(tower, loads, checks, NaturalModes.DEFAULT_COUNT, progress);
    }

    /**
     * As {@link #run(Tower, TowerLoads, ChecksSpec, ProgressListener)}, with the {@code modes}
     * lowest natural modes (fewer when the structure has fewer massed translations; 0 for none).
     */
    public static AnalysisResult run(Tower tower, TowerLoads loads, ChecksSpec checks, int modes,
                                     ProgressListener progress) throws UnstableStructureException {
        return run(tower, loads, checks, modes, progress, Runtime.getRuntime().availableProcessors());
    }

    /**
     * As {@link #run(Tower, TowerLoads, ChecksSpec, int, ProgressListener)}, with the member checks
     * of the sweep on {@code threads} threads (at least 1; the results are the same with any number).
     */
    public static AnalysisResult run(Tower tower, TowerLoads loads, ChecksSpec checks, int modes,
                                     ProgressListener progress, int threads) throws UnstableStructureException {
        return run(tower, loads, checks, modes, defaultPlan(tower, loads), progress, threads);
    }

    /**
     * As {@link #run(Tower, TowerLoads, ChecksSpec, int, ProgressListener)}, with the serviceability
     * sweep of {@code serviceability} (empty for none: an explicit frame).
     */
    public static AnalysisResult run(Tower tower, TowerLoads loads, ChecksSpec checks, int modes,
                                     Optional<ServiceabilityPlan> serviceability, ProgressListener progress)
            throws UnstableStructureException {
        return run(tower, loads, checks, modes, serviceability, progress, Runtime.getRuntime().availableProcessors());
    }

    /**
     * The analysis in full: the serviceability sweep of {@code serviceability} (empty for none) and the
     * member checks of the sweep on {@code threads} threads (at least 1; the results do not depend on it).
     */
    public static AnalysisResult run(Tower tower, TowerLoads loads, ChecksSpec checks, int modes,
                                     Optional<ServiceabilityPlan> serviceability, ProgressListener progress,
                                     int threads) throws UnstableStructureException {
        return run(tower, loads, checks, modes, serviceability, Optional.empty(), progress, threads);
    }

    /**
     * As {@link #run(Tower, TowerLoads, ChecksSpec, int, Optional, ProgressListener, int)}, with the
     * tower's stiffness already factorised ({@code factored}: the one the response factor's modes were
     * computed with; empty to factorise it here). The factor is the same either way.
     */
    public static AnalysisResult run(Tower tower, TowerLoads loads, ChecksSpec checks, int modes,
                                     Optional<ServiceabilityPlan> serviceability, Optional<FactoredSystem> factored,
                                     ProgressListener progress, int threads) throws UnstableStructureException {
        FactoredSystem system;
        if (factored.isPresent()) {
            system = factored.get();
        } else {
            StructuralModel model = StructuralModel.of(tower.frame());
            progress.progress("prepare model", 1, 1);
            system = Solver.factor(model, progress);
        }
        StructuralModel model = system.model();
        LoadBasis basis = loads.basis();
        List<LoadVector> vectors = new ArrayList<>(basis.size());
        for (LoadComponent c : basis.components()) {
            vectors.add(new LoadVector(c.name(), c.loads()));
        }
        // the natural modes need only the factor and the masses: found beside the sweep and the cases in
        // full when there is more than one thread
        SideTask<List<NaturalMode>> modal = threads > 1
                ? SideTask.start("tetrapod-modes", () -> NaturalModes.of(system, basis, modes)) : null;
        BasisResponses responses;
        SecondOrder second;
        Pass used;
        try {
            responses = BasisResponses.of(system, vectors, progress);
            Pass first = pass(tower, loads, checks, model, system, basis, responses, progress, threads, 1.0, Map.of());
            second = SecondOrder.of(first.cases());
            Map<String, Double> firstOrderAlpha = new HashMap<>();
            first.cases().forEach(c -> firstOrderAlpha.put(c.id(), c.alphaCr()));
            used = second.applied()
                    ? pass(tower, loads, checks, model, system, basis, responses, progress, threads,
                            second.amplification(), firstOrderAlpha)
                    : first;
        } finally {
            if (modal != null) {
                modal.await();
            }
        }
        Sweep sweep = used.sweep();
        List<NaturalMode> natural = modal != null ? modal.resultUnchecked() : NaturalModes.of(system, basis, modes);
        progress.progress("natural modes", 1, 1);
        ServiceabilityResult movement = null;
        if (serviceability.isPresent()) {
            movement = ServiceabilitySweep.of(system, serviceability.get()).run();
            progress.progress("serviceability", 1, 1);
        }
        List<AzimuthWind> wind = new ArrayList<>();
        loads.wind().ifPresent(w -> REPORTED_AZIMUTHS.forEach(a -> wind.add(w.azimuth(a))));
        return new AnalysisResult(tower, loads, model, used.cases(), wind, sweep.legBaseSweeps(), used.legBases(),
                used.members(), used.foundations(), sweep.handComparisons(), responses, (int) used.total(),
                sweep.utilisationByAzimuth(), sweep.autoRestraintPeaks(), natural, second, movement);
    }

    /** The sweep, the checks and the cases solved in full, with the wind multiplied by {@code sway}. */
    private record Pass(Sweep sweep, List<SolvedCase> cases, List<LegBaseExtremes> legBases,
                        List<MemberEnvelope> members, List<FoundationEnvelope> foundations, long total) { }

    /**
     * @param firstOrderAlpha α_cr of the first-order cases by id (empty for the first-order pass): the
     *                        amplified cases keep the α_cr of their first-order forces, the one
     *                        EN 1993-1-1 5.2.1 and 5.2.2 speak of
     */
    private static Pass pass(Tower tower, TowerLoads loads, ChecksSpec checks, StructuralModel model,
                             FactoredSystem system, LoadBasis basis, BasisResponses responses, ProgressListener progress,
                             int threads, double sway, Map<String, Double> firstOrderAlpha) throws UnstableStructureException {
        String sweeping = sway == 1.0 ? "sweep and checks" : "sweep and checks, second order";
        String solving = sway == 1.0 ? "cases in full" : "cases in full, second order";
        FoundationCheck footing = checks.foundationSpec()
                .map(f -> new FoundationCheck(f, checks.partialFactors())).orElse(null);
        LoadResultants resultants = new LoadResultants(tower.frame(),
                basis.components().stream().map(LoadComponent::loads).toList());
        double baseX = tower.isGenerated() ? tower.levels().get(0).widthX() : Double.NaN;
        double baseY = tower.isGenerated() ? tower.levels().get(0).widthY() : Double.NaN;
        Sweep sweep = new Sweep(model, responses, MemberChecker.of(tower, checks), footing, resultants, baseX, baseY,
                threads);
        Map<String, CaseKey> keys = new HashMap<>();
        List<Double> azimuths = loads.azimuths();
        long total = 0;
        for (Combination c : loads.combinations()) {
            total += c.hasWind() ? azimuths.size() : 1;
        }
        List<Combination> service = footing != null && footing.checksAt(ReactionLevel.SERVICE)
                ? loads.serviceCombinations() : List.of();
        long serviceTotal = 0;
        for (Combination c : service) {
            serviceTotal += c.hasWind() ? azimuths.size() : 1;
        }
        long done = 0;
        double[] weights = new double[basis.size()];
        for (Combination c : loads.combinations()) {
            for (Double azimuth : azimuthsOf(c, azimuths)) {
                CaseKey key = new CaseKey(c, azimuth);
                keys.put(key.id(), key);
                sweep.add(key, amplified(basis, basis.weights(c, azimuth, weights), sway));
                progress.progress(sweeping, ++done, total + serviceTotal);
            }
        }
        for (Combination c : service) {
            for (Double azimuth : azimuthsOf(c, azimuths)) {
                CaseKey key = new CaseKey(c, azimuth);
                keys.put(key.id(), key);
                sweep.addService(key, amplified(basis, basis.weights(c, azimuth, weights), sway));
                progress.progress(sweeping, ++done, total + serviceTotal);
            }
        }

        Map<String, CaseKey> reported = new LinkedHashMap<>();
        for (Combination c : loads.combinations()) {
            for (Double azimuth : azimuthsOf(c, REPORTED_AZIMUTHS)) {
                CaseKey key = new CaseKey(c, azimuth);
                reported.put(key.id(), key);
            }
        }
        List<LegBaseExtremes> legBases = sweep.legBaseExtremes();
        List<MemberEnvelope> members = sweep.memberEnvelopes();
        List<FoundationEnvelope> foundations = sweep.foundationEnvelopes();
        for (LegBaseExtremes leg : legBases) {
            for (Extreme e : List.of(leg.compression(), leg.uplift(), leg.shear())) {
                addGoverning(reported, keys, e);
            }
        }
        // a member's governing case is not solved in full: its forces in that case are in its envelope,
        // so that the cases written grow with the combinations and the supports, not with the members
        for (FoundationEnvelope f : foundations) {
            f.checks().values().forEach(g -> addGoverning(reported, keys, g.where()));
        }
        List<CaseKey> toSolve = new ArrayList<>(reported.values());
        List<SolvedCase> cases = inFull(system, loads, toSolve, sway, firstOrderAlpha, threads, solving, progress);
        return new Pass(sweep, cases, legBases, members, foundations, total);
    }

    /** Cases whose α_cr are found together, per thread (each keeps its Lanczos vectors meanwhile). */
    private static final int ALPHA_BLOCK = 8;

    /**
     * The reported cases solved in full, their wind multiplied by {@code sway}, each with the α_cr of
     * its first-order forces: every case solved on its own (the factor is only read), on every core;
     * then the α_cr still to find, a few cases together on each core ({@link CriticalLoad#factors},
     * the same bits as one at a time). A case that fails stops the run with the error it met first
     * (its solve, its α_cr ≤ 1), the first such case in order.
     *
     * @throws UnstableStructureException of the first case that fails
     */
    private static List<SolvedCase> inFull(FactoredSystem system, TowerLoads loads, List<CaseKey> keys, double sway,
                                           Map<String, Double> firstOrderAlpha, int threads, String solving,
                                           ProgressListener progress) throws UnstableStructureException {
        int count = keys.size();
        InFull[] work = new InFull[count];
        Workers workers = new Workers(threads);
        workers.run(count, k -> work[k] = InFull.solve(system, loads, keys.get(k), sway, firstOrderAlpha));
        progress.progress(solving, 0, count);
        List<Integer> open = new ArrayList<>();
        for (int k = 0; k < count; k++) {
            if (work[k].axial != null) {
                open.add(k);
            }
        }
        int groups = Math.max(Math.min(threads, open.size()), (open.size() + ALPHA_BLOCK - 1) / ALPHA_BLOCK);
        int size = groups == 0 ? 0 : (open.size() + groups - 1) / groups;
        // every group taken by the next free thread (the first groups run cold, and slower); progress
        // told from this thread only, as listeners are not thread-safe
        Thread caller = Thread.currentThread();
        AtomicInteger found = new AtomicInteger();
        workers.run(groups, g -> {
            List<Integer> mine = open.subList(Math.min(open.size(), g * size), Math.min(open.size(), (g + 1) * size));
            List<double[]> axial = new ArrayList<>(mine.size());
            mine.forEach(k -> axial.add(work[k].axial));
            double[] alpha = CriticalLoad.factors(system, axial);
            for (int i = 0; i < mine.size(); i++) {
                work[mine.get(i)].alphaCr = alpha[i];
            }
            int done = found.addAndGet(mine.size());
            if (Thread.currentThread() == caller) {
                progress.progress(solving, done, open.size());
            }
        });
        List<SolvedCase> out = new ArrayList<>(count);
        for (InFull w : work) {
            out.add(w.result());
        }
        progress.progress(solving, count, count);
        return out;
    }

    /** One reported case solved, with what its α_cr needs or the α_cr it keeps, and any failure met so far. */
    private static final class InFull {
        private LoadCase loadCase;
        private Solution solution;
        private double wind;
        private double[] axial;                 // the first-order forces whose α_cr is still to find, else null
        private double alphaCr = Double.NaN;
        private UnstableStructureException before;      // met before the α_cr
        private UnstableStructureException after;       // met after it (an amplified case's own solve)

        /** The case's own solve, and the first-order one first when only the amplified case was reported. */
        static InFull solve(FactoredSystem system, TowerLoads loads, CaseKey key, double sway,
                            Map<String, Double> firstOrderAlpha) {
            InFull w = new InFull();
            w.wind = key.combination().hasWind() ? sway : 1.0;
            w.loadCase = loads.loadCase(key, sway);
            Double given = firstOrderAlpha.get(key.id());
            try {
                if (given == null && w.wind != 1.0) {
                    // a case that governs only amplified: the α_cr of its first-order forces
                    LoadCase firstOrder = loads.loadCase(key);
                    Solution s = system.solve(new LoadVector(firstOrder.id(), firstOrder.loads()));
                    s.requireLoadCarried(firstOrder.id());
                    w.axial = CriticalLoad.axialForces(s);
                }
            } catch (UnstableStructureException e) {
                w.before = e;
                return w;
            }
            try {
                w.solution = system.solve(new LoadVector(w.loadCase.id(), w.loadCase.loads()));
                w.solution.requireLoadCarried(w.loadCase.id());
            } catch (UnstableStructureException e) {
                if (w.axial != null) {
                    w.after = e;
                } else {
                    w.before = e;
                    return w;
                }
            }
            if (given != null) {
                w.alphaCr = given;
            } else if (w.axial == null) {
                w.axial = CriticalLoad.axialForces(w.solution);
            }
            return w;
        }

        SolvedCase result() throws UnstableStructureException {
            if (before != null) {
                throw before;
            }
            requireStable(loadCase.id(), alphaCr);
            if (after != null) {
                throw after;
            }
            return new SolvedCase(loadCase.id(), loadCase.combination(), loadCase.azimuthDeg(), solution, alphaCr, wind);
        }
    }

    /** @throws UnstableStructureException when α_cr ≤ 1: the structure buckles as a whole under the case's forces */
    private static void requireStable(String caseId, double alphaCr) throws UnstableStructureException {
        if (alphaCr <= 1) {
            throw new UnstableStructureException(String.format(java.util.Locale.ROOT, "unstable structure: in case '%s' "
                    + "the elastic critical load factor α_cr is %.3f (≤ 1): the structure buckles as a whole under "
                    + "these forces (EN 1993-1-1 5.2.1); stiffen the legs or the bracing", caseId, alphaCr),
                    java.util.List.of());
        }
    }

    /**
     * The weights with every wind component multiplied by {@code sway}: the horizontal loads of
     * EN 1993-1-1 5.2.2(5)B, whose first-order effects so amplified stand for the second-order ones.
     */
    private static double[] amplified(LoadBasis basis, double[] weights, double sway) {
        if (sway != 1.0) {
            for (int j = 0; j < weights.length; j++) {
                LoadAction a = basis.components().get(j).action();
                if (a == LoadAction.WIND || a == LoadAction.WIND_ON_ICE) {
                    weights[j] *= sway;
                }
            }
        }
        return weights;
    }

    /** The serviceability plan with the default service wind and no limits (none for an explicit frame). */
    private static Optional<ServiceabilityPlan> defaultPlan(Tower tower, TowerLoads loads) {
        try {
            return ServiceabilityPlan.of(tower, loads, ServiceabilitySpec.NONE);
        } catch (BadInputException e) {
            throw new IllegalStateException("no level ranges, no problem: " + e.getMessage(), e);
        }
    }

    /** Adds the case where {@code e} occurred to the reported cases (after those already there). */
    private static void addGoverning(Map<String, CaseKey> reported, Map<String, CaseKey> keys, Extreme e) {
        if (e != null && e.caseId() != null && keys.containsKey(e.caseId())) {
            reported.putIfAbsent(e.caseId(), keys.get(e.caseId()));
        }
    }

    /**
     * Solves one load case directly (not by superposition), for a full report of it.
     *
     * @throws UnstableStructureException when the structure is a mechanism, an auto-restraint
     *         would carry part of the case's load, or the case's elastic critical load factor is ≤ 1
     */
    public static SolvedCase solveCase(FactoredSystem system, LoadCase loadCase) throws UnstableStructureException {
        return solveCase(system, loadCase, 1.0, null);
    }

    /**
     * As {@link #solveCase(FactoredSystem, LoadCase)}, for a case whose wind forces were multiplied by
     * {@code windAmplification} (second order, {@link SecondOrder}), which the case records with the
     * α_cr of its first-order forces {@code firstOrderAlpha} (null: of the forces solved here).
     */
    static SolvedCase solveCase(FactoredSystem system, LoadCase loadCase, double windAmplification,
                                Double firstOrderAlpha) throws UnstableStructureException {
        Solution solution = system.solve(new LoadVector(loadCase.id(), loadCase.loads()));
        solution.requireLoadCarried(loadCase.id());
        double alphaCr = firstOrderAlpha != null ? firstOrderAlpha
                : CriticalLoad.factor(system, CriticalLoad.axialForces(solution));
        requireStable(loadCase.id(), alphaCr);
        return new SolvedCase(loadCase.id(), loadCase.combination(), loadCase.azimuthDeg(), solution, alphaCr,
                windAmplification);
    }

    /** The azimuths a combination is taken at: {@code azimuths} with wind, one null without. */
    private static List<Double> azimuthsOf(Combination c, List<Double> azimuths) {
        return c.hasWind() ? azimuths : java.util.Collections.singletonList(null);
    }

}
