package org.twinorbit.integrators.fullorbit;

import java.util.Set;
import org.twinorbit.shared.FieldSample;

/**
 * The Vay pusher: an explicit half step with the old velocity, then an implicit half step whose
 * Lorentz factor is solved in closed form, so that a particle moving at E×B/B² feels no force
 * (J.-L. Vay, Phys. Plasmas 15, 056701, 2008). Time-reversible; not
 * volume-preserving (A. V. Higuera & J. R. Cary, Phys. Plasmas 24, 052104, 2017).

 */
public final class VayPusher extends LeapfrogPusher {

    /** The stable name. */
    public static final String NAME = "vay";

    @Override public String name() { return NAME; }

    @Override
    public String description() {
        return "relativistic Vay leapfrog, exact E x B drift (Vay 2008)";
    }

    @Override
    public Set<String> properties() {
        return Set.of("relativistic", "time-reversible", "leapfrog");
    }

    @Override
    protected LeapfrogUpdate newUpdate(boolean electric) {
        return new Update(electric);
    }

    static final class Update extends LeapfrogUpdate {

        Update(boolean electric) {
            super(electric, true);
        }

        /** In a pure magnetic field Vay's step is a rotation at the γ of u. */
        @Override
        protected double rotationInverseGamma(double u2, double uDotTau, double tau2) {
            return 1.0 / Math.sqrt(1.0 + u2 * INV_C2);
        }

        @Override
        protected double push(FieldSample f, double h) {
            double tx = h * f.bx, ty = h * f.by, tz = h * f.bz;
            double ig = inverseGamma();
            // u' = u + h (E + v×B) + h E, with v = u/γ the old velocity
            double px = ux + ig * (uy * tz - uz * ty);
            double py = uy + ig * (uz * tx - ux * tz);
            double pz = uz + ig * (ux * ty - uy * tx);
            if (electric) {
                px += 2.0 * h * f.ex;
                py += 2.0 * h * f.ey;
                pz += 2.0 * h * f.ez;
            }
            double tau2 = tx * tx + ty * ty + tz * tz;
            double uDotTau = px * tx + py * ty + pz * tz;
            double igNew = implicitInverseGamma(px * px + py * py + pz * pz, uDotTau, tau2);
            tx *= igNew;
            ty *= igNew;
            tz *= igNew;
            double s = 1.0 / (1.0 + tau2 * igNew * igNew);
            double pt = uDotTau * igNew;
            ux = s * (px + pt * tx + (py * tz - pz * ty));
            uy = s * (py + pt * ty + (pz * tx - px * tz));
            uz = s * (pz + pt * tz + (px * ty - py * tx));
            return igNew;
        }
    }
}
