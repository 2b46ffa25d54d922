package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A uniform field that grows linearly in time, B = B0 (1 + t/τ) ẑ, with the induced electric
 * field E = (B0/(2τ)) (y, −x, 0) that Faraday's law ∇×E = −∂B/∂t requires (the solution
 * symmetric about the z axis). E has no scalar potential: E = −∂A/∂t with
 * A = (B(t)/2)(−y, x, 0). Energy is not conserved; μ is, adiabatically for τ ≫ T_c. Because
 * neither field depends on z or on the angle about the z axis, p_z = m u_z and the canonical
 * angular momentum m R u_φ + q B(t) R²/2 are exact invariants.
 */
public final class RampField implements Field {

    private final double b0;
    private final double tau;
    private final List<Invariant> invariants;

    /**
     * @param b0  field strength at t = 0 (T)
     * @param tau ramp time (s): B doubles between t = 0 and t = τ
     */
    public RampField(double b0, double tau) {
        this.b0 = b0;
        this.tau = tau;
        this.invariants = List.of(
                Invariants.of("mu", "m u_perp^2/(2 B(t)), u_perp relative to the E x B frame (adiabatic)",
                        "J/T", false, this::mu, this::mu),
                Invariants.canonicalAngular(this, "p_phi", "m R u_phi + q B(t) R^2/2"),
                Invariants.of("p_z", "m u_z", "kg m/s", true,
                        (s, t, x, u) -> s.mass() * u[2], Invariants::momentumScale));
    }

    @Override public String name() { return "ramp"; }

    /** The field strength B(t) (T) at time t (s). */
    public double strength(double t) {
        return b0 * (1.0 + t / tau);
    }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        double rate = b0 / tau;
        out.bz = b0 * (1.0 + t / tau);
        out.ex = 0.5 * rate * y;
        out.ey = -0.5 * rate * x;
        out.dBdtZ = rate;
    }

    /**
     * μ = m w⊥²/(2 B(t)) (J/T), with w⊥ the perpendicular part of u = γv less γ v_E, v_E =
     * E×B/B² = −(B0/(2τB)) (x, y, 0) the E×B velocity at the particle. Removing v_E takes out
     * the slow radial inflow of the compressing field, so that μ measures the gyration alone;
     * the shift by γ v_E is the first-order frame change, adequate while v_E ≪ c (v_E is of
     * order r/τ). With p⊥ = m w⊥ this is the relativistic adiabatic invariant p⊥²/(2mB).
     */
    double mu(Species s, double t, double[] x, double[] u) {
        double b = strength(t);
        double gamma = Relativity.gammaFromU2(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
        double shrink = -b0 / (2.0 * tau * b);
        double wx = u[0] - gamma * shrink * x[0];
        double wy = u[1] - gamma * shrink * x[1];
        return s.mass() * (wx * wx + wy * wy) / (2.0 * b);
    }

    @Override public double length() { return Double.POSITIVE_INFINITY; }
    @Override public String lengthMeaning() { return "none: the ramp time tau sets the adiabaticity"; }
    @Override public double timeScale() { return tau; }
    @Override public boolean isStatic() { return false; }
    @Override public boolean hasElectricField() { return true; }
    @Override public boolean hasPotential() { return false; }

    /** A = (B(t)/2)(−y, x, 0), so that E = −∂A/∂t. */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        double half = 0.5 * strength(t);
        out[0] = -half * y;
        out[1] = half * x;
        out[2] = 0;
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "ramp"; }
        @Override public String description() {
            return "uniform B0 (1 + t/tau) along z with its induced E (Faraday): slow compression";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 1.0, "T", "field strength at t = 0"),
                    ParameterSpec.positive("tau_periods", 200.0, "1",
                            "ramp time tau in gyroperiods 2 pi m/(|q| B0) of the species"));
        }
        @Override public String lengthMeaning() { return "none; time scale tau"; }
        @Override public String invariantsMeaning() {
            return "mu = m u_perp^2/(2B) adiabatically (u_perp in the E x B frame): W_perp grows as B; "
                    + "exact: p_phi = m R u_phi + q B(t) R^2/2 and p_z = m u_z (axial symmetry); energy is not conserved";
        }
        @Override public Field create(FieldParameters p, Species species) {
            if (species == null) {
                throw new FieldParameterException("field 'ramp' needs the particle species: tau is given in its gyroperiods");
            }
            double b0 = p.get("B0");
            // Non-relativistic gyroperiod at B0: a property of the species and field, not of one particle.
            double period = 2.0 * Math.PI * species.mass() / (Math.abs(species.charge()) * b0);
            return new RampField(b0, p.get("tau_periods") * period);
        }
    }
}
