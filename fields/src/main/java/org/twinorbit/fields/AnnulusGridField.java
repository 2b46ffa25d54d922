package org.twinorbit.fields;

import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Vec3;

/**
 * What the cylindrical and the axisymmetric grid share: uniform R and Z nodes, the domain
 * R0 ≤ R ≤ R1, Z0 ≤ Z ≤ Z1 (a particle leaving it is lost; a wall may cut it further), and the turn of the interpolated
 * cylindrical components into Cartesian B, Jacobian and E.
 */
abstract class AnnulusGridField extends GriddedFieldBase {

    /** The R nodes (m), uniform, increasing, &gt; 0. */
    final double[] r;
    /** The Z nodes (m), uniform, increasing. */
    final double[] z;

    /**
     * @param name     the field's name in reports
     * @param r        the R nodes (m), uniform, increasing, &gt; 0
     * @param z        the Z nodes (m), uniform, increasing
     * @param length   the field's length L (m) that defines ε
     * @param meaning  what L means, for reports
     * @param electric whether a potential Φ is given on the nodes
     */
    AnnulusGridField(String name, double[] r, double[] z, double length, String meaning, boolean electric) {
        super(name, length, meaning, electric);
        this.r = r;
        this.z = z;
    }

    /**
     * Fills out with B, its Jacobian and (with Φ) E in Cartesian components, from the interpolated
     * (B_R, B_φ, B_Z, Φ) and their (R, φ, Z) gradients at a point of radius rr (m) and Cartesian
     * x, y (m) ({@link CylindricalBasis}).
     */
    void toCartesian(double rr, double x, double y, double[] val, double[][] grad, FieldSample out) {
        CylindricalBasis.toCartesian(rr, x / rr, y / rr, val, grad, out);
        if (electric) {
            CylindricalBasis.electricField(rr, x / rr, y / rr, grad[3], out);
        }
    }

    @Override
    double gridMargin(double x, double y, double zz) {
        double rr = Math.sqrt(x * x + y * y);
        return Math.min(Math.min(rr - r[0], r[r.length - 1] - rr), Math.min(zz - z[0], z[z.length - 1] - zz));
    }

    @Override
    String gridMeaning() {
        return "the grid's annulus " + r[0] + " <= R <= " + r[r.length - 1] + " m, " + z[0] + " <= Z <= "
                + z[z.length - 1] + " m";
    }

    /** The middle of the R–Z box at φ = 0. */
    @Override
    public Vec3 defaultStart() {
        return new Vec3((r[0] + r[r.length - 1]) / 2, 0, (z[0] + z[z.length - 1]) / 2);
    }

    /** The outer diameter or the height (m), whichever is larger. */
    @Override
    double extent() {
        return Math.max(2 * r[r.length - 1], z[z.length - 1] - z[0]);
    }
}
