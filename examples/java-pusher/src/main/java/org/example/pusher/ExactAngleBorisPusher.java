package org.example.pusher;

import java.util.Set;
import org.twinorbit.integrators.fullorbit.LeapfrogPusher;
import org.twinorbit.integrators.fullorbit.LeapfrogUpdate;
import org.twinorbit.shared.FieldSample;

/**
 * The relativistic Boris pusher with its rotation made exact: Boris rotates u by 2·atan(|t|)
 * with t = q B Δt / (2γm), a little less than the gyration angle Ω Δt = 2|t|; scaling t by
 * tan(|t|)/|t| makes the rotation angle exactly Ω Δt, so the gyrophase has no error in a
 * uniform field (the gyration-angle correction, e.g. Zenitani &amp; Umeda, Phys. Plasmas 25,
 * 2018, from memory). Written outside twinorbit's packages, on its public leapfrog base.
 */
public final class ExactAngleBorisPusher extends LeapfrogPusher {

    @Override public String name() { return "exact-angle-boris"; }

    @Override
    public String description() {
        return "relativistic Boris with the rotation angle made exact (example of an outside pusher)";
    }

    @Override
    public Set<String> properties() {
        return Set.of("relativistic", "time-reversible", "leapfrog");
    }

    @Override
    protected LeapfrogUpdate newUpdate(boolean electric) {
        return new Update(electric);
    }

    /** Half kick, exact-angle rotation at the γ of u⁻, half kick. */
    static final class Update extends LeapfrogUpdate {

        Update(boolean electric) {
            super(electric, true);
        }

        @Override
        protected double rotationInverseGamma(double u2, double uDotTau, double tau2) {
            return 1.0 / Math.sqrt(1.0 + u2 * INV_C2);
        }

        @Override
        protected double push(FieldSample f, double h) {
            if (electric) {
                ux += h * f.ex;
                uy += h * f.ey;
                uz += h * f.ez;
            }
            double ig = inverseGamma();
            double tx = h * ig * f.bx, ty = h * ig * f.by, tz = h * ig * f.bz;
            double t = Math.sqrt(tx * tx + ty * ty + tz * tz);
            double k = t > 0 ? Math.tan(t) / t : 1.0;
            rotate(k * tx, k * ty, k * tz);
            if (electric) {
                ux += h * f.ex;
                uy += h * f.ey;
                uz += h * f.ez;
            }
            return inverseGamma();
        }
    }
}
