package tetrapod.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * The least-squares rigid-body fit of a level's leg nodes. Checks from geometry alone: a prescribed
 * small rigid motion u_i = t + ω × r_i (r_i from the centroid) leaves a zero residual, so the fit must
 * return t and ω exactly; and a motion orthogonal to every rigid motion (the "saddle" of a square, its
 * legs moving up and down alternately) must give a zero fit. Invented positions and motions.
 */
class RigidBodyFitTest {

    /** A level of a tapered, off-centre, non-square tower: four leg nodes, not a rectangle. */
    private static final double[][] LEVEL = {{1.2, -0.7, 18.0}, {4.9, -0.9, 18.0}, {5.3, 2.6, 18.0}, {0.8, 3.1, 18.0}};

    @Test
    void aPrescribedRigidMotionIsRecoveredExactly() {
        double[] t = {0.031, -0.012, -0.004};
        double[] w = {0.0021, -0.0035, 0.0012};
        double[] c = centroid(LEVEL);
        double[][] u = new double[4][];
        for (int i = 0; i < 4; i++) {
            double[] r = {LEVEL[i][0] - c[0], LEVEL[i][1] - c[1], LEVEL[i][2] - c[2]};
            u[i] = new double[] {t[0] + w[1] * r[2] - w[2] * r[1], t[1] + w[2] * r[0] - w[0] * r[2],
                t[2] + w[0] * r[1] - w[1] * r[0]};
        }
        double[] fit = new RigidBodyFit(LEVEL).fit(u, new double[6]);
        for (int k = 0; k < 3; k++) {
            assertEquals(t[k], fit[k], 1e-15, "translation " + k);
            assertEquals(w[k], fit[3 + k], 1e-15, "rotation " + k);
        }
    }

    @Test
    void pointsOffTheLevelPlaneAreFittedToo() {
        double[][] points = {{0, 0, 0}, {2, 0, 0.5}, {2, 3, -0.4}, {0, 3, 1.1}, {1, 1, 2.0}};
        double[] w = {-0.004, 0.0025, 0.003};
        double[] c = centroid(points);
        double[][] u = new double[points.length][];
        for (int i = 0; i < points.length; i++) {
            double[] r = {points[i][0] - c[0], points[i][1] - c[1], points[i][2] - c[2]};
            u[i] = new double[] {w[1] * r[2] - w[2] * r[1], w[2] * r[0] - w[0] * r[2], w[0] * r[1] - w[1] * r[0]};
        }
        double[] fit = new RigidBodyFit(points).fit(u, new double[6]);
        for (int k = 0; k < 3; k++) {
            assertEquals(0, fit[k], 1e-15);
            assertEquals(w[k], fit[3 + k], 1e-15);
        }
    }

    /** Legs of a square going up, down, up, down: no rigid motion explains any of it. */
    @Test
    void theSaddleOfASquareFitsToNothing() {
        double[][] square = {{-1, -1, 0}, {1, -1, 0}, {1, 1, 0}, {-1, 1, 0}};
        double[][] u = {{0, 0, 0.01}, {0, 0, -0.01}, {0, 0, 0.01}, {0, 0, -0.01}};
        double[] fit = new RigidBodyFit(square).fit(u, new double[6]);
        for (int k = 0; k < 6; k++) {
            assertEquals(0, fit[k], 1e-15, "component " + k);
        }
    }

    /**
     * A leg of a 2 m square settling by 10 mm alone: the best plane through the four vertical
     * displacements (0, 0, −10, 0 mm at (−1, −1), (1, −1), (1, 1), (−1, 1)) is −2.5 mm + (−2.5 mm) x/m +
     * (−2.5 mm) y/m (least squares by hand: mean −2.5; slope Σ x u / Σ x² = −10/4 per m), i.e.
     * ω_x = −2.5e-3 rad (u_z = ω_x y) and ω_y = +2.5e-3 rad (u_z = −ω_y x).
     */
    @Test
    void oneSettlingLegTiltsTheLevelByTheBestPlane() {
        double[][] square = {{-1, -1, 0}, {1, -1, 0}, {1, 1, 0}, {-1, 1, 0}};
        double[][] u = {{0, 0, 0}, {0, 0, 0}, {0, 0, -0.010}, {0, 0, 0}};
        double[] fit = new RigidBodyFit(square).fit(u, new double[6]);
        assertEquals(-0.0025, fit[2], 1e-15);
        assertEquals(-0.0025, fit[3], 1e-15);
        assertEquals(0.0025, fit[4], 1e-15);
    }

    @Test
    void pointsOnOneLineAreRefused() {
        double[][] line = {{0, 0, 0}, {1, 1, 0}, {2, 2, 0}, {3, 3, 0}};
        assertThrows(IllegalArgumentException.class, () -> new RigidBodyFit(line));
    }

    private static double[] centroid(double[][] points) {
        double[] c = new double[3];
        for (double[] p : points) {
            for (int k = 0; k < 3; k++) {
                c[k] += p[k] / points.length;
            }
        }
        return c;
    }
}
