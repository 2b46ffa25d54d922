package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.twinorbit.fields.Differences.STEP_FRACTION;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.twinorbit.shared.FieldSample;

/**
 * The derived quantities of {@link FieldSample} — ∇|B|, ∇×b and κ = (b·∇)b, computed from B and
 * its Jacobian — against fourth-order differences of |B| and of b = B/|B| themselves (vector
 * calculus; common practice), in fields where each is non-zero: dipole (curved vacuum field),
 * tokamak (sheared, curved, with current), mirror and current-sheet.
 *
 * <p>Errors are divided by 1/ℓ for ∇×b and κ (b is a unit vector varying on the scale ℓ) and by
 * |B|/ℓ for ∇|B|; the tolerance has the reasoning of {@link FieldDerivativesTest}.
 */
class FieldSampleDerivedTest {

    private static final double TOL = 1e-9;

    static Stream<FieldCases.Case> cases() {
        return Stream.of("dipole", "tokamak", "mirror", "current-sheet").map(FieldCases::byName);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void derivedQuantitiesMatchDifferences(FieldCases.Case c) {
        Field f = c.field();
        FieldSample s = new FieldSample();
        FieldSample w = new FieldSample();
        Differences.VectorFunction unit = (t, x, y, z, out) -> {
            f.evaluate(t, x, y, z, w);
            w.unitB(out);
        };
        Differences.ScalarFunction strength = (t, x, y, z) -> {
            f.evaluate(t, x, y, z, w);
            return w.bMag();
        };
        double[] gradB = new double[3];
        double[] curlB = new double[3];
        double[] kappa = new double[3];
        double[] b = new double[3];
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            double h = STEP_FRACTION * ell;
            f.evaluate(p[0], p[1], p[2], p[3], s);
            s.gradBMag(gradB);
            s.curlUnitB(curlB);
            s.curvature(kappa);
            s.unitB(b);

            double[] gradFd = Differences.gradient(strength, p, h);
            double[] jb = Differences.jacobian(unit, p, h);    // ∂b_i/∂x_j
            double[] curlFd = Differences.curl(jb);
            double[] kappaFd = new double[3];
            for (int i = 0; i < 3; i++) {
                kappaFd[i] = b[0] * jb[3 * i] + b[1] * jb[3 * i + 1] + b[2] * jb[3 * i + 2];
            }
            double bScale = 1.0 / ell + Differences.maxAbs(jb);
            String at = c + " at " + java.util.Arrays.toString(p);
            assertTrue(Differences.maxAbsDiff(gradB, gradFd) / (s.bMag() * bScale) < TOL, at + ": grad |B|");
            assertTrue(Differences.maxAbsDiff(curlB, curlFd) / bScale < TOL, at + ": curl b");
            assertTrue(Differences.maxAbsDiff(kappa, kappaFd) / bScale < TOL, at + ": curvature");
        }
    }
}
