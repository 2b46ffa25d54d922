package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/** Facts of each field that follow from its physics, not from the code that computes it. */
class FieldFactsTest {

    private static final Species P = Species.PROTON;
    /** Pure floating-point arithmetic on a few terms: a handful of ulps. */
    private static final double ROUNDING = 1e-13;

    private static FieldSample sample(Field f, double x, double y, double z) {
        FieldSample s = new FieldSample();
        f.evaluate(0, x, y, z, s);
        return s;
    }

    /**
     * A dipole at L-shell L: |B| = B_s/L³ on the equator and 2 B_s/L³ over the pole at the same
     * distance, and B points along +z at the equator for a moment along −z (Jackson, Classical
     * Electrodynamics, 3rd ed., eq. 5.56; Schulz &amp; Lanzerotti 1974, ch. 1).
     */
    @Test
    void dipoleEquatorAndPole() {
        double lshell = 4;
        Field f = Fields.create("dipole", Map.of("lshell", lshell), P);
        double r = lshell * 6.4e6;
        FieldSample eq = sample(f, 0, r, 0);
        FieldSample pole = sample(f, 0, 0, -r);
        double bEq = 3.0e-5 / (lshell * lshell * lshell);
        assertEquals(bEq, eq.bMag(), ROUNDING * bEq);
        assertEquals(bEq, eq.bz, ROUNDING * bEq);
        assertEquals(2 * bEq, pole.bMag(), ROUNDING * bEq);
        // B ∝ r⁻³ makes |B|/|∇|B|| = r/3 on the equator, the declared L
        double[] g = eq.gradBMag(new double[3]);
        assertEquals(f.length(), eq.bMag() / Differences.norm(g[0], g[1], g[2]), 1e-12 * f.length());
        assertEquals(new Vec3(r, 0, 0), f.defaultStart());
    }

    /** On the axis of the mirror B(±Lm)/B(0) = Rm, and B(0) = B0 (definition of the mirror ratio). */
    @Test
    void mirrorRatioOnAxis() {
        Field f = Fields.create("mirror", Map.of("Rm", 5.5, "Lm", 2.0, "B0", 0.3), P);
        double b0 = sample(f, 0, 0, 0).bMag();
        assertEquals(0.3, b0, ROUNDING);
        assertEquals(5.5, sample(f, 0, 0, 2.0).bMag() / b0, ROUNDING * 5.5);
        assertEquals(5.5, sample(f, 0, 0, -2.0).bMag() / b0, ROUNDING * 5.5);
        assertTrue(f.inDomain(0, 0, 1.999) && !f.inDomain(0, 0, 2.001));
    }

    /**
     * The field-line curvature radius at the centre of the current sheet, from the Jacobian
     * through {@link FieldSample#curvature}, equals δ Bn/B0: there the line is the parabola
     * x = (B0/(2 δ Bn)) z² (Büchner &amp; Zelenyi, J. Geophys. Res. 94, 1989, who define κ with it).
     */
    @Test
    void currentSheetCurvatureRadius() {
        double delta = 6.4e6;
        Field f = Fields.create("current-sheet", Map.of(), P);
        double[] k = sample(f, 3 * delta, -delta, 0).curvature(new double[3]);
        double rc = delta * 2e-9 / 20e-9;
        assertEquals(rc, 1 / Differences.norm(k[0], k[1], k[2]), 1e-12 * rc);
        assertEquals(rc, f.length(), 1e-12 * rc);
        assertTrue(k[0] > 0, "curvature points along +x (towards the side Bn points the lines to)");
    }

    /** Shear: |B| = B0 everywhere and the field lines are straight (force-free; common practice). */
    @Test
    void shearHasConstantStrengthAndNoCurvature() {
        Field f = Fields.create("shear", Map.of("B0", 2.5, "Ls", 0.7), P);
        Random r = new Random(3);
        double[] k = new double[3];
        for (int i = 0; i < 50; i++) {
            FieldSample s = sample(f, 20 * r.nextDouble() - 10, r.nextDouble(), r.nextDouble());
            assertEquals(2.5, s.bMag(), ROUNDING * 2.5);
            s.curvature(k);
            assertEquals(0.0, Differences.maxAbs(k), 1e-14 / 0.7);
            double[] g = s.gradBMag(new double[3]);
            assertEquals(0.0, Differences.maxAbs(g), 1e-14 * 2.5 / 0.7);
        }
    }

