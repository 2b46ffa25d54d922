/**
 * The two models of charged-particle motion and what connects them, one package per concept:
 * {@link org.twinorbit.integrators.fullorbit} (Lorentz-force pushers on (x, u = γv)),
 * {@link org.twinorbit.integrators.guidingcenter} (the gyro-averaged equations in (X, p∥, μ) and
 * their fixed-step integrators), {@link org.twinorbit.integrators.reference} (adaptive
 * Dormand–Prince references for both models) and {@link org.twinorbit.integrators.maps} (the
 * particle ↔ guiding-center maps that start one model from the other). {@link OrbitStatus} is
 * shared by all of them.
 */
package org.twinorbit.integrators;
