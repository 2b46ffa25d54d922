package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;

/**
 * The G-EQDSK field against the analytic Solov'ev equilibrium it was written from: the file
 * round trip, the spline's convergence order, its own Jacobian, the COCOS signs and the wall.
 */
class GeqdskFieldTest {

    @TempDir
    static Path tmp;

    private static final SolovevField SOLOVEV = (SolovevField) Fields.create("solovev", Map.of(), Species.DEUTERON);
    /** Interior points of the plasma, at least 5 cm inside the last closed surface. */
    private static final List<double[]> INTERIOR = new ArrayList<>();

    @BeforeAll
    static void points() {
        Random r = new Random(21);
        while (INTERIOR.size() < 40) {
            double rr = 1.2 + r.nextDouble();
            double z = -0.85 + 1.7 * r.nextDouble();
            if (SOLOVEV.domainMargin(rr, 0, z) > 0.05) {
                double phi = 2 * Math.PI * r.nextDouble();
                INTERIOR.add(new double[] {rr * Math.cos(phi), rr * Math.sin(phi), z});
            }
        }
    }

    private static GeqdskField written(int n, int cocos) {
        Path file = tmp.resolve("solovev-" + n + "-" + cocos + ".geqdsk");
        if (!Files.exists(file)) {
            // the same box as the geqdsk command's for the default shape: R 1.025-2.375 m, |Z| <= 1.025 m
            GeqdskFile.write(SOLOVEV, "test", 1.025, 2.375, -1.025, 1.025, n, n, 0.05, 1.7, Cocos.of(cocos), file);
        }
        return GeqdskFile.read(file, cocos);
    }

    /** max over the interior points of |B_file − B| / |B| and of the Jacobian's error over max |∂B|. */
    private static double[] errors(Field f) {
        FieldSample a = new FieldSample();
        FieldSample g = new FieldSample();
        double eb = 0;
        double ej = 0;
        for (double[] p : INTERIOR) {
            SOLOVEV.evaluate(0, p[0], p[1], p[2], a);
            f.evaluate(0, p[0], p[1], p[2], g);
            double db = Math.sqrt(Math.pow(a.bx - g.bx, 2) + Math.pow(a.by - g.by, 2) + Math.pow(a.bz - g.bz, 2));
            eb = Math.max(eb, db / a.bMag());
            double jmax = Differences.maxAbs(a.dB);
            ej = Math.max(ej, Differences.maxAbsDiff(a.dB, g.dB) / jmax);
        }
        return new double[] {eb, ej};
    }

    private static GeqdskData sampled(int n) {
        return GeqdskFile.sample(SOLOVEV, "test", 1.025, 2.375, -1.025, 1.025, n, n, 0.05, 1.7, Cocos.of(1));
    }

    /** The least-squares slope of log(error) against log(h), h ∝ 1/(n − 1). */
    private static double order(int[] ns, double[] e) {
        double sx = 0, sy = 0, sxx = 0, sxy = 0;
        for (int i = 0; i < ns.length; i++) {
            double x = Math.log(1.0 / (ns[i] - 1));
            double y = Math.log(e[i]);
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
        }
        int n = ns.length;
        return (n * sxy - sx * sy) / (n * sxx - sx * sx);
    }

    /**
     * The spline's convergence with the grid: at interior points the error of B falls as h³ and
     * that of its Jacobian as h², the orders of a C² bicubic spline's first and second
     * derivatives for a smooth ψ (de Boor, A Practical Guide to Splines, 1978, Ch. XVII; from
     * memory). Measured on the sampled contents (every digit kept) from 65 to 257 nodes, where the
     * natural end conditions' pollution from the grid's edge has died out; each fitted order must
     * lie within 0.35 of the theoretical one.
     */
    @Test
    void splineConvergesAtItsOrder() {
        int[] ns = {65, 97, 129, 193, 257};
        double[] eb = new double[ns.length];
        double[] ej = new double[ns.length];
        for (int i = 0; i < ns.length; i++) {
            double[] e = errors(GeqdskFile.field(sampled(ns[i]), 1));
            eb[i] = e[0];
            ej[i] = e[1];
            System.out.printf(java.util.Locale.ROOT, "geqdsk spline %d x %d: B error %.3e, Jacobian error %.3e%n",
                    ns[i], ns[i], eb[i], ej[i]);
        }
        double orderB = order(ns, eb);
        double orderJ = order(ns, ej);
        System.out.printf(java.util.Locale.ROOT, "fitted orders: B %.2f, Jacobian %.2f%n", orderB, orderJ);
        assertEquals(3, orderB, 0.35, "order of B");
        assertEquals(2, orderJ, 0.35, "order of the Jacobian");
    }