    /**
     * Tokamak: the local safety factor r B_φ/(R B_θ) equals q(r) R0/R with
     * q(r) = q0 + (qa − q0) r²/a² (Wesson, Tokamaks, 4th ed., 2011, §3.4, from memory: q = r B_φ/(R0 B_θ)
     * in the cylindrical limit; with B_θ = ψ'/R and ψ' = B0 r/q the ratio carries R0/R).
     */
    @Test
    void tokamakLocalSafetyFactor() {
        double r0 = 1.5, a = 0.5, q0 = 1.1, qa = 3.5;
        Field f = Fields.create("tokamak", Map.of(), P);
        Random rnd = new Random(5);
        for (int i = 0; i < 50; i++) {
            double rm = a * (0.01 + 0.98 * rnd.nextDouble());
            double th = 2 * Math.PI * rnd.nextDouble();
            double phi = 2 * Math.PI * rnd.nextDouble();
            double big = r0 + rm * Math.cos(th);
            double x = big * Math.cos(phi), y = big * Math.sin(phi), z = rm * Math.sin(th);
            FieldSample s = sample(f, x, y, z);
            double bR = (s.bx * x + s.by * y) / big;
            double bPhi = (-s.bx * y + s.by * x) / big;
            double bTheta = Math.hypot(bR, s.bz);
            double q = q0 + (qa - q0) * rm * rm / (a * a);
            assertEquals(q * r0 / big, rm * bPhi / (big * bTheta), 1e-12 * q);
            assertEquals(2.0 * r0 / big, bPhi, 1e-12 * 2.0);   // vacuum toroidal part B0 R0/R
            // poloidal field is tangent to the circle r = const: B_pol · (R − R0, Z) = 0
            assertEquals(0.0, bR * (big - r0) + s.bz * z, 1e-12 * bTheta * rm);
        }
    }

    /** Toroidal field: |B| R = B0 R0 (Ampère's law around the z axis; common practice). */
    @Test
    void toroidalStrengthFallsAsOneOverR() {
        Field f = Fields.create("toroidal", Map.of("B0", 3.0, "R0", 2.0), P);
        for (double rr : new double[] {0.01, 0.5, 2.0, 7.0}) {
            assertEquals(6.0, sample(f, rr / Math.sqrt(2), rr / Math.sqrt(2), 1.3).bMag() * rr, 1e-12 * 6.0);
        }
    }

    /** Gradient: |B|/|∇B| at x = 0 is the declared L = Lg (definition). */
    @Test
    void gradientLengthIsLg() {
        Field f = Fields.create("gradient", Map.of("Lg", 0.25), P);
        FieldSample s = sample(f, 0, 0.3, -0.2);
        double[] g = s.gradBMag(new double[3]);
        assertEquals(0.25, s.bMag() / g[0], 1e-14);
        assertEquals(0.25, f.length(), 0);
        assertTrue(f.inDomain(-0.2499, 0, 0) && !f.inDomain(-0.2501, 0, 0));
    }

    static Stream<FieldCases.Case> cases() {
        return FieldCases.all();
    }

    /** Every field starts inside its domain, and the domain margin changes sign at the edge. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void defaultStartIsInsideTheDomain(FieldCases.Case c) {
        Vec3 s = c.field().defaultStart();
        assertTrue(c.field().domainMargin(s.x(), s.y(), s.z()) > 0, c + " default start outside its domain");
        for (double[] p : c.points()) {
            assertTrue(c.field().inDomain(p[1], p[2], p[3]), c + " test point outside the domain");
        }
    }

    /** The time scale of ramp is τ = tau_periods · 2π m/(|q| B0); of wave 1/ω with ω = ratio·|q|B0/m. */
    @Test
    void timeScalesFollowTheSpecies() {
        Species e = Species.ELECTRON;
        double tc = 2 * Math.PI * e.mass() / (Math.abs(e.charge()) * 2.0);
        Field ramp = Fields.create("ramp", Map.of("B0", 2.0, "tau_periods", 50.0), e);
        assertEquals(50 * tc, ramp.timeScale(), 1e-12 * 50 * tc);
        Field wave = Fields.create("wave", Map.of("B0", 2.0, "omega_ratio", 0.1), e);
        assertEquals(1 / (0.1 * 2 * Math.PI / tc), wave.timeScale(), 1e-12 * wave.timeScale());
        assertTrue(!ramp.isStatic() && !wave.isStatic());
    }
}
