package org.twinorbit.integrators.reference;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.apache.commons.math3.ode.sampling.StepNormalizerBounds;
import org.apache.commons.math3.ode.sampling.StepNormalizerMode;
import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.fullorbit.LorentzEquations;
import org.twinorbit.integrators.maps.GyroPlacement;
import org.twinorbit.integrators.maps.InitialCondition;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * Our Dormand–Prince 8(5,3) against the general-purpose library it replaces, Commons Math 3.6's
 * {@code DormandPrince853Integrator} (same tolerances, dense output sampled through its
 * {@code StepNormalizer}, the domain event through its event handling), on the relativistic
 * Lorentz equations, and against an exact gyration.
 */
class DormandPrince853Test {

    private static final Species P = Species.PROTON;

    /** A 1 MeV proton at 30° pitch in the dipole at L = 4, 30 gyroperiods at rtol 1e-10. */
    @Test
    void reproducesCommonsMathSampleForSampleInTheDipole() {
        Field f = Fields.create("dipole", P);
        double[][] s = start(f, new double[] {4 * 6.4e6, 0, 0}, 1e6, 30, 1.0);
        double tc = gyroPeriod(f, s);
        compare(f, s[0], s[1], 30 * tc, tc / 32, 1e-10);
    }

    /** A time-dependent field uses the stage times: the wave field, 20 gyroperiods at rtol 1e-11. */
    @Test
    void reproducesCommonsMathInATimeDependentField() {
        Field f = Fields.create("wave", P);
        double[][] s = start(f, new double[] {0, 0, 0}, 1e4, 60, 0.3);
        double tc = gyroPeriod(f, s);
        compare(f, s[0], s[1], 20 * tc, tc / 32, 1e-11);
    }

    /** A particle in the mirror's loss cone leaves through a throat: same crossing time and state. */
    @Test
    void findsTheSameDomainExitAsCommonsMath() {
        Field f = Fields.create("mirror", P);
        double[][] s = start(f, new double[] {0.01, 0, 0}, 1e4, 10, 0.0);
        double tc = gyroPeriod(f, s);
        Run ours = ours(f, s[0], s[1], 2000 * tc, tc / 32, 1e-10);
        Run lib = library(f, s[0], s[1], 2000 * tc, tc / 32, 1e-10);
        assertEquals(OrbitStatus.LOST, ours.result.status());
        assertTrue(lib.lost);
        assertEquals(lib.end, ours.result.endTime(), 0.0, "crossing time (s)");
        assertArrayEquals(lib.samples.get(lib.samples.size() - 1), ours.samples.get(ours.samples.size() - 1), 0.0);
        assertEquals(lib.samples.size(), ours.samples.size());
    }

    /**
     * Uniform B: u turns at Ω = qB/(γm) on an exact circle (J. D. Jackson, Classical
     * Electrodynamics, 3rd ed., 1999, §12.2, from memory). The dense output between steps, at
     * times that fall anywhere inside them, stays on it to 1e-9 ρ over 10 gyrations at rtol 1e-11
     * (the 7th-order interpolant adds nothing visible to the integration's own error).
     */
    @Test
    void denseOutputFollowsTheExactGyration() {
        double b = 1.0;
        Field f = Fields.create("uniform", java.util.Map.of("B0", b), P);
        double u = Relativity.uFromKinetic(P, 1e5);
        double gamma = Math.sqrt(1 + u * u / (org.twinorbit.shared.Constants.C * org.twinorbit.shared.Constants.C));
        double omega = P.charge() * b / (gamma * P.mass());
        double rho = u / (gamma * omega);
        double[] x0 = {0, 0, 0};
        double[] u0 = {u, 0, 0};
        double tEnd = 10 * 2 * Math.PI / omega;
        Run ours = ours(f, x0, u0, tEnd, tEnd / 517, 1e-11);
        double worst = 0;
        for (double[] q : ours.samples) {
            double t = q[0];
            // proton, B along +z: clockwise about the centre (0, −ρ)
            double ex = rho * Math.sin(omega * t);
            double ey = rho * (Math.cos(omega * t) - 1);
            worst = Math.max(worst, Math.hypot(q[1] - ex, q[2] - ey) / rho);
        }
        // 518 sampling times, plus the end when the summed interval falls short of it by round-off
        assertTrue(ours.samples.size() >= 518, ours.samples.size() + " samples");
        assertTrue(worst < 1e-9, "worst deviation " + worst + " ρ");
    }

