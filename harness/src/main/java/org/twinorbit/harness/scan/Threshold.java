package org.twinorbit.harness.scan;

import org.twinorbit.harness.run.PhaseStatistic;

/**
 * ε* of one metric at one tolerance and pitch angle.
 *
 * @param metric       the metric
 * @param tolerance    the tolerance (unit of the metric)
 * @param statistic    the summary over the gyrophase ensemble compared with the tolerance
 * @param pitchDeg     pitch angle (degrees)
 * @param outcome      crossed, not reached, exceeded at start, or no data
 * @param epsStar      ε* for a crossing, NaN otherwise (never a number for the other outcomes)
 * @param energyEvStar kinetic energy (eV) at ε*, NaN when there is no ε* or the scan does not
 *                     vary the energy
 * @param chargeSign   {@link ChargeSigns#GIVEN} (0), or +1 / -1 in a scan of both charge signs
 */
public record Threshold(ScanMetric metric, double tolerance, PhaseStatistic statistic, double pitchDeg, ThresholdOutcome outcome,
                        double epsStar, double energyEvStar, int chargeSign) {

    /** A threshold of a scan of the species as given. */
    public Threshold(ScanMetric metric, double tolerance, PhaseStatistic statistic, double pitchDeg,
                     ThresholdOutcome outcome, double epsStar, double energyEvStar) {
        this(metric, tolerance, statistic, pitchDeg, outcome, epsStar, energyEvStar, ChargeSigns.GIVEN);
    }
}
