package org.twinorbit.integrators.reference;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.fullorbit.LorentzEquations;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The full-orbit reference: the Lorentz equations in (x, u = γv) integrated by the adaptive
 * Dormand–Prince 8(5,3) method (J. R. Dormand & P. J. Prince, J. Comput. Appl. Math. 6, 19, 1980;
 * E. Hairer, S. P. Nørsett & G. Wanner, Solving Ordinary Differential Equations I, 1993, §II.10,
 * section from memory; our allocation-free {@link DormandPrince853}, which gives Commons Math's
 * states to the last bit) at a tight tolerance, with dense output sampled at a fixed interval,
 * an event that stops the run where the particle leaves the field's domain (status LOST at the
 * crossing time), and an estimate of its own error from the same run at a 100× tighter
 * tolerance.
 *
 * <p>Tolerances: relative rtol on every component; absolute rtol·ρ0 on positions and rtol·|u0|
 * on velocities, so that components passing through zero are held to the orbit's own scale.
 */
public final class FullOrbitReference {

    /** Default relative tolerance: tight enough for 10⁴–10⁵ gyrations (docs/design.md). */
    public static final double DEFAULT_RELATIVE_TOLERANCE = 1e-11;
    /**
     * The tightest relative tolerance used: below ~1e-14 the error of an 8th-order step in double
     * precision is set by round-off, not by the tolerance (common practice).
     */
    public static final double TIGHTEST_RELATIVE_TOLERANCE = 1e-14;

    private final Field field;
    private final Species species;
    private final double rtol;

    /** A reference at {@link #DEFAULT_RELATIVE_TOLERANCE}. */
    public FullOrbitReference(Field field, Species species) {
        this(field, species, DEFAULT_RELATIVE_TOLERANCE);
    }

    /** @param relativeTolerance relative tolerance, in [1e-14, 1e-3] */
    public FullOrbitReference(Field field, Species species, double relativeTolerance) {
        if (!(relativeTolerance >= TIGHTEST_RELATIVE_TOLERANCE && relativeTolerance <= 1e-3)) {
            throw new IllegalArgumentException("reference relative tolerance must be in ["
                    + TIGHTEST_RELATIVE_TOLERANCE + ", 1e-3], got " + relativeTolerance);
        }
        this.field = field;
        this.species = species;
        this.rtol = relativeTolerance;
    }

    /** The relative tolerance of this reference. */
    public double relativeTolerance() {
        return rtol;
    }

    /**
     * The outcome of one reference run.
     *
     * @param status      OK (reached the end time), LOST (left the domain) or UNSTABLE
     * @param endTime     time (s) the run ended: the requested end, the domain crossing, or the
     *                    last good step
     * @param position    position (m) at endTime
     * @param velocity    u = γv (m/s) at endTime
     * @param evaluations right-hand-side (= field) evaluations
     * @param lengthScale ρ0 (m), the scale of the position tolerance
     * @param speedScale  |u0| (m/s), the scale of the velocity tolerance
     */
    public record Result(OrbitStatus status, double endTime, Vec3 position, Vec3 velocity,
                         long evaluations, double lengthScale, double speedScale) {}

    /**
     * The reference's estimate of its own error: the final-state difference to the same run at a
     * 100× tighter tolerance (clamped at {@link #TIGHTEST_RELATIVE_TOLERANCE}). It is honest when
     * the tighter run is much more accurate, i.e. while the tolerance is well above round-off; at
     * the tightest tolerance both runs are the same and the estimate is zero, which says nothing.
     *
     * @param result        the run at this reference's tolerance
     * @param tighter       the same run at the tighter tolerance
     * @param positionError |x − x_tight| / ρ0 (dimensionless)
     * @param velocityError |u − u_tight| / |u0| (dimensionless)
     */
    public record Estimate(Result result, Result tighter, double positionError, double velocityError) {}

    /**
     * Integrates from (x0, u0) at t0 to tEnd, reporting samples every {@code interval}.
     *
     * @param t0       start time (s)
     * @param x0       start position (m)
     * @param u0       start u = γv (m/s)
     * @param tEnd     end time (s), after t0
     * @param interval sampling interval (s) for the observer; ignored when observer is null
     * @param observer receives (t, x, u) at t0, t0 + interval, ... and at the end; may be null
     */
    public Result run(double t0, double[] x0, double[] u0, double tEnd, double interval, FullOrbitObserver observer) {
        return run(rtol, t0, x0, u0, tEnd, interval, observer);
    }

