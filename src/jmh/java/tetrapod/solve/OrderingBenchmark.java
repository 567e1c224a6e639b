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
import tetrapod.model.Frame;

/**
 * The effect of the node ordering on EJML's Cholesky (which has no fill-reducing ordering of its
 * own): the same ~2k-DOF tower with its nodes in random order, factorised in that order
 * ("scrambled") and after reverse Cuthill–McKee ("rcm"), and in its bottom-up order ("bottomUp").
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class OrderingBenchmark {

    @Param({"2000"})
    public int dofs;

    @Param({"scrambled", "rcm", "bottomUp"})
    public String order;

    private StructuralModel model;

    @Setup(Level.Trial)
    public void setUp() throws Exception {
        Frame frame = BenchTowers.tower(BenchTowers.panelsFor(dofs), order.equals("bottomUp") ? 0 : 20240917L);
        NodeOrdering ordering = order.equals("rcm") ? NodeOrdering.REVERSE_CUTHILL_MCKEE : NodeOrdering.GIVEN;
        model = StructuralModel.of(frame, ordering);
        FactoredSystem system = Solver.factor(model);
        System.out.printf("%n[setup] %s, %s: %d free DOFs, node bandwidth %d, profile %d, L non-zeros %d%n",
                frame.name(), order, model.freeDofCount(), model.ordering().bandwidth(), model.ordering().profile(),
                system.factorNonZeros());
    }

    @Benchmark
    public FactoredSystem assembleAndFactorise() throws Exception {
        return Solver.factor(model);
    }
}
