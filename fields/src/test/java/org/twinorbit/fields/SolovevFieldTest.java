package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Random;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariateOptimizer;
import org.junit.jupiter.api.Test;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/** What is special about the Solov'ev tokamak; the checks every field gets are in FieldDerivativesTest. */
class SolovevFieldTest {

    private static final SolovevField F = (SolovevField) Fields.create("solovev", Map.of(), Species.DEUTERON);
    private static final double R0 = 1.7;
    private static final double A = 0.5;
    private static final double KAPPA = 1.7;
    private static final double DELTA = 0.33;

    /** The Z (m) where ψ = 0 above (R, 0), by bisection: the upper half of the boundary. */
    private static double boundaryHeight(double r) {
        double lo = 0;
        double hi = 2 * KAPPA * A;
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (F.psiDerivative(0, 0, r, mid) > 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /**
     * The ψ = 0 contour passes through R0 ± a and the top point (R0 − δa, κa), and is highest there
     * (Cerfon &amp; Freidberg, Phys. Plasmas 17, 032502, 2010, Eq. 10); measured on the contour itself,
     * its elongation Z_max/a and triangularity (R0 − R(Z_max))/a are κ and δ (definitions: common
     * practice).
     */
    @Test
    void boundaryHasTheRequestedShape() {
        double scale = Math.abs(F.psiAxis());
        assertEquals(0, F.psiDerivative(0, 0, R0 + A, 0) / scale, 1e-13);
        assertEquals(0, F.psiDerivative(0, 0, R0 - A, 0) / scale, 1e-13);
        assertEquals(0, F.psiDerivative(0, 0, R0 - DELTA * A, KAPPA * A) / scale, 1e-13);
        assertEquals(0, F.psiDerivative(1, 0, R0 - DELTA * A, KAPPA * A) * A / scale, 1e-13);
        UnivariateOptimizer brent = new BrentOptimizer(1e-12, 1e-14);
        var top = brent.optimize(new MaxEval(500), GoalType.MAXIMIZE,
                new UnivariateObjectiveFunction(SolovevFieldTest::boundaryHeight),
                new SearchInterval(R0 - A * 0.9, R0 + A * 0.9, R0));
        assertEquals(KAPPA, top.getValue() / A, 1e-9, "elongation of the psi = 0 contour");
        assertEquals(DELTA, (R0 - top.getPoint()) / A, 1e-5, "triangularity of the psi = 0 contour");
        // the equatorial points are the contour's innermost and outermost: just outside them ψ > 0
        for (double z = -KAPPA * A; z <= KAPPA * A; z += 0.01) {
            assertTrue(F.psiDerivative(0, 0, R0 + A + 1e-3, z) < 0 || F.domainMargin(R0 + A + 1e-3, 0, z) < 0);
            assertTrue(F.domainMargin(R0 - A - 1e-3, 0, z) < 0, "inside the hole at Z = " + z);
        }
    }

    /**
     * Grad–Shafranov: Δ*ψ = ψ_RR − ψ_R/R + ψ_ZZ = −μ0 R² p'(ψ) − F F'(ψ) (Grad &amp; Rubin 1958,
     * Shafranov 1958), from the exact derivatives and from fourth-order differences of ψ alone
     * (Abramowitz &amp; Stegun 1964, 25.3.24), at random points of the plasma.
     */
    @Test
    void gradShafranovHolds() {
        Random rnd = new Random(3);
        double h = 1e-3;
        int checked = 0;
        while (checked < 50) {
            double r = R0 - A + 2 * A * rnd.nextDouble();
            double z = KAPPA * A * (2 * rnd.nextDouble() - 1);
            if (F.domainMargin(r, 0, z) <= 0) {
                continue;
            }
            checked++;
            double psi = F.psiDerivative(0, 0, r, z);
            double rhs = -SolovevField.MU0 * r * r * F.pressurePrime(psi) - F.f(psi) * F.fPrime(psi);
            double exact = F.psiDerivative(2, 0, r, z) - F.psiDerivative(1, 0, r, z) / r + F.psiDerivative(0, 2, r, z);
            assertEquals(rhs, exact, 1e-12 * Math.abs(rhs), "exact derivatives at " + r + ", " + z);
            double prr = second(u -> F.psiDerivative(0, 0, u, z), r, h);
            double pzz = second(u -> F.psiDerivative(0, 0, r, u), z, h);
            double pr = (F.psiDerivative(0, 0, r - 2 * h, z) - 8 * F.psiDerivative(0, 0, r - h, z)
                    + 8 * F.psiDerivative(0, 0, r + h, z) - F.psiDerivative(0, 0, r + 2 * h, z)) / (12 * h);
            assertEquals(rhs, prr - pr / r + pzz, 1e-6 * Math.abs(rhs), "differences at " + r + ", " + z);
        }
    }

    private static double second(java.util.function.DoubleUnaryOperator f, double x, double h) {
        return (-f.applyAsDouble(x - 2 * h) + 16 * f.applyAsDouble(x - h) - 30 * f.applyAsDouble(x)
                + 16 * f.applyAsDouble(x + h) - f.applyAsDouble(x + 2 * h)) / (12 * h * h);
    }

    /** Third derivatives of ψ (exact tables) against fourth-order differences of the second ones (A&amp;S 25.3.6). */
    @Test
    void thirdDerivativesMatchDifferences() {
        double h = 1e-4;
        double[][] pts = {{1.9, 0.3}, {1.5, -0.6}, {F.axis()[0], 0}};
        for (double[] p : pts) {
            for (int dr = 0; dr <= 2; dr++) {
                int dz = 2 - dr;
                final int fr = dr;
                final int fz = dz;
                double exactR = F.psiDerivative(dr + 1, dz, p[0], p[1]);
                double fdR = fourth(u -> F.psiDerivative(fr, fz, u, p[1]), p[0], h);
                double exactZ = F.psiDerivative(dr, dz + 1, p[0], p[1]);
                double fdZ = fourth(u -> F.psiDerivative(fr, fz, p[0], u), p[1], h);
                double scale = Math.abs(F.psiAxis()) / (A * A * A);
                assertEquals(exactR, fdR, 1e-8 * scale);
                assertEquals(exactZ, fdZ, 1e-8 * scale);
            }
        }
    }

    private static double fourth(java.util.function.DoubleUnaryOperator f, double x, double h) {
        return (f.applyAsDouble(x - 2 * h) - 8 * f.applyAsDouble(x - h) + 8 * f.applyAsDouble(x + h)
                - f.applyAsDouble(x + 2 * h)) / (12 * h);
    }

    /**
     * q0 sets ψ0: the field-line pitch of a surface close to the axis, q = (1/2π)∮ B·∇φ / B·∇θ dθ,
     * tends to q0 (Wesson, Tokamaks, 2011, §3.3, from memory; the deviation is O(ρ²)).
     */
    @Test
    void safetyFactorOnTheAxisIsQ0() {
        FluxSurfaces s = new FluxSurfaces(F, 0.01);
        double q1 = s.safetyFactor(1e-4, 128);
        double q2 = s.safetyFactor(4e-4, 128);
        double extrapolated = q1 - (q2 - q1) / 3;    // q = q0 + c ψ_N (ψ_N ∝ ρ² near the axis)
        assertEquals(2.0, extrapolated, 1e-6);
        assertTrue(s.safetyFactor(0.95, 128) > 2.0, "q rises outward in this equilibrium");
    }

    /**
     * p_φ = m R u_φ + q ψ and the kinetic energy stay constant along a deuteron's full orbit
     * (Noether's theorem for the symmetry in φ; Goldstein, Classical Mechanics, 2002, §8.2),
     * integrated at tight tolerance with Dormand–Prince 8(5,3) (Commons Math).
     */
    @Test
    void toroidalMomentumIsConservedAlongAnOrbit() {
        Species d = Species.DEUTERON;
        double ev = 20e3;
        double u = Relativity.uFromKinetic(d, ev);
        double gamma = Relativity.gammaFromKinetic(d, ev);
        double speed = u / gamma;
        double pitch = Math.toRadians(70);
        FieldSample s = new FieldSample();
        double[] start = {2.0, 0, 0.1};
        F.evaluate(0, start[0], start[1], start[2], s);
        double b = s.bMag();
        double[] bhat = {s.bx / b, s.by / b, s.bz / b};
        double[] perp = {bhat[2], 0, -bhat[0]};
        double np = Math.sqrt(perp[0] * perp[0] + perp[2] * perp[2]);
        double[] y0 = new double[6];
        System.arraycopy(start, 0, y0, 0, 3);
        for (int k = 0; k < 3; k++) {
            double[] pk = {perp[0] / np, 0, perp[2] / np};
            y0[3 + k] = u * (Math.cos(pitch) * bhat[k] + Math.sin(pitch) * pk[k]);
        }
        Invariant pphi = F.invariants().stream().filter(i -> i.name().equals("p_phi")).findFirst().orElseThrow();
        double p0 = pphi.value(d, 0, start, new double[] {y0[3], y0[4], y0[5]});
        double scale = pphi.scale(d, 0, start, new double[] {y0[3], y0[4], y0[5]});
        FieldSample w = new FieldSample();
        FirstOrderDifferentialEquations lorentz = new FirstOrderDifferentialEquations() {
            @Override public int getDimension() { return 6; }
            @Override public void computeDerivatives(double t, double[] y, double[] dy) {
                double g = Math.sqrt(1 + (y[3] * y[3] + y[4] * y[4] + y[5] * y[5]) / (Constants.C * Constants.C));
                F.evaluate(t, y[0], y[1], y[2], w);
                double qm = d.chargeToMass();
                for (int k = 0; k < 3; k++) {
                    dy[k] = y[3 + k] / g;
                }
                dy[3] = qm * (dy[1] * w.bz - dy[2] * w.by);
                dy[4] = qm * (dy[2] * w.bx - dy[0] * w.bz);
                dy[5] = qm * (dy[0] * w.by - dy[1] * w.bx);
            }
        };
        double period = 2 * Math.PI * gamma * d.mass() / (d.charge() * b);
        double[] y = y0.clone();
        double[] abs = {1e-11, 1e-11, 1e-11, 1e-11 * speed, 1e-11 * speed, 1e-11 * speed};
        double[] rel = {1e-11, 1e-11, 1e-11, 1e-11, 1e-11, 1e-11};
        new DormandPrince853Integrator(1e-16, period, abs, rel).integrate(lorentz, 0, y0, 300 * period, y);
        double p1 = pphi.value(d, 0, new double[] {y[0], y[1], y[2]}, new double[] {y[3], y[4], y[5]});
        assertTrue(F.domainMargin(y[0], y[1], y[2]) > 0, "the orbit stays confined");
        assertEquals(0, (p1 - p0) / scale, 1e-8, "p_phi drift over 300 gyrations");
        assertEquals(ev, Relativity.kineticFromU(d, Math.sqrt(y[3] * y[3] + y[4] * y[4] + y[5] * y[5])), 1e-8 * ev);
        // and the orbit has moved: R u_φ alone is not conserved, the q ψ term carries the rest
        double mru = d.mass() * (y[0] * y[4] - y[1] * y[3]);
        double mru0 = d.mass() * (y0[0] * y0[4] - y0[1] * y0[3]);
        assertTrue(Math.abs(mru - mru0) / scale > 1e-3, "the flux term matters");
    }

    /** The margin is positive inside, zero on the three shape points and crosses zero once along rays. */
    @Test
    void domainIsInsideTheLastClosedSurface() {
        double[] ax = F.axis();
        for (int k = 0; k < 64; k++) {
            double th = 2 * Math.PI * k / 64;
            int changes = 0;
            double prev = F.domainMargin(ax[0], 0, ax[1]);
            assertTrue(prev > 0);
            for (double rho = 0.005; rho < 1.5; rho += 0.005) {
                double m = F.domainMargin(ax[0] + rho * Math.cos(th), 0, ax[1] + rho * Math.sin(th));
                if ((m > 0) != (prev > 0)) {
                    changes++;
                }
                prev = m;
            }
            assertEquals(1, changes, "one crossing along angle " + th);
        }
        assertEquals(0, F.domainMargin(R0 + A, 0, 0), 1e-12);
        assertEquals(0, F.domainMargin(0, R0 - A, 0), 1e-12);
        assertEquals(0, F.domainMargin(R0 - DELTA * A, 0, KAPPA * A), 1e-12);
    }

    @Test
    void shapesWithoutAnAxisOrWithNegativeFSquaredAreRefused() {
        assertThrows(FieldParameterException.class,
                () -> Fields.create("solovev", Map.of("a", 1.5), Species.DEUTERON));
        assertThrows(FieldParameterException.class,
                () -> Fields.create("solovev", Map.of("kappa", 0.5), Species.DEUTERON));
    }
}
