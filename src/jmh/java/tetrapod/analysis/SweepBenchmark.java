package tetrapod.analysis;

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
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.load.Combination;
import tetrapod.load.LoadBasis;
import tetrapod.load.LoadComponent;
import tetrapod.load.TowerLoads;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;
import tetrapod.solve.BasisResponses;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.LoadVector;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * The azimuth sweep after the factorisation (issue 4): every default combination at every azimuth
 * of a 1° and a 0.1° sweep, with the leg base reactions and the axial force of every member for
 * every case, formed by superposing the responses to the load basis (solved once, in setup).
 * Target: a tower of about 2,000 members, 1° steps under 1 s, 0.1° steps under 5 s.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class SweepBenchmark {

    /** An invented 60 m test tower: three X-braced segments with redundants. */
    private static final String TOWER = """
        { "name": "sweep benchmark tower",
          "base": { "widthX": 9.0, "widthY": 9.0 },
          "segments": [
            { "height": 24.0, "topWidthX": 6.0, "topWidthY": 6.0, "panels": 12, "bracing": "x", "horizontals": "ends",
              "redundants": 2, "sections": { "leg": "L200x20", "diagonal": "L100x10", "horizontal": "L90x8", "redundant": "L60x6" } },
            { "height": 20.0, "topWidthX": 3.5, "topWidthY": 3.5, "panels": 10, "bracing": "x", "horizontals": "ends",
              "redundants": 2, "sections": { "leg": "L150x15", "diagonal": "L80x8", "horizontal": "L75x8", "redundant": "L50x5" } },
            { "height": 16.0, "topWidthX": 2.0, "topWidthY": 2.0, "panels": 8, "bracing": "x", "horizontals": "all",
              "sections": { "leg": "L120x12", "diagonal": "L65x7", "horizontal": "L60x6" } } ],
          "loads": { "wind": { "method": "en1991", "basicSpeed": 27.0, "terrain": "II" }, "sweepStep": %s } }
        """;

    @Param({"1.0", "0.1"})
    public String stepDeg;

    private TowerLoads loads;
    private BasisResponses responses;
    private double[] weights;
    private double[] reactions;
    private double[] axial;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        TowerSpec read = SpecReader.read(TOWER.formatted(stepDeg), catalogue);
        Tower tower = TowerGenerator.generate(read, catalogue, SteelGrades.fromSpec(read.material()));
        TowerSpec spec = ComputedStructuralFactor.resolve(read, tower, null, false).spec();   // as analyze fills it in
        loads = TowerLoads.build(tower, spec.loads());
        StructuralModel model = StructuralModel.of(tower.frame());
        FactoredSystem system = Solver.factor(model);
        LoadBasis basis = loads.basis();
        List<LoadVector> vectors = basis.components().stream()
                .map((LoadComponent c) -> new LoadVector(c.name(), c.loads())).toList();
        responses = BasisResponses.of(system, vectors);
        weights = new double[basis.size()];
        reactions = new double[6 * tower.frame().supports().size()];
        axial = new double[tower.frame().members().size()];
        System.out.printf("%n[setup] %d members, %d free DOFs, %d basis vectors, %d combinations x %d azimuths%n",
                tower.frame().members().size(), model.freeDofCount(), basis.size(), loads.combinations().size(),
                loads.azimuths().size());
    }

    /** Every case's reactions and member axial forces; returns a checksum so nothing is optimised away. */
    @Benchmark
    public double everyCase() {
        double sum = 0;
        for (Combination c : loads.combinations()) {
            for (double azimuth : c.hasWind() ? loads.azimuths() : List.of(0.0)) {
                loads.basis().weights(c, c.hasWind() ? azimuth : null, weights);
                responses.reactions(weights, reactions);
                responses.axialForces(weights, axial);
                sum += reactions[2] + axial[axial.length - 1];
            }
        }
        return sum;
    }
}
