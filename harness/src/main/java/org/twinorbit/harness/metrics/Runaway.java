package org.twinorbit.harness.metrics;

/**
 * How far an integrator's orbit strays from the reference's along the run, in every field,
 * time-dependent ones included (where the energy itself is not conserved and cannot be compared
 * with its start): the largest relative difference, at the same time, of the gyration-averaged
 * μ (full orbits) and of the guiding center's v∥ over the speed. A scheme that still tracks the
 * orbit stays far below 1; a blow-up, or an energy that runs away, reaches it.
 */
public final class Runaway {

    private Runaway() {}

    /**
     * @param g     the integrator's gyration averages
     * @param ref   the reference's, over the same span
     * @param speed the particle's initial speed (m/s)
     * @return max over the integrator's gyrations of max(|⟨μ⟩ − ⟨μ⟩_ref|/⟨μ⟩_ref,0, |⟨v∥⟩ − ⟨v∥⟩_ref|/v),
     *         the reference interpolated linearly to each gyration's mid-time; NaN without
     *         gyrations on both
     */
    public static double fullOrbit(GyroAverager g, GyroAverager ref, double speed) {
        if (g.gyrations() < 1 || ref.gyrations() < 2 || !(ref.mu(0) > 0 || speed > 0)) {
            return Double.NaN;
        }
        Track c = g.centers();
        Track rc = ref.centers();
        double mu0 = ref.mu(0);
        double worst = 0;
        int j = 1;
        for (int k = 0; k < g.gyrations(); k++) {
            double t = c.time(k);
            while (j < ref.gyrations() - 1 && rc.time(j) < t) {
                j++;
            }
            double f = clamp((t - rc.time(j - 1)) / (rc.time(j) - rc.time(j - 1)));
            double muRef = ref.mu(j - 1) + f * (ref.mu(j) - ref.mu(j - 1));
            double vRef = rc.vParallel(j - 1) + f * (rc.vParallel(j) - rc.vParallel(j - 1));
            double dMu = mu0 > 0 ? Math.abs(g.mu(k) - muRef) / mu0 : 0;
            double dV = speed > 0 ? Math.abs(c.vParallel(k) - vRef) / speed : 0;
            // a state that is no longer a number has run away as far as it can
            worst = Math.max(worst, Double.isNaN(dMu + dV) ? Double.POSITIVE_INFINITY : Math.max(dMu, dV));
        }
        return worst;
    }

    /**
     * @param tr    the integrator's guiding-center track
     * @param ref   the reference's
     * @param speed the particle's initial speed (m/s)
     * @return max over the integrator's samples of |v∥ − v∥,ref|/v at the same time; NaN when
     *         either track is too short
     */
    public static double guidingCenter(Track tr, Track ref, double speed) {
        if (tr.size() < 1 || ref.size() < 2 || !(speed > 0)) {
            return Double.NaN;
        }
        double worst = 0;
        int j = 1;
        for (int i = 0; i < tr.size(); i++) {
            double t = tr.time(i);
            while (j < ref.size() - 1 && ref.time(j) < t) {
                j++;
            }
            double f = clamp((t - ref.time(j - 1)) / (ref.time(j) - ref.time(j - 1)));
            double vRef = ref.vParallel(j - 1) + f * (ref.vParallel(j) - ref.vParallel(j - 1));
            double d = Math.abs(tr.vParallel(i) - vRef) / speed;
            worst = Math.max(worst, Double.isNaN(d) ? Double.POSITIVE_INFINITY : d);
        }
        return worst;
    }

    private static double clamp(double f) {
        return Double.isFinite(f) ? Math.max(0, Math.min(1, f)) : 0;
    }
}
