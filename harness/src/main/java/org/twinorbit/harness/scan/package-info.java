/**
 * Breakdown scans: the model error of the guiding-center approximation against ε = ρ0/L (or
 * 1/(Ωτ), ω/Ω for time-dependent fields), the threshold ε* per metric and tolerance, and the
 * safe-use map over the field library (docs/design.md "What is measured", "Breakdown scan").
 *
 * <p>Pieces, each with one job: {@link org.twinorbit.harness.scan.EpsilonGrid} (the ε values),
 * {@link org.twinorbit.harness.scan.EnergyScale} (ε ↔ kinetic energy),
 * {@link org.twinorbit.harness.scan.ScanField} (how each field is scanned),
 * {@link org.twinorbit.harness.scan.ScanRequest} (options checked into a scan),
 * {@link org.twinorbit.harness.scan.ModelErrorEvaluator} (one point, as a case of the harness
 * runner), {@link org.twinorbit.harness.scan.ScanRunner} and
 * {@link org.twinorbit.harness.scan.ScanCheckpoint} (points in parallel, saved as they complete,
 * resumable), {@link org.twinorbit.harness.scan.ThresholdFinder} (ε* by log-log interpolation),
 * the writers {@link org.twinorbit.harness.scan.ScanJson}, {@link org.twinorbit.harness.scan.ScanTables},
 * {@link org.twinorbit.harness.scan.ScanPlot}, and {@link org.twinorbit.harness.scan.SafeUseMap}.
 * {@link org.twinorbit.harness.scan.ScanCommand} is the {@code scan} command.
 */
package org.twinorbit.harness.scan;