    /** {@link #run} without samples. */
    public Result run(double t0, double[] x0, double[] u0, double tEnd) {
        return run(rtol, t0, x0, u0, tEnd, 0, null);
    }

    /** Runs at this tolerance and at a 100× tighter one, and compares the final states. */
    public Estimate estimate(double t0, double[] x0, double[] u0, double tEnd) {
        Result a = run(rtol, t0, x0, u0, tEnd, 0, null);
        Result b = run(Math.max(rtol / 100.0, TIGHTEST_RELATIVE_TOLERANCE), t0, x0, u0, tEnd, 0, null);
        double dx = a.position().minus(b.position()).norm() / a.lengthScale();
        double du = a.velocity().minus(b.velocity()).norm() / a.speedScale();
        return new Estimate(a, b, dx, du);
    }

    private Result run(double tol, double t0, double[] x0, double[] u0, double tEnd, double interval,
                       FullOrbitObserver observer) {
        if (!(tEnd > t0)) {
            throw new IllegalArgumentException("end time must be after the start time " + t0 + " s, got " + tEnd);
        }
        if (!field.inDomain(x0[0], x0[1], x0[2])) {
            throw new IllegalArgumentException("start position (" + x0[0] + ", " + x0[1] + ", " + x0[2]
                    + ") m lies outside the domain of field '" + field.name() + "': " + field.domainMeaning());
        }
        FieldSample s = new FieldSample();
        field.evaluate(t0, x0[0], x0[1], x0[2], s);
        double u = Math.sqrt(u0[0] * u0[0] + u0[1] * u0[1] + u0[2] * u0[2]);
        double b = s.bMag();
        // ρ0 = m|u|/(|q|B); without B or without motion the scales fall back to 1 m and c
        double rho = species.mass() * u / (Math.abs(species.charge()) * b);
        double length = rho > 0 && Double.isFinite(rho) ? rho : 1.0;
        double speed = u > 0 ? u : Constants.C;
        double gyroPeriod = 2 * Math.PI * Relativity.gammaFromU2(u * u) * species.mass() / (Math.abs(species.charge()) * b);
        double span = tEnd - t0;
        double timeScale = gyroPeriod > 0 && gyroPeriod < span ? gyroPeriod : span;

        double[] atol = {tol * length, tol * length, tol * length, tol * speed, tol * speed, tol * speed};
        double[] rtols = {tol, tol, tol, tol, tol, tol};
        if (observer != null && !(interval > 0)) {
            throw new IllegalArgumentException("sampling interval must be positive, got " + interval + " s");
        }
        Equations eq = new Equations(new LorentzEquations(field, species));
        DormandPrince853 dp = new DormandPrince853(eq, atol, rtols, span);
        // check the domain at least 8 times per gyration so that no excursion is missed;
        // locate the crossing to 1e-12 of the time scale
        DomainExit exit = new DomainExit(field, dp, timeScale / 8, 1e-12 * timeScale);
        Sampler sampler = observer == null ? null : new Sampler(observer, interval);

        double[] y = {x0[0], x0[1], x0[2], u0[0], u0[1], u0[2]};
        double lastT = t0;
        double[] lastY = y.clone();
        OrbitStatus status = OrbitStatus.OK;
        double end;
        try {
            dp.start(t0, y, tEnd);
            exit.begin(y);
            if (sampler != null) {
                sampler.begin(t0, y);
            }
            while (true) {
                dp.step();
                double crossing = exit.crossing(dp.previousTime(), dp.currentTime());
                if (!Double.isNaN(crossing)) {
                    dp.interpolate(crossing, y);
                    if (sampler != null) {
                        sampler.step(dp, crossing, y, true);
                    }
                    status = OrbitStatus.LOST;
                    end = crossing;
                    break;
                }
                double[] state = dp.state();
                exit.accept(state);
                boolean last = dp.atEnd();
                if (sampler != null) {
                    sampler.step(dp, dp.currentTime(), state, last);
                }
                lastT = dp.currentTime();
                System.arraycopy(state, 0, lastY, 0, 6);
                if (last) {
                    end = lastT;
                    System.arraycopy(state, 0, y, 0, 6);
                    break;
                }
            }
        } catch (NonFinite e) {
            status = OrbitStatus.UNSTABLE;
            end = lastT;
            System.arraycopy(lastY, 0, y, 0, 6);
        }
        return new Result(status, end, new Vec3(y[0], y[1], y[2]), new Vec3(y[3], y[4], y[5]),
                eq.lorentz.evaluations(), length, speed);
    }

