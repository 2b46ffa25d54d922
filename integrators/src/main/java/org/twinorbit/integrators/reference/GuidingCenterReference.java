package org.twinorbit.integrators.reference;

import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.guidingcenter.GuidingCenterEquations;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.FixedStepHandler;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.apache.commons.math3.ode.sampling.StepNormalizer;
import org.apache.commons.math3.ode.sampling.StepNormalizerBounds;
import org.apache.commons.math3.ode.sampling.StepNormalizerMode;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The guiding-center reference: the adaptive Dormand–Prince 8(5,3) method (Dormand &amp; Prince,
 * J. Comput. Appl. Math. 6, 19, 1980; Hairer, Nørsett &amp; Wanner, Solving ODEs I, 1993) of
 * Commons Math at tight tolerance on the first-order guiding-center equations
 * ({@link GuidingCenterEquations}), with dense output sampled at a fixed interval for an
 * observer and event detection (Commons Math, Brent root finding on a switching function) for
 * <ul>
 *   <li>mirror points, p∥ = 0 (recorded with time and position; the run goes on, or stops after
 *       a requested number of them),</li>
 *   <li>leaving the domain, {@link Field#domainMargin} = 0 ({@link OrbitStatus#LOST}),</li>
 *   <li>B*∥ = 0, where the model breaks down ({@link OrbitStatus#MODEL_FAILURE}).</li>
 * </ul>
 * Configure with the fluent setters, then {@link #run}. Not thread-safe; one per thread.
 */
public final class GuidingCenterReference {

    /** Stable name used in tables. */
    public static final String NAME = "gc-dp853";
    /** Default relative tolerance: tight enough that energy is kept to ~1e-10 over long runs. */
    public static final double DEFAULT_RELATIVE_TOLERANCE = 1e-11;

    private final GuidingCenterEquations eq;
    private final Field field;
    private double rtol = DEFAULT_RELATIVE_TOLERANCE;
    private int stopAfterMirrorPoints = Integer.MAX_VALUE;

    /** @param mu magnetic moment p⊥²/(2m|B|) (J/T) */
    public GuidingCenterReference(Field field, Species species, double mu) {
        this.eq = new GuidingCenterEquations(field, species, mu);
        this.field = field;
    }

    /** One line: the method and its source. */
    public static String description() {
        return "Dormand-Prince 8(5,3) adaptive (Commons Math; Dormand & Prince 1980) on the first-order"
                + " guiding-center equations, with mirror-point and domain events";
    }

    /**
     * The tolerance rtol, in (0, 1e-3]: the position is held to rtol·ρ0 (m) absolute, p∥ to
     * rtol·p (kg m/s) absolute plus rtol relative, with ρ0 and p from the initial state.
     */
    public GuidingCenterReference relativeTolerance(double rtol) {
        if (!(rtol > 0 && rtol <= 1e-3)) {
            throw new IllegalArgumentException("relative tolerance must be in (0, 1e-3], got " + rtol);
        }
        this.rtol = rtol;
        return this;
    }

    /** Stops the run (status OK) at the n-th mirror point, n ≥ 1. */
    public GuidingCenterReference stopAfterMirrorPoints(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("number of mirror points must be >= 1, got " + n);
        }
        this.stopAfterMirrorPoints = n;
        return this;
    }

    /** The equations integrated (for energy and B*∥ diagnostics). */
    public GuidingCenterEquations equations() {
        return eq;
    }

    /**
     * Integrates from t0 to tEnd (s).
     *
     * @param gc0            initial guiding-center position (m)
     * @param pPar0          initial p∥ (kg m/s)
     * @param sampleInterval spacing (s) of the samples sent to the observer, starting at t0 and
     *                       including the final state; ≤ 0 or a null observer for none
     */
    public GuidingCenterResult run(double t0, double[] gc0, double pPar0, double tEnd,
                                   double sampleInterval, GuidingCenterObserver observer) {
        if (!(tEnd > t0)) {
            throw new IllegalArgumentException("end time must be after the start time, got " + tEnd + " <= " + t0);
        }
        long evalsAtStart = eq.fieldEvaluations();
        double[] y = {gc0[0], gc0[1], gc0[2], pPar0};
        List<GuidingCenterResult.MirrorPoint> mirrors = new ArrayList<>();
        if (!field.inDomain(y[0], y[1], y[2])) {
            return result(OrbitStatus.LOST, t0, y, evalsAtStart, mirrors);
        }
        if (!(eq.parallelBStar(t0, y) > 0)) {
            return result(OrbitStatus.MODEL_FAILURE, t0, y, evalsAtStart, mirrors);
        }
        double span = tEnd - t0;
        double[] atol = absoluteTolerances(t0, y);
        double[] rtolV = relativeTolerances();
        DormandPrince853Integrator dp = new DormandPrince853Integrator(1e-14 * span, span, atol, rtolV);

        OrbitStatus[] status = {OrbitStatus.OK};
        double[] last = y.clone();
        double[] lastT = {t0};
        dp.addStepHandler(new StepHandler() {
            @Override public void init(double t, double[] y0, double t1) {}
            @Override public void handleStep(StepInterpolator in, boolean isLast) {
                lastT[0] = in.getCurrentTime();
                in.setInterpolatedTime(lastT[0]);
                System.arraycopy(in.getInterpolatedState(), 0, last, 0, 4);
            }
        });
        if (observer != null && sampleInterval > 0) {
            double[] xBuf = new double[3];
            FixedStepHandler sampler = new FixedStepHandler() {
                @Override public void init(double t, double[] y0, double t1) {}
                @Override public void handleStep(double t, double[] ys, double[] yDot, boolean isLast) {
                    xBuf[0] = ys[0];
                    xBuf[1] = ys[1];
                    xBuf[2] = ys[2];
                    observer.observe(t, xBuf, ys[3]);
                }
            };
            dp.addStepHandler(new StepNormalizer(sampleInterval, sampler, StepNormalizerMode.MULTIPLES,
                    StepNormalizerBounds.BOTH));
        }
        // switching functions are made dimensionless: the root solver also stops once |g| falls
        // below 1e-15, which raw values in kg m/s or T would do at once
        double pScale = atol[3] / rtol;
        double lengthScale = atol[0] / rtol;
        double maxCheck = span / 1000;
        double convergence = Math.max(1e-15 * Math.abs(tEnd), 1e-13 * span);
        int maxIterations = 200;
        FieldSample mirrorSample = new FieldSample();
        dp.addEventHandler(new Detector() {
            @Override public double g(double t, double[] s) {
                return s[3] / pScale;
            }
            @Override public Action eventOccurred(double t, double[] s, boolean increasing) {
                field.evaluate(t, s[0], s[1], s[2], mirrorSample);
                mirrors.add(new GuidingCenterResult.MirrorPoint(t, new Vec3(s[0], s[1], s[2]), mirrorSample.bMag()));
                return mirrors.size() >= stopAfterMirrorPoints ? Action.STOP : Action.CONTINUE;
            }
        }, maxCheck, convergence, maxIterations);
        dp.addEventHandler(new Detector() {
            @Override public double g(double t, double[] s) {
                double margin = field.domainMargin(s[0], s[1], s[2]);
                return Math.max(-Double.MAX_VALUE, Math.min(Double.MAX_VALUE, margin / lengthScale));
            }
            @Override public Action eventOccurred(double t, double[] s, boolean increasing) {
                if (increasing) {
                    return Action.CONTINUE;
                }
                status[0] = OrbitStatus.LOST;
                return Action.STOP;
            }
        }, maxCheck, convergence, maxIterations);
        dp.addEventHandler(new Detector() {
            @Override public double g(double t, double[] s) {
                return eq.parallelBStarRatio(t, s);
            }
            @Override public Action eventOccurred(double t, double[] s, boolean increasing) {
                if (increasing) {
                    return Action.CONTINUE;
                }
                status[0] = OrbitStatus.MODEL_FAILURE;
                return Action.STOP;
            }
        }, maxCheck, convergence, maxIterations);

        FirstOrderDifferentialEquations ode = new FirstOrderDifferentialEquations() {
            @Override public int getDimension() { return 4; }
            @Override public void computeDerivatives(double t, double[] s, double[] sDot) {
                eq.derivatives(t, s, sDot);
            }
        };
        double[] end = new double[4];
        double tStop;
        try {
            tStop = dp.integrate(ode, t0, y, tEnd, end);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            // step size underflow, too many evaluations or an unbracketed event: a singularity
            // the events did not catch
            boolean failed = !(eq.parallelBStar(lastT[0], last) > 0.0);
            return result(failed ? OrbitStatus.MODEL_FAILURE : OrbitStatus.UNSTABLE, lastT[0], last,
                    evalsAtStart, mirrors);
        }
        boolean finite = true;
        for (double v : end) {
            finite &= Double.isFinite(v);
        }
        if (!finite) {
            return result(OrbitStatus.UNSTABLE, lastT[0], last, evalsAtStart, mirrors);
        }
        return result(status[0], tStop, end, evalsAtStart, mirrors);
    }

    /**
     * Absolute tolerances: rtol·ρ0 (m) on the position, ρ0 = p/(|q|B) at the start, and rtol·p
     * (kg m/s) on p∥. The position has no relative part (see {@link #relativeTolerances}): the
     * distance from the origin is no scale of the orbit, and an orbit at |X| ≫ ρ0 (a torus at
     * R0, a dipole at L planet radii) would otherwise lose its drift in the error of the much
     * faster parallel motion. Without motion or without B, ρ0 falls back to the field's length,
     * or 1 m.
     */
    private double[] absoluteTolerances(double t0, double[] y) {
        FieldSample s = new FieldSample();
        field.evaluate(t0, y[0], y[1], y[2], s);
        double m = eq.species().mass();
        double p = Math.sqrt(y[3] * y[3] + 2.0 * m * eq.mu() * s.bMag());
        double rho = p / (Math.abs(eq.species().charge()) * s.bMag());
        double length = rho > 0 && Double.isFinite(rho) ? rho
                : field.length() > 0 && Double.isFinite(field.length()) ? field.length() : 1.0;
        double pScale = p > 0 ? p : eq.species().mass() * 1.0;
        return new double[] {rtol * length, rtol * length, rtol * length, rtol * pScale};
    }

    /** Relative tolerances: none on the position (absolute only), rtol on p∥. */
    private double[] relativeTolerances() {
        return new double[] {0.0, 0.0, 0.0, rtol};
    }

    private GuidingCenterResult result(OrbitStatus status, double t, double[] y, long evalsAtStart,
                                       List<GuidingCenterResult.MirrorPoint> mirrors) {
        return new GuidingCenterResult(status, t, new Vec3(y[0], y[1], y[2]), y[3],
                eq.fieldEvaluations() - evalsAtStart, mirrors);
    }

    /** An event detector that needs no initialisation or state reset. */
    private abstract static class Detector implements EventHandler {
        @Override public void init(double t0, double[] y0, double t) {}
        @Override public void resetState(double t, double[] y) {}
    }
}
