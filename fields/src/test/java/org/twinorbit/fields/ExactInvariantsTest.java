package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * Every invariant a field declares exact has zero time derivative along the relativistic Lorentz
 * flow dx/dt = v, du/dt = (q/m)(E + v×B), u = γv (Noether's theorem for the symmetry the
 * invariant comes from; Goldstein, Classical Mechanics, 3rd ed., 2002, §13.7 and §8.1 for the
 * canonical momentum p + qA). The derivative is taken by a fourth-order difference along the
 * flow's tangent in (t, x, u), so the check is local and needs no orbit integration.
 *
 * <p>The velocity is chosen so that the gyroradius equals the local scale ℓ (capped at 0.3 c),
 * which makes the magnetic, electric and inertial terms of dI/dt of one size. The rate is divided
 * by max(scale(I), |I|)·(|v|/ℓ + |du/dt|/|u| + 1/T), the size of each term that must cancel (|I|
 * enters because a gauge constant in qA sets the round-off of the difference); a wrong sign or
 * a wrong gauge leaves a remainder of relative size 1, the difference error is ~1e-12.
 */
class ExactInvariantsTest {

    private static final Species S = FieldCases.SPECIES;
    private static final double[] OFF = {-2, -1, 1, 2};
    private static final double[] W = {1.0 / 12, -8.0 / 12, 8.0 / 12, -1.0 / 12};

    static Stream<FieldCases.Case> cases() {
        return FieldCases.all();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void exactInvariantsAreConstantAlongTheLorentzFlow(FieldCases.Case c) {
        Field f = c.field();
        FieldSample s = new FieldSample();
        Random rnd = new Random(42);
        int checked = 0;
        for (double[] p : c.points()) {
            double ell = c.scale().at(p);
            f.evaluate(p[0], p[1], p[2], p[3], s);
            double speedU = Math.min(Math.abs(S.charge()) * s.bMag() * ell / S.mass(), 0.3 * Constants.C);
            double[] dir = randomUnit(rnd);
            double[] u = {speedU * dir[0], speedU * dir[1], speedU * dir[2]};
            double gamma = Relativity.gammaFromU2(speedU * speedU);
            double[] v = {u[0] / gamma, u[1] / gamma, u[2] / gamma};
            double qm = S.chargeToMass();
            double[] a = {qm * (s.ex + v[1] * s.bz - v[2] * s.by),
                    qm * (s.ey + v[2] * s.bx - v[0] * s.bz),
                    qm * (s.ez + v[0] * s.by - v[1] * s.bx)};
            double vMag = speedU / gamma;
            double aMag = Differences.norm(a[0], a[1], a[2]);
            double tScale = f.isStatic() ? Double.POSITIVE_INFINITY : f.timeScale();
            // the step keeps every part of the path small: position, time and momentum
            double h = Differences.STEP_FRACTION * Math.min(ell / vMag, Math.min(tScale, speedU / aMag));
            double[] x = {p[1], p[2], p[3]};
            for (Invariant inv : f.invariants()) {
                if (!inv.exact()) {
                    continue;
                }
                double rate = 0;
                for (int k = 0; k < 4; k++) {
                    double sk = OFF[k] * h;
                    double[] xs = {x[0] + sk * v[0], x[1] + sk * v[1], x[2] + sk * v[2]};
                    double[] us = {u[0] + sk * a[0], u[1] + sk * a[1], u[2] + sk * a[2]};
                    rate += W[k] * inv.value(S, p[0] + sk, xs, us) / h;
                }
                double size = Math.max(inv.scale(S, p[0], x, u), Math.abs(inv.value(S, p[0], x, u)));
                if (inv.unit().equals("kg m^2/s")) {
                    // an angular momentum's scale m|u|R vanishes on the axis; ℓ stands in for R
                    size = Math.max(size, S.mass() * speedU * ell);
                }
                double norm = size * (vMag / ell + aMag / speedU + 1.0 / tScale);
                assertTrue(Math.abs(rate) / norm < 1e-9,
                        c + ": " + inv.name() + " changes at relative rate " + Math.abs(rate) / norm);
                checked++;
            }
        }
        boolean hasExact = f.invariants().stream().anyMatch(Invariant::exact);
        assertTrue(!hasExact || checked > 0);
    }

    private static double[] randomUnit(Random r) {
        double cz = -1 + 2 * r.nextDouble();
        double sz = Math.sqrt(1 - cz * cz);
        double phi = 2 * Math.PI * r.nextDouble();
        return new double[] {sz * Math.cos(phi), sz * Math.sin(phi), cz};
    }
}