    /** The Lorentz equations as the integrator sees them; refuses a non-finite state. */
    private static final class Equations implements DormandPrince853.Derivatives {
        final LorentzEquations lorentz;

        Equations(LorentzEquations lorentz) {
            this.lorentz = lorentz;
        }

        @Override
        public void compute(double t, double[] y, double[] yDot) {
            lorentz.derivatives(t, y, yDot);
            // 0·v is 0 for every finite v and NaN for ±∞ or NaN: one branch for the twelve checks
            double z = 0 * y[0] + 0 * y[1] + 0 * y[2] + 0 * y[3] + 0 * y[4] + 0 * y[5]
                    + 0 * yDot[0] + 0 * yDot[1] + 0 * yDot[2] + 0 * yDot[3] + 0 * yDot[4] + 0 * yDot[5];
            if (z != 0) {
                throw new NonFinite();
            }
        }
    }

    /** Thrown from the equations to abort a run whose state went NaN or infinite. */
    private static final class NonFinite extends RuntimeException {
        NonFinite() {
            super("non-finite state", null, false, false);
        }
    }

    /**
     * Hands the observer the dense output at t0, t0 + interval, t0 + 2·interval, ... (each time
     * the previous one plus the interval) and at the end.
     */
    private static final class Sampler {
        private final FullOrbitObserver observer;
        private final double interval;
        private final double[] y = new double[6];
        private final double[] xs = new double[3], us = new double[3];
        private double lastTime;

        Sampler(FullOrbitObserver observer, double interval) {
            this.observer = observer;
            this.interval = interval;
        }

        void begin(double t0, double[] y0) {
            lastTime = t0;
            emit(t0, y0);
        }

        /** The samples inside the last step up to tPart (s), and at tPart (state yPart) if it is the last. */
        void step(DormandPrince853 dp, double tPart, double[] yPart, boolean last) {
            double next = lastTime + interval;
            while (next <= tPart) {
                dp.interpolate(next, y);
                lastTime = next;
                emit(next, y);
                next = lastTime + interval;
            }
            if (last && lastTime != tPart) {
                lastTime = tPart;
                emit(tPart, yPart);
            }
        }

        private void emit(double t, double[] state) {
            System.arraycopy(state, 0, xs, 0, 3);
            System.arraycopy(state, 3, us, 0, 3);
            observer.observe(t, xs, us);
        }
    }

    /**
     * Watches the field's domain margin g along the orbit: at every step end and at least every
     * maxCheck (s) inside a step through the dense output; where g turns negative the crossing is
     * located to the given accuracy with a bracketing Brent solver (Commons Math), on the far side.
     */
    private static final class DomainExit {
        private final Field field;
        private final DormandPrince853 dp;
        private final double maxCheck;
        private final double convergence;
        private final BracketingNthOrderBrentSolver solver;
        private final double[] y = new double[6];
        private final UnivariateFunction margin;
        private double g0;

        DomainExit(Field field, DormandPrince853 dp, double maxCheck, double convergence) {
            this.field = field;
            this.dp = dp;
            this.maxCheck = maxCheck;
            this.convergence = convergence;
            this.solver = new BracketingNthOrderBrentSolver(convergence, 5);
            this.margin = t -> {
                dp.interpolate(t, y);
                return g(y);
            };
        }

        private double g(double[] state) {
            double m = field.domainMargin(state[0], state[1], state[2]);
            // an unbounded field reports +∞; the root finder needs finite values
            return Math.max(-Double.MAX_VALUE, Math.min(Double.MAX_VALUE, m));
        }

        void begin(double[] y0) {
            g0 = g(y0);
        }

        void accept(double[] state) {
            g0 = g(state);
        }

        /** The time (s) the orbit leaves the domain inside [t0, t1], or NaN. */
        double crossing(double t0, double t1) {
            double dt = t1 - t0;
            if (!(g0 >= 0) || Math.abs(dt) < convergence) {
                return Double.NaN;
            }
            int n = Math.max(1, (int) Math.ceil(Math.abs(dt) / maxCheck));
            double h = dt / n;
            double ta = t0;
            for (int i = 0; i < n; i++) {
                double tb = i == n - 1 ? t1 : t0 + (i + 1) * h;
                double gb = margin.value(tb);
                if (gb < 0) {
                    return solver.solve(1000, margin, ta, tb, AllowedSolution.RIGHT_SIDE);
                }
                ta = tb;
            }
            return Double.NaN;
        }
    }
}
