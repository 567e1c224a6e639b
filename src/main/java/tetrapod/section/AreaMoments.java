package tetrapod.section;

/**
 * Area and moments of a plane region about the origin of its (y, z) axes: A, ∫y dA, ∫z dA,
 * ∫y² dA, ∫z² dA and ∫yz dA. Regions are built from rectangles and fillet spandrels and combined
 * by {@link #plus} and {@link #minus}, so the result is exact for shapes made of those pieces.
 */
record AreaMoments(double area, double firstY, double firstZ, double secondYY, double secondZZ,
                   double productYZ) {

    /** The rectangle y0 ≤ y ≤ y1, z0 ≤ z ≤ z1. */
    static AreaMoments rectangle(double y0, double y1, double z0, double z1) {
        double w = y1 - y0;
        double h = z1 - z0;
        double a = w * h;
        return new AreaMoments(a, a * (y0 + y1) / 2, a * (z0 + z1) / 2,
                h * (y1 * y1 * y1 - y0 * y0 * y0) / 3,
                w * (z1 * z1 * z1 - z0 * z0 * z0) / 3,
                (y1 * y1 - y0 * y0) / 2 * (z1 * z1 - z0 * z0) / 2);
    }

    /**
     * The spandrel of a fillet of radius {@code r}: the part of the r × r square with its corner at
     * (cornerY, cornerZ), reaching into directions signY, signZ (each +1 or −1), that lies outside
     * the quarter circle of radius r centred on the square's opposite corner.
     *
     * <p>In local coordinates p, q ∈ [0, r] from the corner (worked by integrating the square minus
     * the quarter disc):
     * A = r²(1 − π/4), ∫p dA = ∫q dA = r³(5/6 − π/4), ∫p² dA = ∫q² dA = r⁴(1 − 5π/16),
     * ∫pq dA = r⁴(19/24 − π/4).
     */
    static AreaMoments spandrel(double cornerY, double cornerZ, double r, int signY, int signZ) {
        double a = r * r * (1 - Math.PI / 4);
        double p = r * r * r * (5.0 / 6.0 - Math.PI / 4);
        double pp = r * r * r * r * (1 - 5 * Math.PI / 16);
        double pq = r * r * r * r * (19.0 / 24.0 - Math.PI / 4);
        return new AreaMoments(a,
                cornerY * a + signY * p,
                cornerZ * a + signZ * p,
                cornerY * cornerY * a + 2 * cornerY * signY * p + pp,
                cornerZ * cornerZ * a + 2 * cornerZ * signZ * p + pp,
                cornerY * cornerZ * a + cornerY * signZ * p + cornerZ * signY * p + signY * signZ * pq);
    }

    AreaMoments plus(AreaMoments o) {
        return new AreaMoments(area + o.area, firstY + o.firstY, firstZ + o.firstZ,
                secondYY + o.secondYY, secondZZ + o.secondZZ, productYZ + o.productYZ);
    }

    AreaMoments minus(AreaMoments o) {
        return new AreaMoments(area - o.area, firstY - o.firstY, firstZ - o.firstZ,
                secondYY - o.secondYY, secondZZ - o.secondZZ, productYZ - o.productYZ);
    }

    double centroidY() {
        return firstY / area;
    }

    double centroidZ() {
        return firstZ / area;
    }

    /** Second moment about the axis through the centroid parallel to y: ∫(z − z̄)² dA. */
    double centroidalIy() {
        return secondZZ - area * centroidZ() * centroidZ();
    }

    /** Second moment about the axis through the centroid parallel to z: ∫(y − ȳ)² dA. */
    double centroidalIz() {
        return secondYY - area * centroidY() * centroidY();
    }

    /** Product of inertia about the centroidal axes: ∫(y − ȳ)(z − z̄) dA. */
    double centroidalIyz() {
        return productYZ - area * centroidY() * centroidZ();
    }
}
