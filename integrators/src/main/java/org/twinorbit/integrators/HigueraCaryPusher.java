package org.twinorbit.integrators;

import java.util.Set;
import org.twinorbit.shared.FieldSample;

/**
 * The Higuera–Cary pusher: Boris's kick–rotation–kick with the Lorentz factor of the rotation
 * solved in closed form from the velocity after the first kick, which gives the exact E×B drift
 * like Vay's scheme while staying volume-preserving (A. V. Higuera & J. R. Cary, Phys. Plasmas
 * 24, 052104, 2017). Time-reversible.
 *
 * <p>The paper writes the rotation as u⁺ = s[u⁻ + (u⁻·t)t + u⁻×t], then u⁺ + u⁺×t; that is the
 * same rotation (both solve u_new − u⁻ = (u_new + u⁻)×t) as Boris's two cross products, which
 * are used here. Like Boris it splits into two exact halves (half kick + half rotation).
 */
public final class HigueraCaryPusher extends LeapfrogPusher {

    /** The stable name. */
    public static final String NAME = "higuera-cary";

    @Override public String name() { return NAME; }

    @Override
    public String description() {
        return "relativistic Higuera-Cary leapfrog, exact E x B drift, volume-preserving (Higuera & Cary 2017)";
    }

    @Override
    public Set<String> properties() {
        return Set.of("relativistic", "volume-preserving", "time-reversible", "leapfrog");
    }

    @Override
    LeapfrogUpdate newUpdate(boolean electric) {
        return new Update(electric);
    }

    static final class Update extends LeapfrogUpdate {

        Update(boolean electric) {
            super(electric);
        }

        /** 1/γ at which Higuera & Cary rotate, from u⁻ (the current u) and τ = h B. */
        private double rotationInverseGamma(double tx, double ty, double tz) {
            return implicitInverseGamma(ux * ux + uy * uy + uz * uz, ux * tx + uy * ty + uz * tz,
                    tx * tx + ty * ty + tz * tz);
        }

        private void kick(FieldSample f, double h) {
            ux += h * f.ex;
            uy += h * f.ey;
            uz += h * f.ez;
        }

        @Override
        double push(FieldSample f, double h) {
            if (electric) {
                kick(f, h);
            }
            double tx = h * f.bx, ty = h * f.by, tz = h * f.bz;
            double k = rotationInverseGamma(tx, ty, tz);
            rotate(k * tx, k * ty, k * tz);
            if (electric) {
                kick(f, h);
            }
            return inverseGamma();
        }

        @Override
        void firstHalf(FieldSample f, double h) {
            if (electric) {
                kick(f, h);
            }
            double tx = h * f.bx, ty = h * f.by, tz = h * f.bz;
            double k = rotationInverseGamma(tx, ty, tz);
            rotateHalf(k * tx, k * ty, k * tz, 1);
        }

        @Override
        void undoFirstHalf(FieldSample f, double h) {
            // the rotation keeps |u| and u·B, so its Lorentz factor is the same from either end
            double tx = h * f.bx, ty = h * f.by, tz = h * f.bz;
            double k = rotationInverseGamma(tx, ty, tz);
            rotateHalf(k * tx, k * ty, k * tz, -1);
            if (electric) {
                kick(f, -h);
            }
        }
    }
}
