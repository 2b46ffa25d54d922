package org.twinorbit.integrators.fullorbit;

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
 * are used here.
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
    protected LeapfrogUpdate newUpdate(boolean electric) {
        return new Update(electric);
    }

    static final class Update extends LeapfrogUpdate {

        Update(boolean electric) {
            super(electric, true);
        }

        /** Higuera &amp; Cary rotate at the γ solved from u⁻ and τ = h B (their eq. for γ_new). */
        @Override
        protected double rotationInverseGamma(double u2, double uDotTau, double tau2) {
            return implicitInverseGamma(u2, uDotTau, tau2);
        }

        private void kick(FieldSample f, double h) {
            ux += h * f.ex;
            uy += h * f.ey;
            uz += h * f.ez;
        }

        @Override
        protected double push(FieldSample f, double h) {
            if (electric) {
                kick(f, h);
            }
            double tx = h * f.bx, ty = h * f.by, tz = h * f.bz;
            double u2 = ux * ux + uy * uy + uz * uz;
            double k = rotationInverseGamma(u2, ux * tx + uy * ty + uz * tz, tx * tx + ty * ty + tz * tz);
            rotate(k * tx, k * ty, k * tz);
            if (!electric) {
                return 1.0 / Math.sqrt(1.0 + u2 * INV_C2); // the rotation keeps |u|
            }
            kick(f, h);
            return inverseGamma();
        }
    }
}
