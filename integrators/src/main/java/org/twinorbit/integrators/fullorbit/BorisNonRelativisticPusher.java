package org.twinorbit.integrators.fullorbit;

import java.util.Set;
import org.twinorbit.shared.FieldSample;

/**
 * The non-relativistic Boris pusher (γ = 1, u = v): half electric kick, rotation about B by
 * 2·atan(Ω Δt / 2), half kick (J. P. Boris, Proc. 4th Conf. Numerical Simulation of Plasmas,
 * 1970; C. K. Birdsall & A. B. Langdon, Plasma Physics via Computer Simulation, 1991, §4-4, section from memory).
 * The fast path for particles far below the speed of light. Volume-preserving (H. Qin et al.,
 * Phys. Plasmas 20, 084503, 2013) and time-reversible.
 */
public final class BorisNonRelativisticPusher extends LeapfrogPusher {

    /** The stable name. */
    public static final String NAME = "boris-newtonian";
    /** The name of release 0.1, accepted for one more release ({@link Pushers#DEPRECATED}). */
    public static final String OLD_NAME = "boris-nr";

    @Override public String name() { return NAME; }

    @Override
    public String description() {
        return "non-relativistic Boris leapfrog, gamma = 1 (Boris 1970; Birdsall & Langdon 1991)";
    }

    @Override
    public Set<String> properties() {
        return Set.of("volume-preserving", "time-reversible", "leapfrog");
    }

    @Override
    protected LeapfrogUpdate newUpdate(boolean electric) {
        return new Update(electric);
    }

    static final class Update extends LeapfrogUpdate {

        Update(boolean electric) {
            super(electric, false);
        }

        @Override
        protected double rotationInverseGamma(double u2, double uDotTau, double tau2) {
            return 1.0;
        }

        @Override
        protected double push(FieldSample f, double h) {
            if (electric) {
                ux += h * f.ex;
                uy += h * f.ey;
                uz += h * f.ez;
            }
            rotate(h * f.bx, h * f.by, h * f.bz);
            if (electric) {
                ux += h * f.ex;
                uy += h * f.ey;
                uz += h * f.ez;
            }
            return 1.0;
        }
    }
}
