package org.twinorbit.harness.scan;

/**
 * ε* of one metric at one tolerance and pitch angle.
 *
 * @param metric       the metric
 * @param tolerance    the tolerance (unit of the metric)
 * @param pitchDeg     pitch angle (degrees)
 * @param outcome      crossed, not reached, exceeded at start, or no data
 * @param epsStar      ε* for a crossing, NaN otherwise (never a number for the other outcomes)
 * @param energyEvStar kinetic energy (eV) at ε*, NaN when there is no ε* or the scan does not
 *                     vary the energy
 */
public record Threshold(ScanMetric metric, double tolerance, double pitchDeg, ThresholdOutcome outcome,
                        double epsStar, double energyEvStar) {}
