package org.twinorbit.integrators;

import java.util.Set;
import org.twinorbit.shared.FieldSample;

/**
 * The relativistic Boris pusher: half electric kick, rotation about B by 2·atan(|t|) with
 * t = q B Δt / (2γm) and γ taken after the first kick, second half kick (J. P. Boris, Proc. 4th
 * Conf. Numerical Simulation of Plasmas, 1970; C. K. Birdsall & A. B. Langdon, Plasma Physics
 * via Computer Simulation, 1991, §4-4 and §15-4). Volume-preserving (H. Qin et al., Phys.
 * Plasmas 20, 084503, 2013) and time-reversible.
 *
 * <p>It splits exactly into two halves, half kick + half rotation and half rotation + half kick,
 * which is how the velocity is synchronised to the position.
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
    LeapfrogUpdate newUpdate(boolean electric) {
        return new Update(electric);
    }

    static final class Update extends LeapfrogUpdate {

        Update(boolean electric) {
            super(electric);
        }

        @Override
        double push(FieldSample f, double h) {
            if (electric) {
                ux += h * f.ex;
                uy += h * f.ey;
                uz += h * f.ez;
            }
            double k = h * inverseGamma();
            rotate(k * f.bx, k * f.by, k * f.bz);
            if (electric) {
                ux += h * f.ex;
                uy += h * f.ey;
                uz += h * f.ez;
            }
            return inverseGamma();
        }

        @Override
        void firstHalf(FieldSample f, double h) {
            if (electric) {
                ux += h * f.ex;
                uy += h * f.ey;
                uz += h * f.ez;
            }
            double k = h * inverseGamma();
            rotateHalf(k * f.bx, k * f.by, k * f.bz, 1);
        }

        @Override
        void undoFirstHalf(FieldSample f, double h) {
            // the rotation keeps |u|, so γ before and after it is the same
            double k = h * inverseGamma();
            rotateHalf(k * f.bx, k * f.by, k * f.bz, -1);
            if (electric) {
                ux -= h * f.ex;
                uy -= h * f.ey;
                uz -= h * f.ez;
            }
        }
    }
}
