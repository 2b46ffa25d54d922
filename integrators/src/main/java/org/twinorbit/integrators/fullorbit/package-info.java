/**
 * Full-orbit pushers: fixed-step schemes for the Lorentz force on the state (x in m, u = γv in
 * m/s). {@link org.twinorbit.integrators.fullorbit.FullOrbitPusher} is the extension point (found
 * with {@link java.util.ServiceLoader}); {@link org.twinorbit.integrators.fullorbit.Pushers} lists
 * the built-in Boris-family and RK4 schemes.
 */
package org.twinorbit.integrators.fullorbit;
