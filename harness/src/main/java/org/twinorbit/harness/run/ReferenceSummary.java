package org.twinorbit.harness.run;

/**
 * A reference integration and its self-estimated error: the same run repeated at a 100×
 * tighter tolerance (docs/design.md "Integrators"), compared at the end time.
 *
 * @param model             {@code full-orbit} or {@code guiding-center}
 * @param method            the integrator and its source
 * @param rtol              relative tolerance used
 * @param selfErrorRho      |x − x_tight| / ρ0 at the end (particle position, or guiding center)
 * @param energyError       its own max |W − W0|/K0 (mean over the ensemble)
 * @param status            most severe status over the ensemble
 * @param steps             accepted steps per orbit (mean)
 * @param fieldEvaluations  field evaluations per orbit (mean)
 * @param wallSeconds       wall time summed over the ensemble (s); never in JSON or CSV
 */
public record ReferenceSummary(String model, String method, double rtol, double selfErrorRho,
                               double energyError, String status, double steps, double fieldEvaluations,
                               double wallSeconds) {}
