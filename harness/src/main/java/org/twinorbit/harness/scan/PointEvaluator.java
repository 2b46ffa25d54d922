package org.twinorbit.harness.scan;

import java.util.Map;

/**
 * Measures the model error at one point of a scan. Implementations are thread-safe and
 * deterministic: the result depends on the arguments only, never on the thread that computes
 * it or on what else runs, so that a scan gives the same numbers for any thread count and after
 * a resume.
 */
@FunctionalInterface
public interface PointEvaluator {

    /**
     * @param eps      ε of the point
     * @param energyEv kinetic energy (eV)
     * @param pitchDeg pitch angle (degrees)
     * @return snake_case name -> value, in the order to report them: each metric's
     *         {@code _mean} and {@code _worst} over the gyrophase ensemble (see {@link ScanMetric})
     */
    Map<String, Double> measure(double eps, double energyEv, double pitchDeg);

    /**
     * The point for one charge sign ({@link ChargeSigns}): the species as given for
     * {@link ChargeSigns#GIVEN} and +1, its twin of charge -q for -1. An evaluator that has no
     * twin measures only the species as given.
     *
     * @throws UnsupportedOperationException for -1 when the evaluator has no twin
     */
    default Map<String, Double> measure(double eps, double energyEv, double pitchDeg, int chargeSign) {
        if (chargeSign < 0) {
            throw new UnsupportedOperationException("this evaluator measures the species as given only");
        }
        return measure(eps, energyEv, pitchDeg);
    }
}
