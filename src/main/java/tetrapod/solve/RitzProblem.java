package tetrapod.solve;

/**
 * The small generalised eigenproblem of a Rayleigh–Ritz step, A z = λ B z with B symmetric
 * positive definite, solved through B = V D Vᵀ and the symmetric eigenproblem of
 * D^-½ Vᵀ A V D^-½ (both by {@link SmallSymmetricEigen}). Values ascending; vectors B-normalised.
 *
 * @param values  λ, ascending
 * @param vectors vectors[k] = z_k (zᵀ B z = 1)
 */
record RitzProblem(double[] values, double[][] vectors) {

    /** @param kr A, @param mr B: row-major q×q, symmetric (input, not modified) */
    static RitzProblem solve(double[] kr, double[] mr, int q) {
        SmallSymmetricEigen mass = new SmallSymmetricEigen(mr, q);
        double[][] t = new double[q][q];  // t[k] = v_k / √d_k
        for (int k = 0; k < q; k++) {
            double d = mass.value(k);
            if (!(d > 0)) {
                throw new IllegalStateException("subspace iteration: the vectors lost independence");
            }
            double[] vk = mass.vector(k);
            for (int r = 0; r < q; r++) {
                t[k][r] = vk[r] / Math.sqrt(d);
            }
        }
        double[] a = new double[q * q];
        for (int i = 0; i < q; i++) {
            for (int j = 0; j < q; j++) {
                double s = 0;
                for (int r = 0; r < q; r++) {
                    for (int c = 0; c < q; c++) {
                        s += t[i][r] * kr[r * q + c] * t[j][c];
                    }
                }
                a[i * q + j] = s;
            }
        }
        symmetrise(a, q);
        SmallSymmetricEigen eig = new SmallSymmetricEigen(a, q);
        double[] values = new double[q];
        double[][] vectors = new double[q][q];
        for (int k = 0; k < q; k++) {
            values[k] = eig.value(k);
            double[] zk = eig.vector(k);
            for (int r = 0; r < q; r++) {
                double s = 0;
                for (int i = 0; i < q; i++) {
                    s += t[i][r] * zk[i];
                }
                vectors[k][r] = s;
            }
        }
        return new RitzProblem(values, vectors);
    }

    /** Makes a row-major q×q matrix exactly symmetric (in place), averaging round-off. */
    static void symmetrise(double[] a, int q) {
        for (int i = 0; i < q; i++) {
            for (int j = i + 1; j < q; j++) {
                double s = 0.5 * (a[i * q + j] + a[j * q + i]);
                a[i * q + j] = s;
                a[j * q + i] = s;
            }
        }
    }
}
