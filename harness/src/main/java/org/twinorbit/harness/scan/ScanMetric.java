package org.twinorbit.harness.scan;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import org.twinorbit.harness.run.PhaseStatistic;

/**
 * The model errors a breakdown scan measures at every ε (docs/design.md "What is measured"), each the
 * guiding-center reference against the gyro-averaged full-orbit reference, with the default
 * tolerance at which its ε* is found.
 */
public enum ScanMetric {
    /** Irreversible change of the gyro-averaged μ, relative; the μ breakdown is found on this one. */
    MU_JUMP("mu_jump", "irreversible change of gyro-averaged mu (relative)", 0.01),
    /** Largest change of the gyro-averaged μ, reversible ripple included; thresholded only when asked. */
    MU_CHANGE("mu_change", "largest change of gyro-averaged mu, ripple included (relative)", Double.NaN),
    /** Mean perpendicular drift of the guiding center against the full orbit's, relative, along the drift. */
    DRIFT_ERROR("drift_error", "perpendicular drift velocity error along the drift (relative)", 0.05),
    /** Guiding-center position at the end against the full orbit's, in initial gyroradii per bounce period. */
    POSITION_ERROR("position_error_rho", "end position error per bounce period (units of rho0)", 1.0),
    /** Bounce period of trapped orbits against the full orbit's, relative. */
    BOUNCE_ERROR("bounce_period_error", "bounce period error of trapped orbits (relative)", 0.01),
    /** Mean |B| at the mirror points against the full orbit's, relative; thresholded only when asked. */
    MIRROR_FIELD_ERROR("mirror_field_error", "field strength at the mirror points (relative)", Double.NaN),
    /**
     * Fraction of the ensemble whose fate differs between the models (trapped in one, lost in the
     * other): a breakdown of its own, so any difference at all exceeds the default tolerance 0.
     */
    CLASS_CHANGE("class_change", "fraction of orbits trapped in one model and lost in the other", 0.0);

    private final String key;
    private final String description;
    private final double defaultTolerance;

    ScanMetric(String key, String description, double defaultTolerance) {
        this.key = key;
        this.description = description;
        this.defaultTolerance = defaultTolerance;
    }

    /** The snake_case name used in JSON, CSV and options. */
    public String key() {
        return key;
    }

    public String description() {
        return description;
    }

    /** The default tolerance; NaN for a metric thresholded only when a tolerance is given. */
    public double defaultTolerance() {
        return defaultTolerance;
    }

    /** True when a threshold ε* is found for this metric by default. */
    public boolean thresholded() {
        return !Double.isNaN(defaultTolerance);
    }

    /** The JSON/CSV key of the mean over the gyrophase ensemble. */
    public String meanKey() {
        return key + "_mean";
    }

    /** The JSON/CSV key of the rms over the gyrophase ensemble. */
    public String rmsKey() {
        return key + "_rms";
    }

    /** The JSON/CSV key of the worst case (largest magnitude) over the gyrophase ensemble. */
    public String worstKey() {
        return key + "_worst";
    }

    /** The JSON/CSV key of a summary over the gyrophase ensemble. */
    public String key(PhaseStatistic statistic) {
        return switch (statistic) {
            case WORST -> worstKey();
            case MEAN -> meanKey();
            case RMS -> rmsKey();
        };
    }

    /** True for a point value that summarises a metric over the ensemble ({@code <metric>_mean/_rms/_worst}). */
    static boolean isMetricKey(String pointKey) {
        for (ScanMetric m : values()) {
            if (pointKey.equals(m.meanKey()) || pointKey.equals(m.rmsKey()) || pointKey.equals(m.worstKey())) {
                return true;
            }
        }
        return false;
    }

    /** The metric with this key. @throws IllegalArgumentException listing the allowed keys */
    public static ScanMetric ofKey(String key) {
        String k = key.trim().toLowerCase(Locale.ROOT);
        for (ScanMetric m : values()) {
            if (m.key.equals(k)) {
                return m;
            }
        }
        throw new IllegalArgumentException("unknown metric '" + key + "'; allowed: "
                + Arrays.stream(values()).map(ScanMetric::key).collect(Collectors.joining(", ")));
    }
}
