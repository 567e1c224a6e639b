package tetrapod.solve;

/**
 * Eigenvalues and eigenvectors of a small symmetric matrix (n ≤ 3 here) by cyclic Jacobi
 * rotations (Golub & Van Loan, <i>Matrix Computations</i>, 4th ed., §8.5). Eigenvalues come out in
 * ascending order; {@link #vector(int)} is the unit eigenvector of {@link #value(int)}.
 */
final class SmallSymmetricEigen {

    private static final int MAX_SWEEPS = 50;

    private final int n;
    private final double[] values;
    private final double[][] vectors; // vectors[k] = k-th eigenvector

    /** @param a row-major n×n symmetric matrix (input, not modified) */
    SmallSymmetricEigen(double[] a, int n) {
        this.n = n;
        double[] m = a.clone();
        double[] v = new double[n * n];
        for (int i = 0; i < n; i++) {
            v[i * n + i] = 1;
        }
        for (int sweep = 0; sweep < MAX_SWEEPS && offDiagonal(m) > 1e-300; sweep++) {
            double scale = 0;
            for (int i = 0; i < n * n; i++) {
                scale = Math.max(scale, Math.abs(m[i]));
            }
            if (offDiagonal(m) <= 1e-32 * scale * scale) {
                break;
            }
            for (int p = 0; p < n - 1; p++) {
                for (int q = p + 1; q < n; q++) {
                    rotate(m, v, p, q);
                }
            }
        }
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, (x, y) -> Double.compare(m[x * n + x], m[y * n + y]));
        values = new double[n];
        vectors = new double[n][n];
        for (int k = 0; k < n; k++) {
            int c = order[k];
            values[k] = m[c * n + c];
            for (int r = 0; r < n; r++) {
                vectors[k][r] = v[r * n + c];
            }
        }
    }

    private double offDiagonal(double[] m) {
        double s = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (i != j) {
                    s += m[i * n + j] * m[i * n + j];
                }
            }
        }
        return s;
    }

    private void rotate(double[] m, double[] v, int p, int q) {
        double apq = m[p * n + q];
        if (apq == 0) {
            return;
        }
        double app = m[p * n + p];
        double aqq = m[q * n + q];
        double theta = (aqq - app) / (2 * apq);
        double t = Math.signum(theta) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        if (theta == 0) {
            t = 1;
        }
        double c = 1 / Math.sqrt(t * t + 1);
        double s = t * c;
        for (int k = 0; k < n; k++) { // columns p, q of m·J
            double mkp = m[k * n + p];
            double mkq = m[k * n + q];
            m[k * n + p] = c * mkp - s * mkq;
            m[k * n + q] = s * mkp + c * mkq;
        }
        for (int k = 0; k < n; k++) { // rows p, q of Jᵀ·m
            double mpk = m[p * n + k];
            double mqk = m[q * n + k];
            m[p * n + k] = c * mpk - s * mqk;
            m[q * n + k] = s * mpk + c * mqk;
        }
        for (int k = 0; k < n; k++) {
            double vkp = v[k * n + p];
            double vkq = v[k * n + q];
            v[k * n + p] = c * vkp - s * vkq;
            v[k * n + q] = s * vkp + c * vkq;
        }
    }

    double value(int k) {
        return values[k];
    }

    /** Unit eigenvector k (a copy). */
    double[] vector(int k) {
        return vectors[k].clone();
    }
}
