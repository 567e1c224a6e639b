package tetrapod.analysis;

import java.nio.file.Path;
import java.util.Optional;
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
import tetrapod.common.ProgressListener;
import tetrapod.generate.Tower;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.load.TowerLoads;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;
import tetrapod.solve.FactoredSystem;
import tetrapod.solve.Solver;
import tetrapod.solve.StructuralModel;

/**
 * What the serviceability sweep (issue 14) adds to {@code analyze}'s analysis: the analysis with it
 * and without it, and the serviceability work alone (the service wind and plan, the service basis
 * solved with the one factorisation, every level's fit per basis vector, every azimuth superposed).
 * Target: under 10 % of the analysis. Run from the repository root (the models are read from models/).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 4, time = 5)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class ServiceabilityBenchmark {

    @Param({"models/hilltop-relay-k.json", "models/ridge-lookout-square.json"})
    public String model;

    private TowerSpec spec;
    private Tower tower;
    private TowerLoads loads;
    private FactoredSystem system;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        SectionCatalogue catalogue = SectionCatalogue.standard();
        spec = SpecReader.read(Path.of(model), catalogue);
        tower = TowerGenerator.generate(spec, catalogue.with(spec.userSections()), SteelGrades.fromSpec(spec.material()));
        spec = ComputedStructuralFactor.resolve(spec, tower, null, false).spec();   // as analyze fills it in
        loads = TowerLoads.build(tower, spec.loads());
        system = Solver.factor(StructuralModel.of(tower.frame()));
        ServiceabilityPlan plan = ServiceabilityPlan.of(tower, loads, spec.serviceability()).orElseThrow();
        System.out.printf("%n[setup] %s: %d members, %d levels, %d ancillaries, %d service basis vectors, %d azimuths%n",
                spec.name(), tower.frame().members().size(), tower.levels().size(), loads.ancillaries().size(),
                plan.loads().basis().size(), plan.loads().azimuths().size());
    }

    /** The analysis as {@code analyze} runs it, the serviceability sweep included. */
    @Benchmark
    public AnalysisResult analysisWithServiceability() throws Exception {
        return Analysis.run(tower, loads, spec.checks(), NaturalModes.DEFAULT_COUNT,
                ServiceabilityPlan.of(tower, loads, spec.serviceability()), ProgressListener.NONE);
    }

    /** The same analysis without the serviceability sweep. */
    @Benchmark
    public AnalysisResult analysisWithoutServiceability() throws Exception {
        return Analysis.run(tower, loads, spec.checks(), NaturalModes.DEFAULT_COUNT, Optional.empty(),
                ProgressListener.NONE);
    }

    /** The serviceability work alone: plan and service wind, basis solves, fits, every azimuth. */
    @Benchmark
    public ServiceabilityResult serviceabilityAlone() throws Exception {
        ServiceabilityPlan plan = ServiceabilityPlan.of(tower, loads, spec.serviceability()).orElseThrow();
        return ServiceabilitySweep.of(system, plan).run();
    }
}
