package org.twinorbit.harness.precision;

import java.util.ArrayList;
import java.util.List;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.ReferenceSummary;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.run.RunSchedule;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.harness.run.Registry;

/**
 * Work against precision: one case run at several full-orbit steps, every chosen pusher, with
 * each pusher's errors beside its cost. The pusher developer's main figure.
 */
public final class WorkPrecision {

    /** Steps per gyroperiod swept when none are given: six doublings. */
    public static final List<Integer> DEFAULT_STEPS = List.of(8, 16, 32, 64, 128, 256);
    /** Timing repeats per point; the fastest counts (the others carry warm-up and noise). */
    static final int TIMING_REPEATS = 3;

    /**
     * One pusher at one step.
     *
     * @param pusher            its name
     * @param stepsPerGyro      steps per initial gyroperiod
     * @param steps             steps per orbit
     * @param fieldEvaluations  field evaluations per orbit
     * @param wallSecondsPerOrbit the fastest of {@value #TIMING_REPEATS} timed pushes of phase 0 (s)
     * @param phaseError        |worst| gyrophase error (relative)
     * @param positionError     |worst| position error (ρ0 per bounce period)
     * @param energyError       worst |W − W0|/K0
     * @param muChange          worst relative change of the gyro-averaged μ
     */
    public record Point(String pusher, int stepsPerGyro, long steps, double fieldEvaluations, double wallSecondsPerOrbit,
                        double phaseError, double positionError, double energyError, double muChange) {}

    /**
     * @param points         every pusher at every step, by step then pusher
     * @param referenceError the full-orbit reference's self-estimated position error (ρ0), the floor
     *                       below which no error is measured
     * @param caseName       the case
     */
    public record Result(List<Point> points, double referenceError, String caseName) {}

    private WorkPrecision() {}

    /** Runs case c (its pushers) at each number of steps per gyroperiod. */
    public static Result sweep(Case c, List<Integer> stepsPerGyro, int threads) {
        List<Point> points = new ArrayList<>();
        double floor = 0;
        for (int spg : stepsPerGyro) {
            Case at = c.withStepsPerGyro(spg);
            CaseResult r = new CaseRunner(threads, true).run(at);
            RunSchedule s = CaseRunner.schedule(at);
            for (ReferenceSummary ref : r.references()) {
                if (ref.model().equals("full-orbit")) {
                    floor = Math.max(floor, ref.selfErrorRho());
                }
            }
            for (ResultRow row : r.rows()) {
                if (!row.model().equals("full-orbit")) {
                    continue;
                }
                double wall = time(Registry.pusher(row.integrator()), s);
                points.add(new Point(row.integrator(), spg, Math.round(row.steps()), row.fieldEvaluations(), wall,
                        Math.abs(row.metric("phase_error").worst()), Math.abs(row.metric("position_error_rho").worst()),
                        Math.abs(row.metric("energy_error").worst()), Math.abs(row.metric("mu_change").worst())));
            }
        }
        return new Result(points, floor, c.name());
    }

    /** The fastest of a few bare pushes of phase 0 over the whole run (s): no observers, no references. */
    private static double time(FullOrbitPusher p, RunSchedule s) {
        double best = Double.POSITIVE_INFINITY;
        for (int k = 0; k < TIMING_REPEATS; k++) {
            long t0 = System.nanoTime();
            FullOrbitStepper st = p.stepper(s.resolved().field(), s.resolved().species(), s.dt());
            st.start(0, s.x0()[0].clone(), s.u0()[0].clone());
            for (long i = 0; i < s.steps() && st.step(); i++) {
                // the loop is the work
            }
            best = Math.min(best, (System.nanoTime() - t0) * 1e-9);
        }
        return best;
    }
}