    /**
     * Through the file: the format's ten significant digits (5e16.9) set a floor of ~1e-8 in B and
     * ~1e-5 in the Jacobian (δψ/h and δψ/h², derived), which the committed-demo resolution of 129
     * nodes reaches; the file's field agrees with the in-memory one to that floor.
     */
    @Test
    void theFileRoundTripLosesOnlyTheFormatsDigits() {
        double[] mem = errors(GeqdskFile.field(sampled(129), 1));
        double[] file = errors(written(129, 1));
        System.out.printf(java.util.Locale.ROOT, "geqdsk file 129 x 129: B error %.3e (in memory %.3e), Jacobian %.3e (%.3e)%n",
                file[0], mem[0], file[1], mem[1]);
        assertTrue(file[0] < 2e-8 && file[1] < 1e-5, "B " + file[0] + ", Jacobian " + file[1]);
    }

    /**
     * The committed demo (examples/geqdsk-demo, written by {@code twinorbit geqdsk} with the
     * solovev defaults on 129 × 129 nodes) is the analytic field to the spline's error at 129
     * nodes and the format's digits.
     */
    @Test
    void theCommittedDemoIsTheAnalyticField() {
        Path demo = Path.of("..", "examples", "geqdsk-demo", "shaped-deuteron.geqdsk");
        double[] e = errors(GeqdskFile.read(demo, Cocos.DEFAULT));
        assertTrue(e[0] < 2e-8 && e[1] < 1e-5, "B " + e[0] + ", Jacobian " + e[1]);
    }

    /**
     * The Jacobian is the interpolant's own derivative: inside one spline cell (where the
     * interpolant is a polynomial), fourth-order differences of B agree with it to 1e-9 of its
     * size (Abramowitz &amp; Stegun 1964, 25.3.6); ∇·B = 0 exactly for B = ∇ψ × ∇φ + F∇φ (Maxwell).
     */
    @Test
    void jacobianIsTheInterpolantsOwn() {
        GeqdskField f = written(65, 1);
        GeqdskData d = f.data();
        double hr = d.rdim() / (d.nw() - 1);
        double hz = d.zdim() / (d.nh() - 1);
        Differences.VectorFunction b = Differences.magnetic(f);
        FieldSample s = new FieldSample();
        int checked = 0;
        for (int i = 5; i < d.nw() - 5; i += 7) {
            for (int j = 5; j < d.nh() - 5; j += 7) {
                double r = d.r(i) + 0.5 * hr;
                double z = d.z(j) + 0.5 * hz;
                if (f.domainMargin(r, 0, z) <= 0) {
                    continue;
                }
                // on the plane y = 0, where R = x: the stencil ±2h in x and z stays inside the cell
                double[] p = {0, r, 0, z};
                f.evaluate(0, r, 0, z, s);
                double[] fd = Differences.jacobian(b, p, 1e-3 * Math.min(hr, hz));
                double norm = s.bMag() / Math.min(hr, hz) * 1e-3 + Differences.maxAbs(s.dB);
                // the y column is the rotation about the axis: exact in the differences too
                assertTrue(Differences.maxAbsDiff(fd, s.dB) / norm < 1e-8,
                        "Jacobian at " + r + ", " + z + ": " + Differences.maxAbsDiff(fd, s.dB) / norm);
                assertTrue(Math.abs(s.divB()) / Differences.maxAbs(s.dB) < 1e-12, "div B " + s.divB());
                checked++;
            }
        }
        assertTrue(checked > 10);
    }

    /**
     * The file keeps the equilibrium's own numbers: the axis, ψ on it and on the boundary, F, the
     * plasma current from Ampère's law, and q on the axis (= q0 of the analytic field).
     */
    @Test
    void fileHoldsTheEquilibriumsScalars() {
        GeqdskField f = written(65, 1);
        GeqdskData d = f.data();
        assertEquals(SOLOVEV.axis()[0], d.rmaxis(), 1e-9);
        assertEquals(-SOLOVEV.psiAxis(), d.simag(), 1e-9, "COCOS 1: psi_file = -psi (sigma_Bp = +1, sigma_RphiZ = +1)");
        assertEquals(2.5, d.bcentr(), 1e-12);
        assertEquals(1.7 * 2.5, d.fpol()[d.nw() - 1], 1e-12, "F = R0 B0 on the boundary");
        assertEquals(2.0, d.qpsi()[0], 1e-4, "q on the axis");
        assertTrue(d.current() > 0, "current along +phi, B0 along +phi: COCOS 1 positive");
        // Ampère: μ0 Ip = ∮ B_p · dl around the boundary (here by the sum over the file's polygon)
        double circulation = 0;
        FieldSample s = new FieldSample();
        double[] rb = d.rbbbs();
        double[] zb = d.zbbbs();
        for (int k = 0; k + 1 < rb.length; k++) {
            double rm = 0.5 * (rb[k] + rb[k + 1]);
            double zm = 0.5 * (zb[k] + zb[k + 1]);
            SOLOVEV.evaluate(0, rm, 0, zm, s);
            circulation += s.bx * (rb[k + 1] - rb[k]) + s.bz * (zb[k + 1] - zb[k]);
        }
        // counter-clockwise in (R, Z) is clockwise about +φ: μ0 I_φ = −∮_ccw
        double ampere = Math.abs(circulation) / SolovevField.MU0;
        assertEquals(ampere, d.current(), 1e-3 * d.current());
    }

