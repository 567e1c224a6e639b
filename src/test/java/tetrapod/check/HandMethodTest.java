package tetrapod.check;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The hand method for leg base forces, worked by hand. */
class HandMethodTest {

    /** The diagonal of a 3.8 m × 4.9 m leg rectangle: √(3.8² + 4.9²) = √38.45 = 6.2008 m (common practice, geometry). */
    @Test
    void diagonalOfARectangularBase() {
        assertEquals(6.20, HandMethod.baseDiagonal(3.8, 4.9), 0.005);
        assertEquals(Math.sqrt(38.45), HandMethod.baseDiagonal(4.9, 3.8), 1e-12);
    }

    /**
     * A square base 5 m wide (d = 7.0711 m), N = 400 kN, H = 50 kN at 20 m: M = 1 000 kN·m.
     * Wind on the diagonal: 400/4 ± 1000/7.0711 = 100 ± 141.42: 241.42 kN compression, 41.42 kN uplift.
     * Wind normal to a face: 100 ± 1000/(2 · 5) = 100 ± 100: 200 kN and 0.
     */
    @Test
    void legForcesForAWorkedCase() {
        double m = HandMethod.baseMoment(50e3, 20);
        assertEquals(1000e3, m, 1e-6);
        double d = HandMethod.baseDiagonal(5, 5);
        HandMethod.LegForces diagonal = HandMethod.diagonal(400e3, m, d);
        assertEquals(241.42e3, diagonal.compression(), 10);
        assertEquals(41.42e3, diagonal.tension(), 10);
        HandMethod.LegForces face = HandMethod.faceNormal(400e3, m, 5);
        assertEquals(200e3, face.compression(), 1e-6);
        assertEquals(0, face.tension(), 1e-6);
    }

    /** Any azimuth reduces to the two named formulas: 0° and 90° face-normal, the diagonal's direction N/4 ± M/d. */
    @Test
    void anyAzimuthAgreesWithTheNamedFormulas() {
        double n = 400e3;
        double m = 1000e3;
        assertEquals(HandMethod.faceNormal(n, m, 4.9).compression(), HandMethod.atAzimuth(n, m, 0, 4.9, 3.8).compression(), 1e-6);
        assertEquals(HandMethod.faceNormal(n, m, 3.8).compression(), HandMethod.atAzimuth(n, m, 90, 4.9, 3.8).compression(), 1e-6);
        double alongDiagonal = Math.toDegrees(Math.atan2(3.8, 4.9));
        assertEquals(HandMethod.diagonal(n, m, HandMethod.baseDiagonal(4.9, 3.8)).compression(),
                HandMethod.atAzimuth(n, m, alongDiagonal, 4.9, 3.8).compression(), 1e-6);
        assertEquals(HandMethod.diagonal(n, m, HandMethod.baseDiagonal(5, 5)).tension(),
                HandMethod.atAzimuth(n, m, 225, 5, 5).tension(), 1e-6);
    }

    @Test
    void forAzimuthCarriesItsInputsAndTheDifference() {
        HandMethod.Result r = HandMethod.forAzimuth(45, 400e3, 50e3, 20, 0, 5, 5);
        assertEquals(1000e3, r.m(), 1e-6);
        assertEquals(HandMethod.baseDiagonal(5, 5), r.d(), 1e-12);
        assertEquals(241.42e3, r.legs().compression(), 10);
        // the analysis gives 236 kN: (236 − 241.42)/241.42 = −2.25 %
        assertEquals(-2.245, HandMethod.Result.differencePct(241.42e3, 236e3), 1e-3);
    }
}
