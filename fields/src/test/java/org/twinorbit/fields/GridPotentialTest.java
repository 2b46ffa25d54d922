package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * Φ on a grid. E must be exactly −∇ of the interpolated Φ (checked against central differences
 * of {@link Field#potential} of the grid field itself), which makes W = kinetic + qΦ an exact
 * invariant of the interpolated field (for a static field, dW/dt = q v·(E + ∇Φ) = 0; common
 * practice). Against the analytic Φ, cubic Hermite interpolation with second-order nodal
 * differences converges as h³ in Φ and h² in E (Lekien &amp; Marsden, Int. J. Numer. Meth. Eng. 63,
 * 2005; common practice for the differences).
 */
class GridPotentialTest {

    @TempDir
    Path tmp;

    /** The tokamak's B with Φ = Φ0 exp(−((R − R0)² + Z²)/w²) (axisymmetric) or Φ0 exp(−(x − R0)²/w²) (not). */
    private static final class WithPotential implements Field {
        final Field base = Fields.create("tokamak", Species.PROTON);
        final boolean axisymmetric;
        static final double PHI0 = 1e4, R0 = 1.5, W = 0.4;

        WithPotential(boolean axisymmetric) {
            this.axisymmetric = axisymmetric;
        }

        @Override public String name() { return "tokamak-with-phi"; }

        @Override
        public void evaluate(double t, double x, double y, double z, FieldSample out) {
            base.evaluate(t, x, y, z, out);
            double p = potential(t, x, y, z);
            if (axisymmetric) {
                double r = Math.hypot(x, y);
                double dr = -2 * (r - R0) / (W * W) * p;
                out.ex = -dr * x / r;
                out.ey = -dr * y / r;
                out.ez = 2 * z / (W * W) * p;
            } else {
                out.ex = 2 * (x - R0) / (W * W) * p;
                out.ey = 0;
                out.ez = 0;
            }
        }

        @Override
        public double potential(double t, double x, double y, double z) {
            double r = Math.hypot(x, y);
            double s = axisymmetric ? (r - R0) * (r - R0) + z * z : (x - R0) * (x - R0);
            return PHI0 * Math.exp(-s / (W * W));
        }

        @Override public boolean hasPotential() { return true; }
        @Override public boolean hasElectricField() { return true; }
        @Override public double length() { return base.length(); }
        @Override public String lengthMeaning() { return base.lengthMeaning(); }
        @Override public void vectorPotential(double t, double x, double y, double z, double[] out) {
            base.vectorPotential(t, x, y, z, out);
        }
        @Override public List<Invariant> invariants() { return List.of(Invariants.energy(this)); }
        @Override public Vec3 defaultStart() { return base.defaultStart(); }
    }

    private GriddedField axisymmetric(int n) {
        Path file = tmp.resolve("axi-" + n + ".h5");
        GridFile.writeAxisymmetric(new WithPotential(true), 1.0, 2.0, -0.5, 0.5, n, n, file);
        return GridFile.read(file);
    }

    private GriddedField cylindrical(int n) {
        Path file = tmp.resolve("cyl-" + n + ".h5");
        GridFile.writeCylindrical(new WithPotential(false), 1.0, 2.0, -0.5, 0.5, n, 4 * (n - 1), n, file);
        return GridFile.read(file);
    }

    /** Largest errors of Φ (relative to Φ0) and E (relative to Φ0/w) over random points of the annulus. */
    private static double[] errors(Field exact, Field g) {
        Random rnd = new Random(3);
        FieldSample a = new FieldSample();
        FieldSample b = new FieldSample();
        double ep = 0, ee = 0;
        for (int n = 0; n < 300; n++) {
            double r = 1.1 + 0.8 * rnd.nextDouble(), ph = 2 * Math.PI * rnd.nextDouble(), z = -0.4 + 0.8 * rnd.nextDouble();
            double x = r * Math.cos(ph), y = r * Math.sin(ph);
            exact.evaluate(0, x, y, z, a);
            g.evaluate(0, x, y, z, b);
            ep = Math.max(ep, Math.abs(exact.potential(0, x, y, z) - g.potential(0, x, y, z)) / WithPotential.PHI0);
            ee = Math.max(ee, Math.hypot(Math.hypot(a.ex - b.ex, a.ey - b.ey), a.ez - b.ez) * WithPotential.W
                    / WithPotential.PHI0);
        }
        return new double[] {ep, ee};
    }

    @Test
    void phiAndEConvergeAtTheInterpolantsOrder() {
        double[] pa = new double[3], ea = new double[3], pc = new double[3], ec = new double[3];
        for (int l = 0; l < 3; l++) {
            int n = (8 << l) + 1;
            double[] a = errors(new WithPotential(true), axisymmetric(n));
            double[] c = errors(new WithPotential(false), cylindrical(n));
            pa[l] = a[0];
            ea[l] = a[1];
            pc[l] = c[0];
            ec[l] = c[1];
        }
        double[] orders = {CurvilinearGridTest.fittedOrder(pa), CurvilinearGridTest.fittedOrder(ea),
            CurvilinearGridTest.fittedOrder(pc), CurvilinearGridTest.fittedOrder(ec)};
        System.out.printf("Phi on grids, fitted orders: axisymmetric Phi %.2f E %.2f; cylindrical Phi %.2f E %.2f%n",
                orders[0], orders[1], orders[2], orders[3]);
        assertTrue(orders[0] > 2.7 && orders[2] > 2.7, "Phi orders " + orders[0] + ", " + orders[2]);
        assertTrue(orders[1] > 1.7 && orders[3] > 1.7, "E orders " + orders[1] + ", " + orders[3]);
    }

    @Test
    void eIsMinusTheGradientOfTheInterpolatedPhi() {
        for (GriddedField g : new GriddedField[] {axisymmetric(9), cylindrical(9)}) {
            assertTrue(g.hasElectricField() && g.hasPotential());
            Random rnd = new Random(9);
            FieldSample s = new FieldSample();
            double step = 1e-6;
            for (int n = 0; n < 50; n++) {
                double r = 1.1 + 0.8 * rnd.nextDouble(), ph = 2 * Math.PI * rnd.nextDouble();
                double[] x = {r * Math.cos(ph), r * Math.sin(ph), -0.4 + 0.8 * rnd.nextDouble()};
                g.evaluate(0, x[0], x[1], x[2], s);
                double[] e = {s.ex, s.ey, s.ez};
                for (int j = 0; j < 3; j++) {
                    double[] p = x.clone();
                    double[] m = x.clone();
                    p[j] += step;
                    m[j] -= step;
                    double fd = -(g.potential(0, p[0], p[1], p[2]) - g.potential(0, m[0], m[1], m[2])) / (2 * step);
                    assertEquals(fd, e[j], 1e-6 * WithPotential.PHI0 / WithPotential.W, g.geometry() + " E" + j);
                }
            }
        }
    }

    @Test
    void aGridWithoutPhiHasNoE() {
        Path file = tmp.resolve("b.h5");
        GridFile.writeAxisymmetric(Fields.create("tokamak", Species.PROTON), 1.0, 2.0, -0.5, 0.5, 6, 6, file);
        GriddedField g = GridFile.read(file);
        FieldSample s = new FieldSample();
        g.evaluate(0, 1.5, 0.1, 0.1, s);
        assertTrue(!g.hasElectricField() && s.ex == 0 && s.ey == 0 && s.ez == 0 && g.potential(0, 1.5, 0, 0) == 0);
    }
}
