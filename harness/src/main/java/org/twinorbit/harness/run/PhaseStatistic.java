package org.twinorbit.harness.run;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * Which summary of a metric over the gyrophase ensemble a threshold or verdict reads (see
 * {@link Stat}). The worst phase is the cautious default; the phase mean is the model's error
 * with gyrophase-dependent start-up offsets averaged out; the rms includes their spread.
 */
public enum PhaseStatistic {
    WORST, MEAN, RMS;

    /** The lower-case name used in options and files. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The statistic with this name. @throws IllegalArgumentException listing the allowed names */
    public static PhaseStatistic ofKey(String key) {
        for (PhaseStatistic s : values()) {
            if (s.key().equals(key.trim().toLowerCase(Locale.ROOT))) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown statistic '" + key + "'; allowed: "
                + Arrays.stream(values()).map(PhaseStatistic::key).collect(Collectors.joining(", ")));
    }
}
