package org.twinorbit.harness.metrics;

/**
 * The μ jump, the irreversible part of the change of the gyro-averaged μ: its largest relative
 * change between <em>equivalent points of the slow motion</em>, where the reversible ripple of μ
 * is the same, so what remains is what the orbit kept. Which points are equivalent depends on the
 * orbit, and the result says which ones it used ({@link From}); the choice, in order:
 * <ol>
 *   <li>a run that stops after a sheet crossing ({@code crossings}): the first whole gyration
 *       against the first whole gyration that starts after the exit (both far from the sheet);</li>
 *   <li>a guiding center that mirrors at least twice in the same direction: ⟨μ⟩ at each such
 *       mirror point against the first one;</li>
 *   <li>otherwise the first against the last whole gyration.</li>
 * </ol>
 *
 * @param value relative change |Δ⟨μ⟩|/⟨μ⟩, NaN when the points do not exist
 * @param from  the pair of points compared
 */
public record MuJump(double value, From from) {

    /** The reference points of a μ jump, with the words used in reports. */
    public enum From {
        SHEET_EXIT("sheet-exit"), MIRROR_POINTS("mirror-points"), FIRST_LAST_GYRATION("first-last-gyration");

        private final String label;

        From(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /**
     * @param g        the gyration averages of one orbit
     * @param exitTime time (s) the guiding center left the sheet region in a crossing run; NaN
     *                 for any other run
     */
    public static MuJump of(GyroAverager g, double exitTime) {
        int n = g.gyrations();
        if (!Double.isNaN(exitTime)) {
            if (n < 2 || !(g.mu(0) > 0)) {
                return new MuJump(Double.NaN, From.SHEET_EXIT);
            }
            // gyration k starts where gyration k-1 ended
            for (int k = 1; k < n; k++) {
                if (g.end(k - 1) >= exitTime) {
                    return new MuJump(Math.abs(g.mu(k) - g.mu(0)) / g.mu(0), From.SHEET_EXIT);
                }
            }
            return new MuJump(Double.NaN, From.SHEET_EXIT);
        }
        double[] events = g.centers().upwardMirrorTimes();
        if (events.length >= 2 && n >= 2 && g.mu(0) > 0) {
            double ref = OrbitMetrics.muAt(g, events[0]);
            double max = 0;
            for (int i = 1; i < events.length; i++) {
                max = Math.max(max, Math.abs(OrbitMetrics.muAt(g, events[i]) - ref) / ref);
            }
            return new MuJump(max, From.MIRROR_POINTS);
        }
        if (n < 2 || !(g.mu(0) > 0)) {
            return new MuJump(Double.NaN, From.FIRST_LAST_GYRATION);
        }
        return new MuJump(Math.abs(g.mu(n - 1) - g.mu(0)) / g.mu(0), From.FIRST_LAST_GYRATION);
    }
}