    /** Steps and dense output allocate nothing of their own (common practice for hot loops). */
    @Test
    void stepsAndInterpolatesWithoutAllocating() {
        java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
        if (!(mx instanceof com.sun.management.ThreadMXBean bean) || !bean.isThreadAllocatedMemorySupported()) {
            return; // the JVM cannot count allocations: nothing to check
        }
        Field f = Fields.create("dipole", P);
        double[][] s = start(f, new double[] {4 * 6.4e6, 0, 0}, 1e5, 45, 0.0);
        LorentzEquations lorentz = new LorentzEquations(f, P);
        double[] tol = {1e-10, 1e-10, 1e-10, 1e-10, 1e-10, 1e-10};
        double[] atol = {1e-10 * 1e3, 1e-10 * 1e3, 1e-10 * 1e3, 1e-10 * 1e6, 1e-10 * 1e6, 1e-10 * 1e6};
        DormandPrince853 dp = new DormandPrince853(lorentz::derivatives, atol, tol, 1e9);
        double[] y = {s[0][0], s[0][1], s[0][2], s[1][0], s[1][1], s[1][2]};
        dp.start(0, y, 1e9);
        double[] out = new double[6];
        for (int i = 0; i < 20000; i++) {
            dp.step(); // warm-up so that nothing is counted from class loading or compilation
            dp.interpolate(0.5 * (dp.previousTime() + dp.currentTime()), out);
        }
        long id = Thread.currentThread().getId();
        long before = bean.getThreadAllocatedBytes(id);
        for (int i = 0; i < 100000; i++) {
            dp.step();
            dp.interpolate(0.5 * (dp.previousTime() + dp.currentTime()), out);
        }
        long bytes = bean.getThreadAllocatedBytes(id) - before;
        // The one allocation left is Commons Math's: FastMath.pow, which keeps the step control
        // bit-identical to the library's, makes a 2-element work array (32 B) per call, one call
        // per step. Anything of ours allocated per step would add ≥ 16 B more.
        assertTrue(bytes < 100_000 + 32L * 100000, bytes + " bytes allocated over 1e5 steps");
        assertTrue(dp.currentTime() > 0 && Double.isFinite(out[0]), "the steps really ran");
    }

    private static double[][] start(Field f, double[] gc, double ev, double pitch, double phase) {
        var ic = InitialCondition.ofEnergy(f, P, ev, pitch, new org.twinorbit.shared.Vec3(gc[0], gc[1], gc[2]));
        var p = ic.particles(8, GyroPlacement.ZEROTH_EXB).get((int) Math.round(phase * 8) % 8);
        return new double[][] {p.position().toArray(), p.u().toArray()};
    }

    private static double gyroPeriod(Field f, double[][] s) {
        FieldSample fs = new FieldSample();
        f.evaluate(0, s[0][0], s[0][1], s[0][2], fs);
        double u2 = s[1][0] * s[1][0] + s[1][1] * s[1][1] + s[1][2] * s[1][2];
        return 2 * Math.PI * Relativity.gammaFromU2(u2) * P.mass() / (P.charge() * fs.bMag());
    }

