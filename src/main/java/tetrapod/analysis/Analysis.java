package tetrapod.analysis;

import java.util.ArrayList;
import java.util.List;
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
import tetrapod.model.NodalLoad;
import tetrapod.model.Support;
import tetrapod.solve.BasisResponses;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.LoadVector;
import tetrapod.solve.NodeForce;
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
    public static AnalysisResult run(Tower tower, TowerLoads loads, ProgressListener progress)
            throws UnstableStructureException {
        StructuralModel model = StructuralModel.of(tower.frame());
        FactoredSystem system = Solver.factor(model, progress);
        LoadBasis basis = loads.basis();
        List<LoadVector> vectors = new ArrayList<>(basis.size());
        for (LoadComponent c : basis.components()) {
            vectors.add(vector(c.name(), c.loads()));
        }
        BasisResponses responses = BasisResponses.of(system, vectors);

        Sweep sweep = new Sweep(tower.frame(), responses);
        List<Double> azimuths = loads.azimuths();
        long total = 0;
        for (Combination c : loads.combinations()) {
            total += c.hasWind() ? azimuths.size() : 1;
        }
        long done = 0;
        double[] weights = new double[basis.size()];
        for (Combination c : loads.combinations()) {
            if (c.hasWind()) {
                sweep.startCombination(c.name(), azimuths.size());
                for (double azimuth : azimuths) {
                    sweep.add(c.name(), azimuth, basis.weights(c, azimuth, weights));
                    progress.progress("sweep", ++done, total);
                }
            } else {
                sweep.add(c.name(), null, basis.weights(c, null, weights));
                progress.progress("sweep", ++done, total);
            }
        }

        List<SolvedCase> cases = new ArrayList<>();
        for (Combination c : loads.combinations()) {
            for (Double azimuth : c.hasWind() ? REPORTED_AZIMUTHS : java.util.Collections.<Double>singletonList(null)) {
                cases.add(solveCase(system, loads.loadCase(new CaseKey(c, azimuth))));
            }
        }
        List<AzimuthWind> wind = new ArrayList<>();
        loads.wind().ifPresent(w -> REPORTED_AZIMUTHS.forEach(a -> wind.add(w.azimuth(a))));
        return new AnalysisResult(tower, loads, model, cases, wind, sweep.legBaseSweeps(), sweep.legBaseExtremes(),
                sweep.memberEnvelopes(), responses, (int) total);
    }

    /** Solves one load case directly (not by superposition), for a full report of it. */
    public static SolvedCase solveCase(FactoredSystem system, LoadCase loadCase) throws UnstableStructureException {
        Solution solution = system.solve(vector(loadCase.id(), loadCase.loads()));
        return new SolvedCase(loadCase.id(), loadCase.combination(), loadCase.azimuthDeg(), solution);
    }

    static LoadVector vector(String name, List<NodalLoad> loads) {
        List<NodeForce> forces = new ArrayList<>(loads.size());
        for (NodalLoad l : loads) {
            forces.add(new NodeForce(l.node(), l.fx(), l.fy(), l.fz(), l.mx(), l.my(), l.mz()));
        }
        return new LoadVector(name, forces);
    }

    static List<Integer> supportNodes(List<Support> supports) {
        return supports.stream().map(Support::node).toList();
    }
}
