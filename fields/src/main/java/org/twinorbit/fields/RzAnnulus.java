package org.twinorbit.fields;

import org.twinorbit.shared.Vec3;

/**
 * The domain R0 ≤ R ≤ R1, Z0 ≤ Z ≤ Z1 of a grid with uniform R and Z nodes, shared by the
 * cylindrical and the axisymmetric grid: a particle leaving it is lost.
 *
 * @param r the R nodes (m), increasing
 * @param z the Z nodes (m), increasing
 */
record RzAnnulus(double[] r, double[] z) {

    /** The distance (m) from a Cartesian point (m) to the nearest edge; negative outside. */
    double margin(double x, double y, double zz) {
        double rr = Math.sqrt(x * x + y * y);
        return Math.min(Math.min(rr - r[0], r[r.length - 1] - rr), Math.min(zz - z[0], z[z.length - 1] - zz));
    }

    /** The domain in words, for reports. */
    String meaning() {
        return "the grid's annulus " + r[0] + " <= R <= " + r[r.length - 1] + " m, " + z[0] + " <= Z <= "
                + z[z.length - 1] + " m; a particle leaving it is lost";
    }

    /** The middle of the R–Z box at φ = 0 (m). */
    Vec3 centre() {
        return new Vec3((r[0] + r[r.length - 1]) / 2, 0, (z[0] + z[z.length - 1]) / 2);
    }

    /** The largest extent (m): the outer diameter or the height, whichever is larger. */
    double extent() {
        return Math.max(2 * r[r.length - 1], z[z.length - 1] - z[0]);
    }
}
