package org.twinorbit.integrators.maps;

import org.twinorbit.shared.Vec3;

/**
 * A particle placed on a guiding center's gyro-ring.
 *
 * @param position  x (m)
 * @param u         u = γv (m/s)
 * @param gyrophase the gyrophase θ (rad) it was placed at
 */
public record GyroParticle(Vec3 position, Vec3 u, double gyrophase) {}
