package tetrapod.analysis;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import tetrapod.check.MemberCheckResult;
import tetrapod.check.MemberChecker;
import tetrapod.check.MemberForces;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.load.CaseKey;
import tetrapod.load.Combination;
import tetrapod.load.LoadComponent;
import tetrapod.load.TowerLoads;
import tetrapod.model.Member;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;
import tetrapod.solve.BasisResponses;
import tetrapod.solve.LoadVector;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * The member checks of the sweep (issue 15 item 1): every member at every case of a tower, after
 * the load basis is solved (in setup). {@code memberSweep} is what {@code analyze} does now
 * ({@link MemberSweep}: superposed axial forces, buckling states, utilisation as numbers, bounds
 * for members with bending, each member's envelope from its checks in full at the few cases that
 * make it); {@code checksInFull} is what it did before: every member checked in full (clauses and
 * notes) at every case. A score is the time of one whole sweep: member-case evaluations per second
 * = members × cases / score ({@code [setup]} prints both counts). Target: ≥ 10 million per second
 * per core ({@code threads = 1}). Run from the repository root (the examples are read from models/).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class MemberCheckBenchmark {

    /** The 60 m tower of {@code SweepBenchmark} (1,700 members with redundants), 1° sweep. Invented. */
    private static final String TOWER = """
        { "name": "member check benchmark tower", "idealisation": "%s",
          "base": { "widthX": 9.0, "widthY": 9.0 },
          "segments": [
            { "height": 24.0, "topWidthX": 6.0, "topWidthY": 6.0, "panels": 12, "bracing": "x", "horizontals": "ends",
              "redundants": 2, "sections": { "leg": "L200x20", "diagonal": "L100x10", "horizontal": "L90x8", "redundant": "L60x6" } },
            { "height": 20.0, "topWidthX": 3.5, "topWidthY": 3.5, "panels": 10, "bracing": "x", "horizontals": "ends",
              "redundants": 2, "sections": { "leg": "L150x15", "diagonal": "L80x8", "horizontal": "L75x8", "redundant": "L50x5" } },
            { "height": 16.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 8, "bracing": "x", "horizontals": "all",
              "sections": { "leg": "L120x12", "diagonal": "L65x7", "horizontal": "L60x6" } } ],
          "loads": { "wind": { "method": "en1991", "basicSpeed": 27.0, "terrain": "II" }, "sweepStep": 1.0 } }
        """;

    /**
     * {@code tower60:continuous-legs} and {@code tower60:frame}: the 60 m tower (legs with bending,
     * or every member); or a bundled example by its file.
     */
    @Param({"tower60:continuous-legs", "tower60:frame", "models/ridge-lookout-square.json"})
    public String model;

    @Param({"1", "2"})
    public int threads;

    private Tower tower;
    private TowerSpec spec;
    private BasisResponses responses;
    private List<CaseKey> keys;
    private List<double[]> weights;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        String text = model.startsWith("tower60:") ? TOWER.formatted(model.substring("tower60:".length()))
                : Files.readString(Path.of(model));
        spec = SpecReader.read(text, catalogue);
        tower = TowerGenerator.generate(spec, catalogue.with(spec.userSections()), SteelGrades.fromSpec(spec.material()));
        spec = ComputedStructuralFactor.resolve(spec, tower, null, false).spec();   // as analyze fills it in
        TowerLoads loads = TowerLoads.build(tower, spec.loads());
        List<LoadVector> vectors = new ArrayList<>();
        for (LoadComponent c : loads.basis().components()) {
            vectors.add(new LoadVector(c.name(), c.loads()));
        }
        responses = BasisResponses.of(Solver.factor(StructuralModel.of(tower.frame())), vectors);
        keys = new ArrayList<>();
        weights = new ArrayList<>();
        for (Combination c : loads.combinations()) {
            for (Double azimuth : c.hasWind() ? loads.azimuths() : java.util.Collections.<Double>singletonList(null)) {
                keys.add(new CaseKey(c, azimuth));
                weights.add(loads.basis().weights(c, azimuth));
            }
        }
        MemberSweep.Result r = memberSweep();
        System.out.printf("%n[setup] %s: %d members (%d with bending) x %d cases = %d member cases; %d evaluated,"
                        + " %d skipped by the bounds%n", spec.name(), tower.frame().members().size(),
                tower.frame().members().stream().filter(m -> !m.axialOnly()).count(), keys.size(),
                (long) keys.size() * tower.frame().members().size(), r.evaluated(), r.skipped());
    }

    /** Every member's envelope and the most utilised member of every case, as {@code analyze} makes them. */
    @Benchmark
    public MemberSweep.Result memberSweep() {
        MemberSweep sweep = new MemberSweep(tower.frame(), responses, MemberChecker.of(tower, spec.checks()), threads);
        for (int c = 0; c < keys.size(); c++) {
            sweep.add(keys.get(c), weights.get(c));
        }
        return sweep.finish();
    }

    /**
     * The way before: every member checked in full, with clauses and notes, at every case, on one
     * thread whatever {@code threads} says (run it with {@code -p threads=1}).
     */
    @Benchmark
    public double checksInFull() {
        MemberChecker checker = MemberChecker.of(tower, spec.checks());
        List<Member> members = tower.frame().members();
        StructuralModel index = StructuralModel.of(tower.frame());
        double[] axial = new double[members.size()];
        double[] ends = new double[12];
        double sum = 0;
        for (double[] w : weights) {
            responses.axialForces(w, axial);
            for (int m = 0; m < members.size(); m++) {
                Member member = members.get(m);
                MemberForces forces;
                if (member.axialOnly()) {
                    forces = MemberForces.axial(axial[m]);
                } else {
                    responses.endForces(m, w, ends);
                    forces = MemberForces.ofEndActions(axial[m], ends);
                }
                MemberCheckResult r = checker.check(member.id(), forces, id -> axial[index.memberIndex(id)]);
                sum += r.utilisation();
            }
        }
        return sum;
    }
}
