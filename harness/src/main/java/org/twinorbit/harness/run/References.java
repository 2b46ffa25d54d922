package org.twinorbit.harness.run;

import org.twinorbit.integrators.reference.FullOrbitReference;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import org.twinorbit.fields.Field;
import org.twinorbit.harness.metrics.GuidingCenterRecorder;
import org.twinorbit.shared.Species;

/**
 * The two references driven with the metric observers attached: {@link FullOrbitReference}
 * and {@link GuidingCenterReference} (both Dormand–Prince 8(5,3), the full orbit's our own
 * allocation-free one that reproduces Commons Math's, the guiding center's Commons Math's, with
 * dense output sampled at fixed times).
 */
public final class References {

    private References() {}

    /** Name and source of the full-orbit reference, for reports. */
    public static String fullOrbitMethod() {
        return "Dormand-Prince 8(5,3) adaptive (Dormand & Prince 1980; step control and dense output as Commons Math's) "
                + "on the Lorentz equations, dense output";
    }

    /** Name and source of the guiding-center reference, for reports. */
    public static String guidingCenterMethod() {
        return GuidingCenterReference.description();
    }

    /** The tolerance of a self-estimate run: 100× tighter, no tighter than the reference allows. */
    static double tighter(double rtol) {
        return Math.max(rtol / 100.0, FullOrbitReference.TIGHTEST_RELATIVE_TOLERANCE);
    }

    /**
     * Integrates one particle from t = 0 to tEnd, sampled at n + 1 evenly spaced times.
     *
     * @param tEnd end time (s) @param rtol relative tolerance
     * @param deadband |v∥| (m/s) treated as zero when looking for mirror points
     */
    public static FullOrbitRecord fullOrbit(Field field, Species s, double[] x0, double[] u0, double tEnd,
                                            long n, double rtol, int stride, double deadband) {
        long t0 = System.nanoTime();
        Orbits.FullOrbitWatch watch = new Orbits.FullOrbitWatch(field, s, stride, deadband);
        FullOrbitReference.Result r = new FullOrbitReference(field, s, rtol)
                .run(0.0, x0.clone(), u0.clone(), tEnd, tEnd / n, watch);
        Outcome o = new Outcome(r.status(), r.endTime(), -1, r.evaluations(), System.nanoTime() - t0);
        return new FullOrbitRecord(o, watch.gyro, watch.energy, watch.invariants, r.position().toArray(),
                r.velocity().toArray(), r.endTime());
    }

    /**
     * Integrates one guiding center from t = 0 to tEnd, sampled at n + 1 evenly spaced times.
     *
     * @param mu magnetic moment (J/T) @param tEnd end time (s) @param rtol relative tolerance
     * @param mirrorPoints stop at this many mirror points (0: run to tEnd)
     */
    public static GuidingCenterRecord guidingCenter(Field field, Species s, double mu, double[] gc0, double pPar0,
                                                    double tEnd, long n, double rtol, int stride, double deadband,
                                                    int mirrorPoints) {
        return guidingCenter(field, s, 0.0, mu, gc0, pPar0, tEnd, n, rtol, stride, deadband, mirrorPoints);
    }

    /**
     * The same from time t0 (s) to tEnd (s), sampled at n + 1 evenly spaced times: a guiding
     * center started from a gyration average, at that gyration's mid-time.
     */
    public static GuidingCenterRecord guidingCenter(Field field, Species s, double t0, double mu, double[] gc0,
                                                    double pPar0, double tEnd, long n, double rtol, int stride,
                                                    double deadband, int mirrorPoints) {
        long clock = System.nanoTime();
        GuidingCenterRecorder rec = new GuidingCenterRecorder(field, s, mu, stride, deadband);
        GuidingCenterReference ref = new GuidingCenterReference(field, s, mu).relativeTolerance(rtol);
        if (mirrorPoints > 0) {
            ref.stopAfterMirrorPoints(mirrorPoints);
        }
        GuidingCenterResult r = ref.run(t0, gc0.clone(), pPar0, tEnd, (tEnd - t0) / n, rec);
        Outcome o = new Outcome(r.status(), r.endTime(), -1, r.fieldEvaluations(), System.nanoTime() - clock);
        return new GuidingCenterRecord(o, rec, r.position().toArray(), r.endTime(), r.mirrorPoints());
    }
}
