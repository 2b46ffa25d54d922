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
 */
public record Threshold(ScanMetric metric, double tolerance, PhaseStatistic statistic, double pitchDeg, ThresholdOutcome outcome,
                        double epsStar, double energyEvStar) {}
