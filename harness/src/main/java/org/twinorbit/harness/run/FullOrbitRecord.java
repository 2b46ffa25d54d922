package org.twinorbit.harness.run;

import org.twinorbit.harness.metrics.EnergyMonitor;
import org.twinorbit.harness.metrics.GyroAverager;
import org.twinorbit.harness.metrics.InvariantMonitor;

/**
 * One full-orbit integration as measured by its observers.
 *
 * @param outcome     status and cost
 * @param gyro        gyration averages (μ, guiding center, v∥)
 * @param energy      energy error
 * @param invariants  drifts of the exact invariants
 * @param finalX      particle position (m) at the last sample
 * @param finalU      particle u = γv (m/s) at the last sample
 * @param finalTime   time (s) of the last sample
 */
public record FullOrbitRecord(Outcome outcome, GyroAverager gyro, EnergyMonitor energy,
                              InvariantMonitor invariants, double[] finalX, double[] finalU, double finalTime) {}
