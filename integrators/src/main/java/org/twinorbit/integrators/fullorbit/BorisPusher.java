package org.twinorbit.integrators.fullorbit;

import java.util.Set;
import org.twinorbit.shared.FieldSample;

/**
 * The relativistic Boris pusher: half electric kick, rotation about B by 2·atan(|t|) with
 * t = q B Δt / (2γm) and γ taken after the first kick, second half kick (J. P. Boris, Proc. 4th
 * Conf. Numerical Simulation of Plasmas, 1970; C. K. Birdsall & A. B. Langdon, Plasma Physics
 * via Computer Simulation, 1991, §4-4 and §15-4, section from memory). Volume-preserving (H. Qin et al., Phys.
 * Plasmas 20, 084503, 2013) and time-reversible.

 */
public final class BorisPusher extends LeapfrogPusher {

    /** The stable name. */
    public static final String NAME = "boris";

    @Override public String name() { return NAME; }

    @Override
    public String description() {
        return "relativistic Boris leapfrog (Boris 1970; Birdsall & Langdon 1991)";
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

        /** Boris rotates at the γ of u⁻, which the rotation leaves unchanged. */
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
            // γ² and 2/(1 + |t|²) = 2γ²/(γ² + h²B²) in parallel: one division less on the chain
            double bx = f.bx, by = f.by, bz = f.bz;
            double g2 = 1.0 + (ux * ux + uy * uy + uz * uz) * INV_C2;
            double ig = 1.0 / Math.sqrt(g2);
            double k = h * ig;
            rotate(k * bx, k * by, k * bz, 2.0 * g2 / (g2 + h * h * (bx * bx + by * by + bz * bz)));
            if (!electric) {
                return ig; // the rotation keeps |u|: no second square root
            }
            ux += h * f.ex;
            uy += h * f.ey;
            uz += h * f.ez;
            return inverseGamma();
        }
    }
}
