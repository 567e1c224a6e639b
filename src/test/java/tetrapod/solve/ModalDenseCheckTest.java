package tetrapod.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.ejml.ops.DConvertMatrixStruct;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import tetrapod.model.Frame;
import tetrapod.model.Idealisation;
import tetrapod.model.Restraint;

/**
 * Subspace iteration against a dense generalised eigensolution of the same stiffness: the
 * massless DOFs (rotations, unmassed nodes) condensed out, K_c = K_mm − K_m0 K_00⁻¹ K_0m, then the
 * symmetric problem M^-½ K_c M^-½ by EJML's dense eigendecomposition (an independent method).
 */
class ModalDenseCheckTest {

    @ParameterizedTest
    @EnumSource(value = Idealisation.class, names = {"TRUSS", "FRAME"})
    void theLowestFrequenciesAgreeWithADenseEigensolution(Idealisation idealisation) throws Exception {
        Frame frame = new TowerFixture(idealisation, 4, 5, 2.5, 12).support(Restraint.PINNED).build();
        StructuralModel model = StructuralModel.of(frame);
        FactoredSystem system = Solver.factor(model);
        double[] nodeMass = new double[frame.nodes().size()];
        for (int n = 0; n < nodeMass.length; n++) {
            nodeMass[n] = 50 + 10 * (n % 7);  // uneven, so that no two modes are equal by symmetry alone
        }
        List<ModalAnalysis.Mode> modes = ModalAnalysis.lowest(system, nodeMass, 6);

        DMatrixRMaj k = DConvertMatrixStruct.convert(Assembler.assemble(model).kff(), (DMatrixRMaj) null);
        DofNumbering numbering = model.numbering();
        List<Integer> massed = new ArrayList<>();
        List<Integer> massless = new ArrayList<>();
        for (int e = 0; e < numbering.freeCount(); e++) {
            boolean hasMass = numbering.freeDof(e) < 3 && nodeMass[numbering.freeNode(e)] > 0;
            (hasMass ? massed : massless).add(e);
        }
        DMatrixRMaj kc = block(k, massed, massed);
        if (!massless.isEmpty()) {
            DMatrixRMaj k00 = block(k, massless, massless);
            DMatrixRMaj k0m = block(k, massless, massed);
            DMatrixRMaj x = new DMatrixRMaj(massless.size(), massed.size());
            CommonOps_DDRM.solve(k00, k0m, x);
            DMatrixRMaj correction = new DMatrixRMaj(massed.size(), massed.size());
            CommonOps_DDRM.multTransA(k0m, x, correction);
            CommonOps_DDRM.subtractEquals(kc, correction);
        }
        int n = massed.size();
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double mi = nodeMass[numbering.freeNode(massed.get(i))];
                double mj = nodeMass[numbering.freeNode(massed.get(j))];
                a.set(i, j, 0.5 * (kc.get(i, j) + kc.get(j, i)) / Math.sqrt(mi * mj));
            }
        }
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, false, true);
        eig.decompose(a);
        double[] reference = new double[n];
        for (int i = 0; i < n; i++) {
            reference[i] = eig.getEigenvalue(i).getReal();
        }
        Arrays.sort(reference);
        for (int i = 0; i < modes.size(); i++) {
            assertEquals(reference[i], modes.get(i).omegaSquared(), 1e-8 * reference[i], "mode " + (i + 1));
        }
    }

    private static DMatrixRMaj block(DMatrixRMaj m, List<Integer> rows, List<Integer> cols) {
        DMatrixRMaj out = new DMatrixRMaj(rows.size(), cols.size());
        for (int i = 0; i < rows.size(); i++) {
            for (int j = 0; j < cols.size(); j++) {
                out.set(i, j, m.get(rows.get(i), cols.get(j)));
            }
        }
        return out;
    }
}
