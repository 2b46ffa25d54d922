package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * B = B0 (1 + x/Lg) ẑ, a linear gradient of |B| across the field, no E. The field vanishes at
 * x = −Lg, which bounds the domain. Not a vacuum field (∇×B = −(B0/Lg) ŷ).
 */
public final class GradientField implements Field {

    private final double b0;
    private final double lg;
    private final List<Invariant> invariants;

    /**
     * @param b0 field strength at x = 0 (T)
     * @param lg gradient length (m): |B|/|∇B| at x = 0
     */
    public GradientField(double b0, double lg) {
        this.b0 = b0;
        this.lg = lg;
        this.invariants = List.of(
                Invariants.energy(this),
                Invariants.canonical(this, 1, "p_y", "m u_y + q A_y, A_y = B0 (x + x^2/(2 Lg))"),
                Invariants.of("p_z", "m u_z", "kg m/s", true,
                        (s, t, x, u) -> s.mass() * u[2], Invariants::momentumScale));
    }

    @Override public String name() { return "gradient"; }

    @Override
    public void evaluateForce(double t, double x, double y, double z, FieldSample out) {
        out.bx = out.by = 0;
        out.bz = b0 * (1.0 + x / lg);
        out.ex = out.ey = out.ez = 0;
    }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        out.bz = b0 * (1.0 + x / lg);
        out.dB[6] = b0 / lg;
    }

    @Override public double length() { return lg; }
    @Override public String lengthMeaning() { return "Lg, the gradient length |B|/|grad B| at x = 0"; }
    @Override public boolean hasElectricField() { return false; }

    @Override
    public double domainMargin(double x, double y, double z) {
        return x + lg;
    }

    @Override
    public String domainMeaning() {
        return "x > -Lg, where B > 0; at x = -Lg the field vanishes";
    }

    /** A = (0, B0 (x + x²/(2Lg)), 0). */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        out[0] = 0;
        out[1] = b0 * (x + x * x / (2.0 * lg));
        out[2] = 0;
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "gradient"; }
        @Override public String description() {
            return "B = B0 (1 + x/Lg) along z: grad-B drift along y, no curvature, no E";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 1.0, "T", "field strength at x = 0"),
                    ParameterSpec.positive("Lg", 1.0, "m", "gradient length"));
        }
        @Override public String lengthMeaning() { return "Lg, the gradient length at x = 0"; }
        @Override public String invariantsMeaning() {
            return "energy; p_y = m u_y + q B0 (x + x^2/(2 Lg)); p_z = m u_z";
        }
        @Override public Field create(FieldParameters p, Species species) {
            return new GradientField(p.get("B0"), p.get("Lg"));
        }
    }
}
