package tetrapod.solve;

import tetrapod.model.Member;

/**
 * A member as the solver uses it: end node indices, local axes, length and stiffness constants.
 *
 * @param beam true for a beam-column (12 DOFs: translations and rotations at both ends), false
 *             for an axial-only bar (6 DOFs: translations at both ends)
 * @param ea   E·A, N
 * @param eiy  E·Iy about local y, N·m² (Iy = SectionProperties.iu())
 * @param eiz  E·Iz about local z, N·m² (Iz = SectionProperties.iv())
 * @param gj   G·J, N·m²
 */
record MemberElement(Member member, int i, int j, boolean beam, LocalAxes axes, double length,
                     double ea, double eiy, double eiz, double gj) {

    /** Number of assembly DOFs: 12 for a beam-column, 6 for an axial-only member. */
    int size() {
        return beam ? 12 : 6;
    }

    /**
     * The DOF codes (see {@link DofNumbering#code}) of the element's assembly DOFs, in the order
     * of {@link #assemblyMatrix}.
     */
    int[] codes(DofNumbering numbering) {
        int[] c = new int[size()];
        int k = 0;
        for (int end : new int[] {i, j}) {
            for (int d = 0; d < (beam ? 6 : 3); d++) {
                c[k++] = numbering.code(end, d);
            }
        }
        return c;
    }

    /**
     * Element stiffness in the assembly DOFs (global axes, or a node's own basis where it has one),
     * row-major size()×size(), new array.
     */
    double[] assemblyMatrix(NodeConstraints constraints) {
        double[] lambda = axes.rotation();
        double[] ti = times(lambda, constraints.translationBasis(i));
        double[] tj = times(lambda, constraints.translationBasis(j));
        if (beam) {
            double[] ri = times(lambda, constraints.rotationBasis(i));
            double[] rj = times(lambda, constraints.rotationBasis(j));
            double[] kLocal = ElementStiffness.beamLocal(1, 1, ea, eiy, eiz, gj, length);
            return ElementStiffness.transform(kLocal, new double[][] {ti, ri, tj, rj});
        }
        // Axial bar: elongation = x·(u_j − u_i) = b·d with b = [−(first row of T_i), first row of T_j].
        double[] b = {-ti[0], -ti[1], -ti[2], tj[0], tj[1], tj[2]};
        double s = ea / length;
        double[] k = new double[36];
        for (int r = 0; r < 6; r++) {
            for (int c = 0; c < 6; c++) {
                k[6 * r + c] = s * b[r] * b[c];
            }
        }
        return k;
    }

    /** λ·Q (row-major 3×3); λ itself when Q is null (global axes). */
    private static double[] times(double[] lambda, double[] q) {
        if (q == null) {
            return lambda;
        }
        double[] out = new double[9];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                out[3 * r + c] = lambda[3 * r] * q[c] + lambda[3 * r + 1] * q[3 + c] + lambda[3 * r + 2] * q[6 + c];
            }
        }
        return out;
    }

    /**
     * End actions from the global displacements of the end nodes (6 each: ux uy uz rx ry rz).
     * Closed-form f = k·d with d the local end displacements (see {@link ElementStiffness}).
     */
    MemberEndForces endForces(double[] ui, double[] uj) {
        double[] l = axes.rotation();
        double[] d = new double[12];
        for (int r = 0; r < 3; r++) {
            d[r] = l[3 * r] * ui[0] + l[3 * r + 1] * ui[1] + l[3 * r + 2] * ui[2];
            d[3 + r] = l[3 * r] * ui[3] + l[3 * r + 1] * ui[4] + l[3 * r + 2] * ui[5];
            d[6 + r] = l[3 * r] * uj[0] + l[3 * r + 1] * uj[1] + l[3 * r + 2] * uj[2];
            d[9 + r] = l[3 * r] * uj[3] + l[3 * r + 1] * uj[4] + l[3 * r + 2] * uj[5];
        }
        double n = ea / length * (d[6] - d[0]); // tension positive
        if (!beam) {
            return new MemberEndForces(member.id(), new EndForces(-n, 0, 0, 0, 0, 0), new EndForces(n, 0, 0, 0, 0, 0));
        }
        double len = length;
        double t = gj / len * (d[3] - d[9]);
        double dv = d[1] - d[7];
        double dw = d[2] - d[8];
        double vy = 12 * eiz / (len * len * len) * dv + 6 * eiz / (len * len) * (d[5] + d[11]);
        double mzI = 6 * eiz / (len * len) * dv + eiz / len * (4 * d[5] + 2 * d[11]);
        double mzJ = 6 * eiz / (len * len) * dv + eiz / len * (2 * d[5] + 4 * d[11]);
        double vz = 12 * eiy / (len * len * len) * dw - 6 * eiy / (len * len) * (d[4] + d[10]);
        double myI = -6 * eiy / (len * len) * dw + eiy / len * (4 * d[4] + 2 * d[10]);
        double myJ = -6 * eiy / (len * len) * dw + eiy / len * (2 * d[4] + 4 * d[10]);
        return new MemberEndForces(member.id(),
                new EndForces(-n, vy, vz, t, myI, mzI),
                new EndForces(n, -vy, -vz, -t, myJ, mzJ));
    }
}
