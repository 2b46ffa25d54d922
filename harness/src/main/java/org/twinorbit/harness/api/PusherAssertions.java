package org.twinorbit.harness.api;

import java.util.Locale;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.verdict.Finding;

/**
 * Assertions on a {@link PusherTrial} for unit tests (JUnit 5 reports an {@link AssertionError}
 * as a failure): each names the case, the pusher, the value and the bound.
 */
public final class PusherAssertions {

    private PusherAssertions() {}

    /** The worst phase's |W − W0|/K0 is at most {@code bound}. */
    public static void assertEnergyErrorBelow(PusherTrial t, double bound) {
        assertBelow(t, "energy_error", Math.abs(t.row().metric("energy_error").worst()), bound);
    }

    /** The worst phase's |phase error| (gyrofrequency / reference − 1) is at most {@code bound}. */
    public static void assertPhaseErrorBelow(PusherTrial t, double bound) {
        assertBelow(t, "phase_error", Math.abs(t.row().metric("phase_error").worst()), bound);
    }

    /** The measured convergence order lies within {@code tolerance} of {@code expected}. */
    public static void assertOrder(PusherTrial t, double expected, double tolerance) {
        double o = t.row().order();
        if (!(Math.abs(o - expected) <= tolerance)) {
            throw new AssertionError(String.format(Locale.ROOT, "%s in %s: measured order %.3f, expected %.3f ± %.3f",
                    t.pusher(), t.result().resolved().spec().name(), o, expected, tolerance));
        }
    }

    /** No verdict failed (see {@code twinorbit run}'s verdicts). */
    public static void assertVerdictsPass(PusherTrial t) {
        if (t.verdicts().failed()) {
            StringBuilder sb = new StringBuilder(t.pusher() + " in " + t.result().resolved().spec().name() + " failed:");
            for (Finding f : t.verdicts().findings()) {
                sb.append("\n  ").append(f.describe());
            }
            throw new AssertionError(sb.toString());
        }
    }

    private static void assertBelow(PusherTrial t, String metric, double value, double bound) {
        ResultRow r = t.row();
        if (!(value <= bound)) {
            throw new AssertionError(String.format(Locale.ROOT, "%s in %s: %s %.3e exceeds %.3e (status %s)", t.pusher(),
                    t.result().resolved().spec().name(), metric, value, bound, r.status()));
        }
    }
}
