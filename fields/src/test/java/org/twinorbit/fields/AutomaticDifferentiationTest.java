package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.Function;
import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.twinorbit.shared.FieldSample;

/**
 * The two fields with the longest hand-derived Jacobians (dipole, tokamak) once more, against
 * Commons Math automatic differentiation ({@link DerivativeStructure}; Rall, Automatic
 * Differentiation, 1981): B is written again from its definition in docs/design.md, and AD gives its
 * derivatives to rounding, so the tolerance can be 1e-12 of |B|/ℓ + max|∂B| (a few dozen ulps of
 * the terms summed) instead of the 1e-9 that finite differences allow.
 */
class AutomaticDifferentiationTest {

    /** B(x, y, z) as three derivative structures from three position structures. */
    private static Function<DerivativeStructure[], DerivativeStructure[]> definition(String name) {
        if (name.equals("dipole")) {
            double k = 3.0e-5 * Math.pow(6.4e6, 3);                // B_s R_p³, defaults
            return p -> {
                DerivativeStructure x = p[0], y = p[1], z = p[2];
                DerivativeStructure r2 = x.multiply(x).add(y.multiply(y)).add(z.multiply(z));
                DerivativeStructure inv5 = r2.pow(-2.5).multiply(k);
                // m̂ = −ẑ: B = k [−3 z r + ẑ r²]/r⁵
                return new DerivativeStructure[] {x.multiply(z).multiply(-3).multiply(inv5),
                        y.multiply(z).multiply(-3).multiply(inv5),
                        r2.subtract(z.multiply(z).multiply(3)).multiply(inv5)};
            };
        }
        double r0 = 1.5, a = 0.5, b0 = 2.0, q0 = 1.1, qa = 3.5;   // tokamak defaults
        return p -> {
            DerivativeStructure x = p[0], y = p[1], z = p[2];
            DerivativeStructure big = x.multiply(x).add(y.multiply(y)).sqrt();
            DerivativeStructure dr = big.subtract(r0);
            DerivativeStructure minor = dr.multiply(dr).add(z.multiply(z)).sqrt();
            DerivativeStructure cosT = dr.divide(minor);
            DerivativeStructure sinT = z.divide(minor);
            DerivativeStructure q = minor.multiply(minor).multiply((qa - q0) / (a * a)).add(q0);
            DerivativeStructure bTheta = minor.multiply(b0).divide(q).divide(big);   // ψ'/R
            DerivativeStructure bPhi = big.reciprocal().multiply(b0 * r0);
            DerivativeStructure bR = bTheta.multiply(sinT).negate();                  // θ̂ = (−sin θ, cos θ)
            DerivativeStructure bZ = bTheta.multiply(cosT);
            DerivativeStructure cosP = x.divide(big);
            DerivativeStructure sinP = y.divide(big);
            return new DerivativeStructure[] {bR.multiply(cosP).subtract(bPhi.multiply(sinP)),
                    bR.multiply(sinP).add(bPhi.multiply(cosP)), bZ};
        };
    }

    @ParameterizedTest
    @ValueSource(strings = {"dipole", "tokamak"})
    void jacobianMatchesAutomaticDifferentiation(String name) {
        FieldCases.Case c = FieldCases.byName(name);
        Function<DerivativeStructure[], DerivativeStructure[]> b = definition(name);
        FieldSample s = new FieldSample();
        int checked = 0;
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            if (name.equals("tokamak") && Math.hypot(Math.hypot(p[1], p[2]) - 1.5, p[3]) < 1e-3 * ell) {
                continue;   // θ is undefined on the magnetic axis, though B is smooth there
            }
            DerivativeStructure[] pos = new DerivativeStructure[3];
            for (int j = 0; j < 3; j++) {
                pos[j] = new DerivativeStructure(3, 1, j, p[1 + j]);
            }
            DerivativeStructure[] bv = b.apply(pos);
            c.field().evaluate(p[0], p[1], p[2], p[3], s);
            double norm = s.bMag() / ell + Differences.maxAbs(s.dB);
            double[] ad = new double[9];
            double valueErr = 0;
            double[] bs = {s.bx, s.by, s.bz};
            for (int i = 0; i < 3; i++) {
                valueErr = Math.max(valueErr, Math.abs(bv[i].getValue() - bs[i]) / s.bMag());
                for (int j = 0; j < 3; j++) {
                    int[] order = new int[3];
                    order[j] = 1;
                    ad[3 * i + j] = bv[i].getPartialDerivative(order);
                }
            }
            String at = name + " at " + java.util.Arrays.toString(p);
            assertTrue(valueErr < 1e-13, at + ": B differs from its definition by " + valueErr);
            double err = Differences.maxAbsDiff(ad, s.dB) / norm;
            assertTrue(err < 1e-12, at + ": Jacobian differs from AD by " + err);
            checked++;
        }
        assertTrue(checked > 30);
    }
}
