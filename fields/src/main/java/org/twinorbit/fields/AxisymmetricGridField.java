package org.twinorbit.fields;

import org.twinorbit.shared.FieldSample;

/**
 * A static axisymmetric magnetic field given on a uniform (R, Z) grid as the components
 * (B_R, B_φ, B_Z), independent of φ. Each component is interpolated by bicubic Hermite
 * interpolation in R–Z ({@link BicubicTable}): local, C1 across cells, with a derivative that is
 * exactly the interpolant's, and it keeps the symmetry exactly (nothing depends on φ), so p_φ stays
 * a true invariant of the interpolated field. B and the Jacobian are the interpolant and its own
 * derivative, turned into Cartesian components by {@link CylindricalBasis}. Error: O(h³) in B and
 * O(h²) in the Jacobian for a smooth field. An electrostatic potential Φ(R, Z) on the same nodes,
 * when given, is interpolated the same way and E = −∇Φ is the interpolant's own gradient, so
 * W = kinetic + qΦ is an exact invariant of the interpolated field. The domain is R0 ≤ R ≤ R1,
 * Z0 ≤ Z ≤ Z1; a particle leaving it is lost.
 */
public final class AxisymmetricGridField extends AnnulusGridField {

    private final BicubicTable table;

    /**
     * @param name    the field's name in reports
     * @param r       the R nodes (m), uniform, increasing, &gt; 0, at least 4
     * @param z       the Z nodes (m), uniform, increasing, at least 4
     * @param b       B_R, B_φ, B_Z (T) at the nodes, [component][iR][iZ]
     * @param pot     Φ (V) at the nodes, [iR][iZ]; null for a field without E
     * @param length  the field's length L (m) that defines ε
     * @param meaning what L means, for reports
     */
    public AxisymmetricGridField(String name, double[] r, double[] z, double[][][] b, double[][] pot, double length,
                                 String meaning) {
        super(name, r, z, length, meaning, pot != null);
        this.table = new BicubicTable(new double[] {r[0], z[0]}, new double[] {step(r), step(z)},
                electric ? new double[][][] {b[0], b[1], b[2], pot} : b);
    }

    private static final class Scratch {
        final double[] val = new double[4];
        final double[][] rz = new double[4][2];
        final double[][] grad = new double[4][3];
    }

    private final ThreadLocal<Scratch> scratch = ThreadLocal.withInitial(Scratch::new);

    @Override
    public void evaluate(double t, double x, double y, double zz, FieldSample out) {
        out.clear();
        Scratch sc = scratch.get();
        double rr = Math.sqrt(x * x + y * y);
        table.evaluate(rr, zz, sc.val, sc.rz);
        for (int c = 0; c < (electric ? 4 : 3); c++) {
            sc.grad[c][0] = sc.rz[c][0];
            sc.grad[c][1] = 0;
            sc.grad[c][2] = sc.rz[c][1];
        }
        toCartesian(rr, x, y, sc.val, sc.grad, out);
    }

    @Override
    double interpolatedPotential(double x, double y, double zz) {
        Scratch sc = scratch.get();
        table.evaluate(Math.sqrt(x * x + y * y), zz, sc.val, sc.rz);
        return sc.val[3];
    }

    @Override public GridGeometry geometry() { return GridGeometry.AXISYMMETRIC; }

    @Override
    public String gridSummary() {
        return String.format(java.util.Locale.ROOT, "axisymmetric grid of %d x %d nodes (R, Z), spacing %.4g, %.4g m, "
                + "bicubic Hermite%s", r.length, z.length, step(r), step(z), electric ? ", with Phi" : "");
    }

    @Override
    public double[][] cellCentres() {
        double[][] p = new double[(r.length - 1) * (z.length - 1)][];
        int m = 0;
        for (int i = 0; i + 1 < r.length; i++) {
            for (int k = 0; k + 1 < z.length; k++) {
                p[m++] = new double[] {(r[i] + r[i + 1]) / 2, 0, (z[k] + z[k + 1]) / 2};
            }
        }
        return p;
    }
}
