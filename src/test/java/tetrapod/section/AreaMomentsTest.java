package tetrapod.section;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class AreaMomentsTest {

    /**
     * Independent check of the spandrel's closed forms: midpoint-rule integration over a fine grid
     * of the square minus the quarter disc, for a spandrel placed off the origin and pointing into
     * −y, +z so that every sign in the transfer terms is exercised.
     */
    @Test
    void spandrelMatchesNumericalIntegration() {
        double r = 3.0;
        double cy = 7.0;
        double cz = -2.0;
        int sy = -1;
        int sz = +1;
        int n = 3000;
        double h = r / n;
        double a = 0, my = 0, mz = 0, myy = 0, mzz = 0, myz = 0;
        for (int i = 0; i < n; i++) {
            double p = (i + 0.5) * h;
            for (int j = 0; j < n; j++) {
                double q = (j + 0.5) * h;
                if ((p - r) * (p - r) + (q - r) * (q - r) < r * r) {
                    continue;
                }
                double y = cy + sy * p;
                double z = cz + sz * q;
                double da = h * h;
                a += da;
                my += y * da;
                mz += z * da;
                myy += y * y * da;
                mzz += z * z * da;
                myz += y * z * da;
            }
        }
        AreaMoments s = AreaMoments.spandrel(cy, cz, r, sy, sz);
        assertEquals(a, s.area(), 1e-3 * a);
        assertEquals(my, s.firstY(), 1e-3 * Math.abs(my));
        assertEquals(mz, s.firstZ(), 1e-3 * Math.abs(mz));
        assertEquals(myy, s.secondYY(), 1e-3 * Math.abs(myy));
        assertEquals(mzz, s.secondZZ(), 1e-3 * Math.abs(mzz));
        assertEquals(myz, s.productYZ(), 1e-3 * Math.abs(myz));
    }

    @Test
    void spandrelAreaIsSquareLessQuarterDisc() {
        // r² − πr²/4, worked by hand
        assertEquals(4.0 - Math.PI, AreaMoments.spandrel(0, 0, 2, 1, 1).area(), 1e-12);
    }

    @Test
    void rectangleAboutItsOwnCentroid() {
        // b h³/12 and h b³/12 for a 6 × 2 rectangle placed anywhere; product 0 by symmetry
        AreaMoments m = AreaMoments.rectangle(4, 10, -3, -1);
        assertEquals(12, m.area(), 1e-12);
        assertEquals(7, m.centroidY(), 1e-12);
        assertEquals(-2, m.centroidZ(), 1e-12);
        assertEquals(6 * 8 / 12.0, m.centroidalIy(), 1e-9);
        assertEquals(2 * 216 / 12.0, m.centroidalIz(), 1e-9);
        assertEquals(0, m.centroidalIyz(), 1e-9);
    }
}
