package org.twinorbit.harness.run;

/**
 * The facts a row's verdicts are read from ({@link org.twinorbit.harness.verdict.Verdicts}),
 * beside its metrics.
 *
 * @param runaway          largest stray from the reference along the run over the ensemble
 *                         ({@link org.twinorbit.harness.metrics.Runaway}); NaN when not measured
 * @param energyFirstHalf  largest |W − W0|/K0 in the first half of the run, in the phase whose
 *                         second half grew most; NaN where the energy is not conserved
 * @param energySecondHalf the same phase's largest error in the second half
 * @param localOrders      orders between successive steps of the convergence sweep, over the
 *                         points that are neither reference- nor round-off-limited; empty when
 *                         fewer than three such points
 * @param declaredOrder    the order the integrator declares; 0 for the model row
 * @param properties       the properties it declares ("time-reversible", "relativistic", ...)
 * @param failure          what the integrator threw in its first failed run; null when none failed
 */
public record Diagnostics(double runaway, double energyFirstHalf, double energySecondHalf, double[] localOrders,
                          int declaredOrder, java.util.Set<String> properties, String failure) {

    /** No facts (the model row). */
    public static final Diagnostics NONE = new Diagnostics(Double.NaN, Double.NaN, Double.NaN, new double[0], 0,
            java.util.Set.of(), null);
}
