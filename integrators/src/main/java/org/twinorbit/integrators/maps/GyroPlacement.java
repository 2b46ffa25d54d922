package org.twinorbit.integrators.maps;

/** How {@link GyroMaps} places a particle on a guiding center's gyro-ring. */
public enum GyroPlacement {
    /** x = X + ρ, u = u∥ b + u⊥(θ): no drift velocity at all. */
    ZEROTH,
    /**
     * The default: the zeroth-order ring in the frame moving with v_E = E×B/|B|², then boosted
     * to the laboratory (the E×B velocity is zeroth order when E ~ vB).
     */
    ZEROTH_EXB,
    /**
     * {@link #ZEROTH_EXB} plus the magnetic (grad-B and curvature) drift velocity, with the
     * gyration speed reduced so that the kinetic energy in the drift frame is unchanged: adding
     * drifts at fixed μ and p∥ would change the energy at O(ε). The particle velocity is
     * u∥ b + a(θ) ê(θ) + u_d with a = −ê·u_d + sqrt((ê·u_d)² + u⊥² − u_d²), so over evenly spaced
     * phases the ensemble's mean velocity carries half of u_d (the ring is reshaped by the rest).
     */
    FIRST_ORDER_ENERGY_KEPT
}
