package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * Cylindrical and axisymmetric grids against the analytic fields they sample. Cubic Hermite
 * interpolation fed with second-order nodal differences errs by O(h³) in the value and O(h²) in
 * its first derivatives (Lekien &amp; Marsden, Int. J. Numer. Meth. Eng. 63, 2005, for the
 * interpolant; the difference error is common practice), so the orders fitted over h, h/2, h/4
 * must come out near 3 and 2. The Cartesian Jacobian, which goes through the rotation of the
 * cylindrical basis and the chain rule, must equal finite differences of the interpolated field
 * itself (the interpolant is C1, so central differences converge to its derivative).
 */
class CurvilinearGridTest {

    @TempDir
    Path tmp;

    /** Slope of log(error) against log(h) by least squares over the levels (h halving each time). */
    static double fittedOrder(double[] errors) {
        int n = errors.length;
        double sx = 0, sy = 0, sxx = 0, sxy = 0;
        for (int i = 0; i < n; i++) {
            double x = -i * Math.log(2);
            double y = Math.log(errors[i]);
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
        }
        return (n * sxy - sx * sy) / (n * sxx - sx * sx);
    }

    /**
     * Largest errors of B (relative to |B|) and of its Jacobian (relative to |B|/L) over random
     * points in R ∈ [r0, r1], Z ∈ [z0, z1], all φ.
     */
    static double[] errors(Field exact, Field g, double r0, double r1, double z0, double z1) {
        Random rnd = new Random(11);
        FieldSample a = new FieldSample();
        FieldSample b = new FieldSample();
        double eb = 0, ej = 0;
        for (int n = 0; n < 400; n++) {
            double r = r0 + (r1 - r0) * rnd.nextDouble();
            double p = 2 * Math.PI * rnd.nextDouble();
            double z = z0 + (z1 - z0) * rnd.nextDouble();
            exact.evaluate(0, r * Math.cos(p), r * Math.sin(p), z, a);
            g.evaluate(0, r * Math.cos(p), r * Math.sin(p), z, b);
            eb = Math.max(eb, Math.hypot(Math.hypot(a.bx - b.bx, a.by - b.by), a.bz - b.bz) / a.bMag());
            for (int i = 0; i < 9; i++) {
                ej = Math.max(ej, Math.abs(a.dB[i] - b.dB[i]) * exact.length() / a.bMag());
            }
        }
        return new double[] {eb, ej};
    }

    private double[][] axisymmetricLevels(Field f, double r0, double r1, double z0, double z1, int cells) {
        double[][] e = new double[3][];
        for (int l = 0; l < 3; l++) {
            int n = (cells << l) + 1;
            Path file = tmp.resolve(f.name() + "-axi-" + n + ".h5");
            GridFile.writeAxisymmetric(f, r0, r1, z0, z1, n, n, file);
            GriddedField g = GridFile.read(file);
            assertEquals(GridGeometry.AXISYMMETRIC, g.geometry());
            double mr = 0.1 * (r1 - r0), mz = 0.1 * (z1 - z0);
            e[l] = errors(f, g, r0 + mr, r1 - mr, z0 + mz, z1 - mz);
        }
        return e;
    }

    private static double[] column(double[][] e, int c) {
        return new double[] {e[0][c], e[1][c], e[2][c]};
    }

    @Test
    void axisymmetricGridsConvergeAtTheInterpolantsOrder() {
        // toroidal: B_phi = B0 R0/R only; tokamak: circular flux surfaces with a q profile (docs/design.md)
        Field toroidal = Fields.create("toroidal", Species.PROTON);
        double[][] t = axisymmetricLevels(toroidal, 0.6, 1.4, -0.4, 0.4, 8);
        Field tokamak = Fields.create("tokamak", Species.PROTON);
        double[][] k = axisymmetricLevels(tokamak, 1.0, 2.0, -0.5, 0.5, 8);
        double tb = fittedOrder(column(t, 0)), tj = fittedOrder(column(t, 1));
        double kb = fittedOrder(column(k, 0)), kj = fittedOrder(column(k, 1));
        System.out.printf("axisymmetric fitted orders: toroidal B %.2f J %.2f; tokamak B %.2f J %.2f (finest %.1e, %.1e)%n",
                tb, tj, kb, kj, k[2][0], k[2][1]);
        assertTrue(tb > 2.7 && tb < 4.3, "toroidal B order " + tb);
        assertTrue(tj > 1.7 && tj < 3.3, "toroidal Jacobian order " + tj);
        assertTrue(kb > 2.7 && kb < 4.3, "tokamak B order " + kb);
        assertTrue(kj > 1.7 && kj < 3.3, "tokamak Jacobian order " + kj);
        assertTrue(k[2][0] < 1e-4, "tokamak B error on the finest grid " + k[2][0]);
    }

