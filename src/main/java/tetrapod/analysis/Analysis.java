package tetrapod.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import tetrapod.check.Extreme;
import tetrapod.check.FoundationCheck;
import tetrapod.check.FoundationEnvelope;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberEnvelope;
import tetrapod.check.ReactionLevel;
import tetrapod.common.ProgressListener;
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
        StructuralModel model = StructuralModel.of(tower.frame());
        progress.progress("prepare model", 1, 1);
        FactoredSystem system = Solver.factor(model, progress);
        LoadBasis basis = loads.basis();
        List<LoadVector> vectors = new ArrayList<>(basis.size());
        for (LoadComponent c : basis.components()) {
            vectors.add(new LoadVector(c.name(), c.loads()));
        }
        BasisResponses responses = BasisResponses.of(system, vectors, progress);

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
                sweep.add(key, basis.weights(c, azimuth, weights));
                progress.progress("sweep and checks", ++done, total + serviceTotal);
            }
        }
        for (Combination c : service) {
            for (Double azimuth : azimuthsOf(c, azimuths)) {
                CaseKey key = new CaseKey(c, azimuth);
                keys.put(key.id(), key);
                sweep.addService(key, basis.weights(c, azimuth, weights));
                progress.progress("sweep and checks", ++done, total + serviceTotal);
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
        for (MemberEnvelope m : members) {
            addGoverning(reported, keys, m.governingWhere());
        }
        for (FoundationEnvelope f : foundations) {
            f.checks().values().forEach(g -> addGoverning(reported, keys, g.where()));
        }
        List<SolvedCase> cases = new ArrayList<>(reported.size());
        int solved = 0;
        for (CaseKey key : reported.values()) {
            cases.add(solveCase(system, loads.loadCase(key)));
            progress.progress("cases in full", ++solved, reported.size());
        }
        List<NaturalMode> natural = NaturalModes.of(system, basis, modes);
        progress.progress("natural modes", 1, 1);
        List<AzimuthWind> wind = new ArrayList<>();
        loads.wind().ifPresent(w -> REPORTED_AZIMUTHS.forEach(a -> wind.add(w.azimuth(a))));
        return new AnalysisResult(tower, loads, model, cases, wind, sweep.legBaseSweeps(), legBases, members,
                foundations, sweep.handComparisons(), responses, (int) total, sweep.utilisationByAzimuth(),
                sweep.autoRestraintPeaks(), natural);
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
        Solution solution = system.solve(new LoadVector(loadCase.id(), loadCase.loads()));
        solution.requireLoadCarried(loadCase.id());
        double alphaCr = CriticalLoad.factor(system, CriticalLoad.axialForces(solution));
        if (alphaCr <= 1) {
            throw new UnstableStructureException(String.format(java.util.Locale.ROOT, "unstable structure: in case '%s' "
                    + "the elastic critical load factor α_cr is %.3f (≤ 1): the structure buckles as a whole under "
                    + "these forces (EN 1993-1-1 5.2.1); stiffen the legs or the bracing", loadCase.id(), alphaCr),
                    java.util.List.of());
        }
        return new SolvedCase(loadCase.id(), loadCase.combination(), loadCase.azimuthDeg(), solution, alphaCr);
    }

    /** The azimuths a combination is taken at: {@code azimuths} with wind, one null without. */
    private static List<Double> azimuthsOf(Combination c, List<Double> azimuths) {
        return c.hasWind() ? azimuths : java.util.Collections.singletonList(null);
    }

}
