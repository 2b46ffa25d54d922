package org.twinorbit.fields;

import org.twinorbit.shared.FieldSample;

/**
 * A static magnetic field given on a uniform cylindrical grid (R, φ, Z) whose φ nodes cover one
 * full turn, as the components (B_R, B_φ, B_Z) in the grid's own basis. Each component is
 * interpolated by tricubic Hermite interpolation in (R, φ, Z), periodic in φ
 * ({@link TricubicTable}; Lekien &amp; Marsden, Int. J. Numer. Meth. Eng. 63, 2005). Tricubic
 * Hermite rather than a global spline because it is local (a cell needs its 8 nodes), C1 across
 * cells, and its derivative is cheap and exact for the interpolant; the cylindrical components
 * are interpolated rather than B_x, B_y because they vary slowly along φ in the near-axisymmetric
 * fields such grids hold. B and the Jacobian are the interpolant and its own derivative, turned
 * into Cartesian components by {@link CylindricalBasis}. Error: O(h³) in B and O(h²) in the
 * Jacobian for a smooth field. An electrostatic potential Φ on the same nodes, when given, is
 * interpolated the same way and E = −∇Φ is the interpolant's own gradient, so W = kinetic + qΦ is
 * an exact invariant of the interpolated field. The domain is R0 ≤ R ≤ R1, Z0 ≤ Z ≤ Z1; a
 * particle leaving it is lost.
 */
public final class CylindricalGridField extends AnnulusGridField {

    private final double[] phi;
    private final TricubicTable table;

    /**
     * @param name    the field's name in reports
     * @param r       the R nodes (m), uniform, increasing, &gt; 0, at least 4
     * @param phi     the φ nodes (rad), uniform, increasing, at least 4, covering one turn
     *                (count × spacing = 2π)
     * @param z       the Z nodes (m), uniform, increasing, at least 4
     * @param b       B_R, B_φ, B_Z (T) at the nodes, [component][iR][iφ][iZ]
     * @param pot     Φ (V) at the nodes, [iR][iφ][iZ]; null for a field without E
     * @param length  the field's length L (m) that defines ε
     * @param meaning what L means, for reports
     */
    public CylindricalGridField(String name, double[] r, double[] phi, double[] z, double[][][][] b, double[][][] pot,
                                double length, String meaning) {
        super(name, r, z, length, meaning, pot != null);
        this.phi = phi;
        double[] origin = {r[0], phi[0], z[0]};
        double[] h = {step(r), 2 * Math.PI / phi.length, step(z)};
        this.table = new TricubicTable(origin, h, electric ? new double[][][][] {b[0], b[1], b[2], pot} : b,
                new boolean[] {false, true, false});
    }

    private static final class Scratch {
        final double[] val = new double[4];
        final double[][] grad = new double[4][3];
    }

    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(Scratch::new);

    @Override
    public void evaluate(double t, double x, double y, double zz, FieldSample out) {
        out.clear();
        Scratch sc = scratch.get();
        double rr = Math.sqrt(x * x + y * y);
        double p = Math.atan2(y, x);
        table.evaluate(rr, p, zz, sc.val, sc.grad);
        toCartesian(rr, x, y, sc.val, sc.grad, out);
    }

    @Override
    double interpolatedPotential(double x, double y, double zz) {
        Scratch sc = scratch.get();
        table.evaluate(Math.sqrt(x * x + y * y), Math.atan2(y, x), zz, sc.val, sc.grad);
        return sc.val[3];
    }

    @Override public GridGeometry geometry() { return GridGeometry.CYLINDRICAL; }

    @Override
    public String gridSummary() {
        return String.format(java.util.Locale.ROOT, "cylindrical grid of %d x %d x %d nodes (R, phi, Z), spacing %.4g m, "
                + "%.4g rad, %.4g m, tricubic Hermite, periodic in phi%s", r.length, phi.length, z.length, step(r),
                2 * Math.PI / phi.length, step(z), electric ? ", with Phi" : "");
    }

    @Override
    public double[][] cellCentres() {
        int np = phi.length;
        double[][] p = new double[(r.length - 1) * np * (z.length - 1)][];
        int m = 0;
        for (int i = 0; i + 1 < r.length; i++) {
            double rc = (r[i] + r[i + 1]) / 2;
            for (int j = 0; j < np; j++) {
                double pc = phi[0] + (j + 0.5) * 2 * Math.PI / np;
                for (int k = 0; k + 1 < z.length; k++) {
                    p[m++] = new double[] {rc * Math.cos(pc), rc * Math.sin(pc), (z[k] + z[k + 1]) / 2};
                }
            }
        }
        return p;
    }
}
