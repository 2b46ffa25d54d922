package org.twinorbit.integrators.guidingcenter;

import org.twinorbit.integrators.maps.GyroMaps;
import org.twinorbit.shared.Vec3;

/**
 * A guiding center with its gyrophase, as produced by {@link GyroMaps}.
 *
 * @param position         guiding-center position X (m)
 * @param parallelMomentum p∥ = m u·b (kg m/s)
 * @param mu               magnetic moment p⊥²/(2m|B|) (J/T)
 * @param gyrophase        gyrophase θ (rad), convention in {@link GyroMaps}
 */
public record GuidingCenterState(Vec3 position, double parallelMomentum, double mu, double gyrophase) {

    /** The same guiding center at another gyrophase (rad). */
    public GuidingCenterState withGyrophase(double theta) {
        return new GuidingCenterState(position, parallelMomentum, mu, theta);
    }
}