    private double[][] cylindricalLevels(Field f, double r0, double r1, double z0, double z1, int cells, int phis) {
        double[][] e = new double[3][];
        for (int l = 0; l < 3; l++) {
            int n = (cells << l) + 1;
            Path file = tmp.resolve(f.name() + "-cyl-" + n + ".h5");
            GridFile.writeCylindrical(f, r0, r1, z0, z1, n, phis << l, n, file);
            GriddedField g = GridFile.read(file);
            assertEquals(GridGeometry.CYLINDRICAL, g.geometry());
            double mr = 0.1 * (r1 - r0), mz = 0.1 * (z1 - z0);
            e[l] = errors(f, g, r0 + mr, r1 - mr, z0 + mz, z1 - mz);
        }
        return e;
    }

    @Test
    void cylindricalGridsConvergeAtTheInterpolantsOrder() {
        // dipole: B_R, B_Z vary in R and Z (textbook dipole); gradient: B_Z = B0 (1 + R cos(phi)/Lg) varies in phi
        Field dipole = Fields.create("dipole", Species.PROTON);
        double rp = 6.4e6;
        double[][] d = cylindricalLevels(dipole, 3 * rp, 5 * rp, -rp, rp, 6, 8);
        Field gradient = Fields.create("gradient", Map.of("Lg", 2.0), Species.PROTON);
        double[][] g = cylindricalLevels(gradient, 0.2, 1.0, -0.3, 0.3, 4, 8);
        double db = fittedOrder(column(d, 0)), dj = fittedOrder(column(d, 1));
        double gb = fittedOrder(column(g, 0)), gj = fittedOrder(column(g, 1));
        System.out.printf("cylindrical fitted orders: dipole B %.2f J %.2f; gradient B %.2f J %.2f (finest %.1e, %.1e)%n",
                db, dj, gb, gj, d[2][0], d[2][1]);
        assertTrue(db > 2.7 && db < 4.3, "dipole B order " + db);
        assertTrue(dj > 1.7 && dj < 3.3, "dipole Jacobian order " + dj);
        assertTrue(gb > 2.7 && gb < 4.3, "gradient B order " + gb);
        assertTrue(gj > 1.7 && gj < 3.3, "gradient Jacobian order " + gj);
    }

    /** Central differences (step 1e-6 L) of the interpolated B against its reported Jacobian. */
    private static void jacobianIsTheDerivative(GriddedField g, double r0, double r1, double z0, double z1) {
        Random rnd = new Random(5);
        FieldSample s = new FieldSample();
        FieldSample p = new FieldSample();
        FieldSample m = new FieldSample();
        double step = 1e-6 * g.length();
        for (int n = 0; n < 100; n++) {
            double r = r0 + (r1 - r0) * rnd.nextDouble();
            double ph = 2 * Math.PI * rnd.nextDouble();
            double[] x = {r * Math.cos(ph), r * Math.sin(ph), z0 + (z1 - z0) * rnd.nextDouble()};
            g.evaluate(0, x[0], x[1], x[2], s);
            for (int j = 0; j < 3; j++) {
                double[] a = x.clone();
                double[] b = x.clone();
                a[j] += step;
                b[j] -= step;
                g.evaluate(0, a[0], a[1], a[2], p);
                g.evaluate(0, b[0], b[1], b[2], m);
                double[] fd = {(p.bx - m.bx) / (2 * step), (p.by - m.by) / (2 * step), (p.bz - m.bz) / (2 * step)};
                for (int i = 0; i < 3; i++) {
                    assertEquals(fd[i], s.dB(i, j), 1e-6 * s.bMag() / g.length(),
                            "dB" + i + "/dx" + j + " at " + java.util.Arrays.toString(x));
                }
            }
        }
    }

