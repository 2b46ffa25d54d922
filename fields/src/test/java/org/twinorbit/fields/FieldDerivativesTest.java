package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.twinorbit.fields.Differences.STEP_FRACTION;

import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.twinorbit.shared.FieldSample;

/**
 * The hand-derived derivatives of every field against fourth-order central differences of the
 * field itself (see {@link Differences}), and Maxwell's equations (common practice).
 *
 * <p>Errors are divided by |B|/ℓ + max|∂B_i/∂x_j| with ℓ the local length scale: single
 * components of the Jacobian may vanish, so a component-wise relative error means nothing, while
 * |B|/ℓ is the size every derivative has where the field varies on the scale ℓ, and it is also
 * the scale of the finite-difference round-off error (ε|B|/h). The tolerance 1e-9 leaves a
 * factor ~1000 over the expected difference error (~1e-12) and would still catch any wrong term,
 * which is of relative size 1.
 */
class FieldDerivativesTest {

    private static final double TOL = 1e-9;

    static Stream<FieldCases.Case> cases() {
        return FieldCases.all();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void jacobianMatchesFiniteDifferences(FieldCases.Case c) {
        FieldSample s = new FieldSample();
        Differences.VectorFunction b = Differences.magnetic(c.field());
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            c.field().evaluate(p[0], p[1], p[2], p[3], s);
            double[] fd = Differences.jacobian(b, p, STEP_FRACTION * ell);
            double norm = s.bMag() / ell + Differences.maxAbs(s.dB);
            double err = Differences.maxAbsDiff(fd, s.dB) / norm;
            assertTrue(err < TOL, c + " at " + java.util.Arrays.toString(p) + ": Jacobian error " + err);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void timeDerivativeMatchesFiniteDifferences(FieldCases.Case c) {
        FieldSample s = new FieldSample();
        Differences.VectorFunction b = Differences.magnetic(c.field());
        // a static field has no time scale; any step then shows that B does not change
        double scale = c.field().isStatic() ? 1.0 : c.field().timeScale();
        for (double[] p : c.points()) {
            c.field().evaluate(p[0], p[1], p[2], p[3], s);
            double[] fd = Differences.timeDerivative(b, p, STEP_FRACTION * scale);
            double[] an = {s.dBdtX, s.dBdtY, s.dBdtZ};
            double norm = s.bMag() / scale + Differences.maxAbs(an);
            double err = Differences.maxAbsDiff(fd, an) / norm;
            assertTrue(err < TOL, c + " at t = " + p[0] + ": dB/dt error " + err);
            if (c.field().isStatic()) {
                assertEquals(0.0, Differences.maxAbs(an), c + " is static but has dB/dt");
            }
        }
    }

    /** ∇·B = 0 (Maxwell), from the analytic Jacobian and from differences alone. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void divergenceFree(FieldCases.Case c) {
        FieldSample s = new FieldSample();
        Differences.VectorFunction b = Differences.magnetic(c.field());
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            c.field().evaluate(p[0], p[1], p[2], p[3], s);
            double norm = s.bMag() / ell + Differences.maxAbs(s.dB);
            assertTrue(Math.abs(s.divB()) / norm < 1e-12, c + ": analytic div B " + s.divB());
            double[] fd = Differences.jacobian(b, p, STEP_FRACTION * ell);
            double div = fd[0] + fd[4] + fd[8];
            assertTrue(Math.abs(div) / norm < TOL, c + ": finite-difference div B " + div);
        }
    }

    /** ∇×B = 0 in the vacuum fields (Ampère's law without currents; common practice). */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void vacuumFieldsAreCurlFree(FieldCases.Case c) {
        if (!Set.of("uniform", "toroidal", "dipole").contains(c.name())) {
            return;
        }
        FieldSample s = new FieldSample();
        Differences.VectorFunction b = Differences.magnetic(c.field());
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            c.field().evaluate(p[0], p[1], p[2], p[3], s);
            double[] curl = Differences.curl(Differences.jacobian(b, p, STEP_FRACTION * ell));
            double norm = s.bMag() / ell;
            assertTrue(Differences.maxAbs(curl) / norm < TOL, c + ": curl B " + Differences.maxAbs(curl));
            assertTrue(Differences.maxAbs(s.curlB(new double[3])) / norm < 1e-12, c + ": analytic curl B");
        }
    }

    /** Faraday's law ∇×E = −∂B/∂t (Maxwell; common practice), for every field. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void faradayLaw(FieldCases.Case c) {
        FieldSample s = new FieldSample();
        Differences.VectorFunction e = Differences.electric(c.field());
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            c.field().evaluate(p[0], p[1], p[2], p[3], s);
            double[] curlE = Differences.curl(Differences.jacobian(e, p, STEP_FRACTION * ell));
            double[] minusDbdt = {-s.dBdtX, -s.dBdtY, -s.dBdtZ};
            double eMag = Differences.norm(s.ex, s.ey, s.ez);
            double norm = eMag / ell + Differences.maxAbs(minusDbdt);
            if (norm == 0) {
                continue;   // no E and no dB/dt: nothing to compare
            }
            double err = Differences.maxAbsDiff(curlE, minusDbdt) / norm;
            assertTrue(err < TOL, c + ": curl E + dB/dt = " + err);
        }
    }

    /** ∇×A = B for every vector potential an invariant uses (definition of A). */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void vectorPotentialCurlIsB(FieldCases.Case c) {
        double[] a = new double[3];
        c.field().vectorPotential(0, 0.1, 0.2, 0.3, a);
        if (Double.isNaN(a[0])) {
            return;
        }
        FieldSample s = new FieldSample();
        Differences.VectorFunction af = Differences.vectorPotential(c.field());
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            c.field().evaluate(p[0], p[1], p[2], p[3], s);
            c.field().vectorPotential(p[0], p[1], p[2], p[3], a);
            double[] curl = Differences.curl(Differences.jacobian(af, p, STEP_FRACTION * ell));
            // round-off of differencing A is ε|A|/h, hence |A|/ℓ in the scale
            double norm = s.bMag() + Differences.maxAbs(a) / ell;
            double err = Differences.maxAbsDiff(curl, new double[] {s.bx, s.by, s.bz}) / norm;
            assertTrue(err < TOL, c + " at " + java.util.Arrays.toString(p) + ": curl A - B = " + err);
        }
    }

    /** E = −∇Φ wherever a field declares a potential (definition of Φ). */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void electricFieldIsMinusGradientOfPotential(FieldCases.Case c) {
        if (!c.field().hasPotential()) {
            return;
        }
        FieldSample s = new FieldSample();
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            c.field().evaluate(p[0], p[1], p[2], p[3], s);
            double[] grad = Differences.gradient(c.field()::potential, p, STEP_FRACTION * ell);
            double[] minusE = {-s.ex, -s.ey, -s.ez};
            double phi = Math.abs(c.field().potential(p[0], p[1], p[2], p[3]));
            double norm = Differences.maxAbs(minusE) + phi / ell;
            if (norm == 0) {
                continue;   // no E anywhere here (Φ = 0)
            }
            assertTrue(Differences.maxAbsDiff(grad, minusE) / norm < TOL, c + ": grad Phi + E");
        }
    }
}