    /**
     * COCOS (Sauter &amp; Medvedev 2013): the same equilibrium written in conventions 1, 2, 3 and 11
     * and read back in each gives the same B; read in a convention whose σ_Bp contradicts the
     * file's signs, it is refused with the fix named.
     */
    @Test
    void everyConventionReadsBackTheSameField() {
        GeqdskField ref = written(65, 1);
        FieldSample a = new FieldSample();
        FieldSample b = new FieldSample();
        for (int c : new int[] {2, 3, 11, 17}) {
            GeqdskField other = written(65, c);
            for (double[] p : INTERIOR) {
                ref.evaluate(0, p[0], p[1], p[2], a);
                other.evaluate(0, p[0], p[1], p[2], b);
                // equal up to the rounding of the file's ten digits (ψ scaled by 2π rounds differently)
                double db = Math.sqrt(Math.pow(a.bx - b.bx, 2) + Math.pow(a.by - b.by, 2) + Math.pow(a.bz - b.bz, 2));
                assertTrue(db / a.bMag() < 1e-8, "COCOS " + c + ": B differs by " + db / a.bMag());
                assertTrue(Differences.maxAbsDiff(a.dB, b.dB) / Differences.maxAbs(a.dB) < 1e-5, "COCOS " + c);
            }
        }
        Path file = tmp.resolve("solovev-65-1.geqdsk");
        FieldParameterException x = assertThrows(FieldParameterException.class, () -> GeqdskFile.read(file, 3));
        assertTrue(x.getMessage().contains("contradicts COCOS 3") && x.getMessage().contains("line 2"), x.getMessage());
    }

    /**
     * p_φ = m R u_φ + q ψ is exact in the file's field too (the spline field is exactly
     * axisymmetric; Noether): its rate of change along the Lorentz flow vanishes to round-off.
     */
    @Test
    void toroidalMomentumIsExactInTheFileField() {
        GeqdskField f = written(65, 1);
        Invariant pphi = f.invariants().stream().filter(i -> i.name().equals("p_phi")).findFirst().orElseThrow();
        Species d = Species.DEUTERON;
        FieldSample s = new FieldSample();
        double h = 1e-10;
        for (double[] p : INTERIOR.subList(0, 10)) {
            f.evaluate(0, p[0], p[1], p[2], s);
            double[] u = {3e5, -2e5, 4e5};
            double[] a = {d.chargeToMass() * (u[1] * s.bz - u[2] * s.by), d.chargeToMass() * (u[2] * s.bx - u[0] * s.bz),
                d.chargeToMass() * (u[0] * s.by - u[1] * s.bx)};
            double rate = 0;
            double[] w = {1.0 / 12, -8.0 / 12, 8.0 / 12, -1.0 / 12};
            double[] off = {-2, -1, 1, 2};
            for (int k = 0; k < 4; k++) {
                double t = off[k] * h;
                double[] x = {p[0] + t * u[0], p[1] + t * u[1], p[2] + t * u[2]};
                double[] uu = {u[0] + t * a[0], u[1] + t * a[1], u[2] + t * a[2]};
                rate += w[k] * pphi.value(d, 0, x, uu) / h;
            }
            double size = pphi.scale(d, 0, p, u) * (5.4e5 / 0.5 + d.chargeToMass() * s.bMag());
            assertTrue(Math.abs(rate) / size < 1e-8, "p_phi rate " + Math.abs(rate) / size);
        }
    }

    /** The limiter is the wall: the margin is the signed distance to it, zero on it, positive inside. */
    @Test
    void theLimiterIsTheWall() {
        GeqdskField f = written(65, 1);
        GeqdskData d = f.data();
        for (int k = 0; k < d.rlim().length; k += 9) {
            assertEquals(0, f.domainMargin(d.rlim()[k], 0, d.zlim()[k]), 1e-12);
        }
        double[] ax = f.axis();
        assertTrue(f.domainMargin(ax[0], 0, ax[1]) > 0.4);
        // 1 cm outside the outermost limiter point, straight out along R: 1 cm outside the wall
        int out = 0;
        for (int k = 0; k < d.rlim().length; k++) {
            out = d.rlim()[k] > d.rlim()[out] ? k : out;
        }
        assertEquals(-0.01, f.domainMargin(d.rlim()[out] + 0.01, 0, d.zlim()[out]), 1e-3);
        assertTrue(f.domainMeaning().contains("limiter"));
    }
}