    @Test
    void theCartesianJacobianIsTheInterpolantsOwnDerivative() {
        Field tokamak = Fields.create("tokamak", Species.PROTON);
        Path axi = tmp.resolve("axi.h5");
        GridFile.writeAxisymmetric(tokamak, 1.0, 2.0, -0.5, 0.5, 9, 9, axi);
        jacobianIsTheDerivative(GridFile.read(axi), 1.05, 1.95, -0.45, 0.45);
        Field dipole = Fields.create("dipole", Species.PROTON);
        Path cyl = tmp.resolve("cyl.h5");
        GridFile.writeCylindrical(dipole, 3 * 6.4e6, 5 * 6.4e6, -6.4e6, 6.4e6, 7, 6, 7, cyl);
        jacobianIsTheDerivative(GridFile.read(cyl), 3.2 * 6.4e6, 4.8 * 6.4e6, -6e6, 6e6);
        Field gradient = Fields.create("gradient", Map.of("Lg", 2.0), Species.PROTON);
        Path grad = tmp.resolve("grad.h5");
        GridFile.writeCylindrical(gradient, 0.2, 1.0, -0.3, 0.3, 5, 5, 5, grad);
        jacobianIsTheDerivative(GridFile.read(grad), 0.25, 0.95, -0.25, 0.25);
    }

    @Test
    void divergenceOfTheInterpolantShrinksWithTheGrid() {
        // the tokamak's B is divergence-free (Maxwell); its interpolant's divergence is interpolation error, O(h^2)
        Field tokamak = Fields.create("tokamak", Species.PROTON);
        double[] div = new double[3];
        for (int l = 0; l < 3; l++) {
            int n = (8 << l) + 1;
            Path file = tmp.resolve("div-" + n + ".h5");
            GridFile.writeAxisymmetric(tokamak, 1.0, 2.0, -0.5, 0.5, n, n, file);
            div[l] = GridFile.read(file).maxDivergence();
        }
        double order = fittedOrder(div);
        System.out.printf("tokamak axisymmetric max |div B| L/|B|: %.2e %.2e %.2e, order %.2f%n", div[0], div[1], div[2],
                order);
        assertTrue(order > 1.7, "div B order " + order);
        Field toroidal = Fields.create("toroidal", Species.PROTON);
        Path t = tmp.resolve("toroidal.h5");
        GridFile.writeAxisymmetric(toroidal, 0.6, 1.4, -0.4, 0.4, 9, 9, t);
        // B = B_phi(R) phi-hat alone: div B = (1/R) dB_phi/dphi = 0 for any interpolant of B_phi (derived)
        assertTrue(GridFile.read(t).maxDivergence() < 1e-12);
    }

    @Test
    void aFieldThatIsNotAxisymmetricIsRefusedOnAnAxisymmetricGrid() {
        Field gradient = Fields.create("gradient", Species.PROTON);
        FieldParameterException e = org.junit.jupiter.api.Assertions.assertThrows(FieldParameterException.class,
                () -> GridFile.writeAxisymmetric(gradient, 0.2, 0.8, -0.3, 0.3, 5, 5, tmp.resolve("no.h5")));
        assertTrue(e.getMessage().contains("not axisymmetric"), e.getMessage());
    }

    @Test
    void theAnnulusIsTheDomain() {
        Field tokamak = Fields.create("tokamak", Species.PROTON);
        Path file = tmp.resolve("d.h5");
        GridFile.writeAxisymmetric(tokamak, 1.0, 2.0, -0.5, 0.5, 6, 6, file);
        GriddedField g = GridFile.read(file);
        assertTrue(g.inDomain(0, 1.5, 0.2) && g.inDomain(-1.2, -1.2, 0));
        assertTrue(!g.inDomain(0.9, 0, 0) && !g.inDomain(0, 2.1, 0) && !g.inDomain(1.5, 0, 0.51));
        assertEquals(0.1, g.domainMargin(-1.9, 0, 0), 1e-12);
        assertEquals(tokamak.length(), g.length(), 0.0);
    }
}
