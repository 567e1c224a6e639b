package tetrapod.solve;

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
import org.ejml.data.DMatrixSparseCSC;
import tetrapod.model.Frame;

/**
 * Model preparation, assembly, factorisation and one solve, separately, for generated towers of
 * about 2k, 10k, 50k and 200k free DOFs (frame idealisation, bottom-up order).
 * Targets: 50k DOFs assembled and factorised in under 1 s; each further solve under 20 ms.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xms2g", "-Xmx6g"})
@State(Scope.Benchmark)
public class SolverBenchmark {

    @Param({"2000", "10000", "50000", "200000"})
    public int dofs;

    private Frame frame;
    private StructuralModel model;
    private DMatrixSparseCSC kff;
    private FactoredSystem system;
    private LoadVector load;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        int panels = BenchTowers.panelsFor(dofs);
        frame = BenchTowers.tower(panels, 0);
        model = StructuralModel.of(frame);
        kff = Assembler.assemble(model).kff();
        system = Solver.factor(model);
        load = BenchTowers.topLoads(frame, panels);
        System.out.printf("%n[setup] %s: %d nodes, %d members, %d free DOFs, L has %d non-zeros, ordering %s%n",
                frame.name(), frame.nodes().size(), frame.members().size(), model.freeDofCount(),
                system.factorNonZeros(), model.ordering());
    }

    /** Frame → StructuralModel: validation, auto-restraints, ordering, DOF numbering. */
    @Benchmark
    public StructuralModel prepareModel() {
        return StructuralModel.of(frame);
    }

    /** Element matrices → sparse K (triplets → CSC, duplicates summed). */
    @Benchmark
    public Object assemble() {
        return Assembler.assemble(model);
    }

    /** Cholesky of the assembled K alone. */
    @Benchmark
    public Object factorise() {
        return CholeskyFactor.factor(kff);
    }

    /** Assembly + factorisation + pivot check: what Solver.factor costs. */
    @Benchmark
    public FactoredSystem assembleAndFactorise() throws Exception {
        return Solver.factor(model);
    }

    /** The bare forward and back substitution with L, for comparison with {@link #solve()}. */
    @Benchmark
    public double[] substitution() {
        double[] b = new double[model.freeDofCount()];
        java.util.Arrays.fill(b, 1e3);
        SparseKernels.choleskySolve(system.lowerFactor(), b);
        return b;
    }

    /** One further load vector: substitution, reactions, equilibrium check. */
    @Benchmark
    public Solution solve() throws Exception {
        return system.solve(load);
    }
}
