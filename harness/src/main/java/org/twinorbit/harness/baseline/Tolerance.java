package org.twinorbit.harness.baseline;

/**
 * How far a value may move before it counts as changed: by more than
 * max(relative × |baseline|, absolute).
 *
 * @param relative fraction of the baseline value, >= 0
 * @param absolute floor in the metric's unit, >= 0, so that round-off-level values never fail
 */
public record Tolerance(double relative, double absolute) {

    public Tolerance {
        if (!(relative >= 0 && Double.isFinite(relative)) || !(absolute >= 0 && Double.isFinite(absolute))) {
            throw new IllegalArgumentException("a tolerance must be finite and >= 0, got relative " + relative
                    + ", absolute " + absolute);
        }
    }

    /** The allowed difference (unit of the metric) around {@code baseline}. */
    public double allowed(double baseline) {
        return Math.max(relative * Math.abs(baseline), absolute);
    }

    /** "rel 1e-09, abs 1e-13" for reports. */
    public String describe() {
        return "rel " + org.twinorbit.harness.Format.number(relative) + ", abs "
                + org.twinorbit.harness.Format.number(absolute);
    }
}