    private static void compare(Field f, double[] x0, double[] u0, double tEnd, double interval, double rtol) {
        Run ours = ours(f, x0, u0, tEnd, interval, rtol);
        Run lib = library(f, x0, u0, tEnd, interval, rtol);
        assertEquals(OrbitStatus.OK, ours.result.status());
        assertEquals(lib.samples.size(), ours.samples.size());
        for (int i = 0; i < lib.samples.size(); i++) {
            assertArrayEquals(lib.samples.get(i), ours.samples.get(i), 0.0, "sample " + i);
        }
        assertEquals(lib.end, ours.result.endTime(), 0.0);
        // the library evaluates the three dense-output stages after every step; we only when sampling inside it
        assertTrue(ours.result.evaluations() <= lib.evaluations,
                ours.result.evaluations() + " against " + lib.evaluations);
    }

    private record Run(FullOrbitReference.Result result, List<double[]> samples, double end, long evaluations,
                       boolean lost) {}

    private static Run ours(Field f, double[] x0, double[] u0, double tEnd, double interval, double rtol) {
        List<double[]> samples = new ArrayList<>();
        FullOrbitReference.Result r = new FullOrbitReference(f, P, rtol).run(0, x0.clone(), u0.clone(), tEnd, interval,
                (t, x, u) -> samples.add(new double[] {t, x[0], x[1], x[2], u[0], u[1], u[2]}));
        return new Run(r, samples, r.endTime(), r.evaluations(), r.status() == OrbitStatus.LOST);
    }

    /** The same run through Commons Math, set up as FullOrbitReference did before it had its own integrator. */
    private static Run library(Field f, double[] x0, double[] u0, double tEnd, double interval, double rtol) {
        FieldSample s = new FieldSample();
        f.evaluate(0, x0[0], x0[1], x0[2], s);
        double u = Math.sqrt(u0[0] * u0[0] + u0[1] * u0[1] + u0[2] * u0[2]);
        double rho = P.mass() * u / (P.charge() * s.bMag());
        double tc = 2 * Math.PI * Relativity.gammaFromU2(u * u) * P.mass() / (P.charge() * s.bMag());
        double timeScale = tc < tEnd ? tc : tEnd;
        double[] atol = {rtol * rho, rtol * rho, rtol * rho, rtol * u, rtol * u, rtol * u};
        double[] rtols = {rtol, rtol, rtol, rtol, rtol, rtol};
        DormandPrince853Integrator dp = new DormandPrince853Integrator(0.0, tEnd, atol, rtols);
        LorentzEquations lorentz = new LorentzEquations(f, P);
        FirstOrderDifferentialEquations eq = new FirstOrderDifferentialEquations() {
            @Override public int getDimension() { return 6; }
            @Override public void computeDerivatives(double t, double[] y, double[] yDot) { lorentz.derivatives(t, y, yDot); }
        };
        List<double[]> samples = new ArrayList<>();
        dp.addStepHandler(new StepNormalizer(interval, new FixedStepHandler() {
            @Override public void init(double t0, double[] y0, double t) {}
            @Override public void handleStep(double t, double[] y, double[] yDot, boolean last) {
                samples.add(new double[] {t, y[0], y[1], y[2], y[3], y[4], y[5]});
            }
        }, StepNormalizerMode.INCREMENT, StepNormalizerBounds.BOTH));
        boolean[] lost = {false};
        dp.addEventHandler(new EventHandler() {
            @Override public void init(double t0, double[] y0, double t) {}
            @Override public double g(double t, double[] y) {
                return Math.max(-Double.MAX_VALUE, Math.min(Double.MAX_VALUE, f.domainMargin(y[0], y[1], y[2])));
            }
            @Override public Action eventOccurred(double t, double[] y, boolean increasing) {
                if (increasing) {
                    return Action.CONTINUE;
                }
                lost[0] = true;
                return Action.STOP;
            }
            @Override public void resetState(double t, double[] y) {}
        }, timeScale / 8, 1e-12 * timeScale, 1000);
        double[] y = {x0[0], x0[1], x0[2], u0[0], u0[1], u0[2]};
        double end = dp.integrate(eq, 0, y, tEnd, y);
        return new Run(null, samples, end, lorentz.evaluations(), lost[0]);
    }
}
