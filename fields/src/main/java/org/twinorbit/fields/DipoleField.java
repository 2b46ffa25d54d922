package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A planet's magnetic dipole, B = B_s R_p³ [3(m̂·r) r − m̂ r²]/r⁵ with m̂ = −ẑ (so B points
 * along +z at the equator, as for the Earth), no E. B_s is the equatorial surface field.
 * A particle reaching r = R_p hits the planet.
 */
public final class DipoleField implements Field {

    private final double rp;
    private final double lshell;
    /** B_s R_p³ (T m³). */
    private final double k;
    private final List<Invariant> invariants;

    /**
     * @param bs     equatorial field strength at the surface (T)
     * @param rp     planet radius (m)
     * @param lshell equatorial start distance in planet radii, &gt; 1
     */
    public DipoleField(double bs, double rp, double lshell) {
        this.rp = rp;
        this.lshell = lshell;
        this.k = bs * rp * rp * rp;
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.canonicalAngular(this, "p_phi", "m R u_phi - q B_s R_p^3 R^2/r^3"));
    }

    @Override public String name() { return "dipole"; }

    @Override
    public void evaluateForce(double t, double x, double y, double z, FieldSample out) {
        double r2 = x * x + y * y + z * z;
        double inv2 = 1.0 / r2;
        double inv5 = inv2 * inv2 / Math.sqrt(r2);
        out.bx = -3.0 * k * x * z * inv5;
        out.by = -3.0 * k * y * z * inv5;
        out.bz = k * (x * x + y * y - 2.0 * z * z) * inv5;
        out.ex = out.ey = out.ez = 0;
    }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        double r2 = x * x + y * y + z * z;
        double inv2 = 1.0 / r2;
        double inv5 = inv2 * inv2 / Math.sqrt(r2);
        double inv7 = inv5 * inv2;
        out.bx = -3.0 * k * x * z * inv5;
        out.by = -3.0 * k * y * z * inv5;
        out.bz = k * (x * x + y * y - 2.0 * z * z) * inv5;
        double k3 = 3.0 * k * inv7;
        double xz = k3 * (r2 - 5.0 * z * z);   // common factor of the off-diagonal z terms
        out.dB[0] = -k3 * z * (r2 - 5.0 * x * x);
        out.dB[1] = 5.0 * k3 * x * y * z;
        out.dB[2] = -x * xz;
        out.dB[3] = out.dB[1];
        out.dB[4] = -k3 * z * (r2 - 5.0 * y * y);
        out.dB[5] = -y * xz;
        out.dB[6] = out.dB[2];
        out.dB[7] = out.dB[5];
        out.dB[8] = -k3 * z * (3.0 * r2 - 5.0 * z * z);
    }

    @Override public double length() { return lshell * rp / 3.0; }
    @Override public String lengthMeaning() {
        return "r_eq/3 = lshell R_p/3, the gradient length |B|/|grad B| at the equatorial start";
    }
    @Override public boolean hasElectricField() { return false; }

    @Override
    public double domainMargin(double x, double y, double z) {
        return Math.sqrt(x * x + y * y + z * z) - rp;
    }

    @Override
    public String domainMeaning() {
        return "r > R_p; a particle reaching the surface hits the planet";
    }

    /** A = A_φ φ̂ with A_φ = −B_s R_p³ R/r³, i.e. A = B_s R_p³ (y, −x, 0)/r³. */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        double r2 = x * x + y * y + z * z;
        double inv3 = 1.0 / (r2 * Math.sqrt(r2));
        out[0] = k * y * inv3;
        out[1] = -k * x * inv3;
        out[2] = 0;
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return new Vec3(lshell * rp, 0, 0); }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "dipole"; }
        @Override public String description() {
            return "planetary magnetic dipole (moment along -z); start on the equator at lshell planet radii";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B_s", 3.0e-5, "T", "equatorial field at the surface"),
                    ParameterSpec.positive("R_p", 6.4e6, "m", "planet radius"),
                    ParameterSpec.above("lshell", 4.0, "1", "equatorial start distance in planet radii", 1.0));
        }
        @Override public String lengthMeaning() { return "lshell R_p/3, |B|/|grad B| on the equator at the start"; }
        @Override public String invariantsMeaning() {
            return "energy; p_phi = m R u_phi - q B_s R_p^3 R^2/r^3";
        }
        @Override public Field create(FieldParameters p, Species species) {
            return new DipoleField(p.get("B_s"), p.get("R_p"), p.get("lshell"));
        }
    }
}
