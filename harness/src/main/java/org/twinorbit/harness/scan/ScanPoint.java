package org.twinorbit.harness.scan;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.twinorbit.harness.run.PhaseStatistic;

/**
 * The measured model error at one ε and one pitch angle.
 *
 * @param eps      ε of the point (ρ0/L, or the time-scale ratio of a time-dependent field)
 * @param energyEv kinetic energy (eV)
 * @param pitchDeg pitch angle (degrees)
 * @param values   snake_case name -> value: each metric's {@code _mean}, {@code _rms} and
 *                 {@code _worst} (magnitude) over the gyrophase ensemble, plus
 *                 quantities particular to the field (e.g. {@code kappa}); NaN where not measured
 * @param chargeSign {@link ChargeSigns#GIVEN} (0) in a scan of the species as given; +1 or -1 in a
 *                 scan of both charge signs: the species as given, or its twin of charge -q
 */
public record ScanPoint(double eps, double energyEv, double pitchDeg, Map<String, Double> values, int chargeSign) {

    public ScanPoint {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /** A point of a scan of the species as given (no charge sign scanned). */
    public ScanPoint(double eps, double energyEv, double pitchDeg, Map<String, Double> values) {
        this(eps, energyEv, pitchDeg, values, ChargeSigns.GIVEN);
    }

    /** The value under {@code key}, NaN when absent. */
    public double value(String key) {
        Double v = values.get(key);
        return v == null ? Double.NaN : v;
    }

    /** The worst case of a metric over the ensemble, NaN when not measured. */
    public double worst(ScanMetric m) {
        return value(m.worstKey());
    }

    /** The magnitude of a metric's summary over the ensemble, NaN when not measured. */
    public double magnitude(ScanMetric m, PhaseStatistic statistic) {
        return Math.abs(value(m.key(statistic)));
    }
}
