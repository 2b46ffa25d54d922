package org.twinorbit.harness.score;

import java.util.Set;
import org.twinorbit.integrators.fullorbit.LeapfrogPusher;
import org.twinorbit.integrators.fullorbit.LeapfrogUpdate;
import org.twinorbit.shared.FieldSample;

/**
 * A Boris push with the classic bug of a sign error in the first electric half kick: the two
 * half kicks cancel, the particle no longer feels E and never drifts at E×B/B², whatever the
 * step (Boris 1970 for the correct scheme). Written on the public leapfrog base, as an outside
 * author would; used only to produce a faulty "outside" trajectory for the scorer.
 */
final class FlippedKickBorisPusher extends LeapfrogPusher {

    @Override public String name() { return "test-flipped-kick"; }
    @Override public String description() { return "Boris with the first E half kick of the wrong sign (tests only)"; }
    @Override public Set<String> properties() { return Set.of("relativistic", "time-reversible", "volume-preserving"); }

    @Override
    protected LeapfrogUpdate newUpdate(boolean electric) {
        return new LeapfrogUpdate(electric, true) {
            @Override
            protected double rotationInverseGamma(double u2, double uDotTau, double tau2) {
                return 1.0 / Math.sqrt(1.0 + u2 * INV_C2);
            }

            @Override
            protected double push(FieldSample f, double h) {
                ux -= h * f.ex;   // the bug: should be +=
                uy -= h * f.ey;
                uz -= h * f.ez;
                double ig = inverseGamma();
                rotate(h * ig * f.bx, h * ig * f.by, h * ig * f.bz);
                ux += h * f.ex;
                uy += h * f.ey;
                uz += h * f.ez;
                return inverseGamma();
            }
        };
    }
}
