package org.twinorbit.fields;

import java.util.List;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * Uniform B = B0 ẑ with a uniform oscillating electric field E = E0 sin(ωt) x̂ (a long-wavelength
 * wave; ∇×E = 0 = −∂B/∂t). E = −∇Φ with Φ = −E0 sin(ωt) x at every instant, but Φ depends on
 * time, so energy is not conserved. The frequency is set relative to the gyrofrequency of the
 * species the field is built for, and {@link #drivenVelocity} gives the exact driven motion.
 */
public final class WaveField implements Field {

    private final double b0;
    private final double e0;
    private final double omega;
    /** Signed gyrofrequency qB0/m (rad/s) of the species the field was built for. */
    private final double omegaC;
    /** q/m (C/kg) of that species. */
    private final double qm;
    private final List<Invariant> invariants;

    /**
     * @param b0      magnetic field strength (T)
     * @param e0      electric amplitude (V/m)
     * @param omega   wave angular frequency (rad/s)
     * @param species the species whose driven solution {@link #drivenVelocity} describes
     */
    public WaveField(double b0, double e0, double omega, Species species) {
        this.b0 = b0;
        this.e0 = e0;
        this.omega = omega;
        this.qm = species.chargeToMass();
        this.omegaC = qm * b0;
        this.invariants = List.of(
                Invariants.canonical(this, 1, "p_y", "m u_y + q B0 x"),
                Invariants.of("p_z", "m u_z", "kg m/s", true,
                        (s, t, x, u) -> s.mass() * u[2], Invariants::momentumScale));
    }

    @Override public String name() { return "wave"; }

    @Override
    public void evaluate(double t, double x, double y, double z, FieldSample out) {
        out.clear();
        out.bz = b0;
        out.ex = e0 * Math.sin(omega * t);
    }

    /** The wave angular frequency ω (rad/s). */
    public double omega() {
        return omega;
    }

    /**
     * The guiding-center (gyration-averaged) perpendicular velocity (m/s) at time t (s) of the
     * exact non-relativistic motion, written into {@code out} (out[2] = 0; v_z is constant).
     *
     * <p>m dv/dt = q (E0 sin(ωt) x̂ + v × B0 ẑ) is a driven oscillator. Every solution is this
     * particular solution plus a free gyration at Ω = qB0/m, whose average over a gyration is zero,
     * so the particular solution is the guiding-center velocity (forced oscillator; common practice):
     * v_x = (q E0/m) ω/(Ω² − ω²) cos ωt, v_y = −(q E0/m) Ω/(Ω² − ω²) sin ωt.
     * For ω ≪ Ω these are the polarization drift (m/(qB0²)) dE/dt and the E×B drift −E(t)/B0;
     * the factor 1/(1 − ω²/Ω²) is the finite-frequency correction. Valid for |v| ≪ c.
     */
    public double[] drivenVelocity(double t, double[] out) {
        double a = qm * e0 / (omegaC * omegaC - omega * omega);
        out[0] = a * omega * Math.cos(omega * t);
        out[1] = -a * omegaC * Math.sin(omega * t);
        out[2] = 0;
        return out;
    }

    @Override public double length() { return Double.POSITIVE_INFINITY; }
    @Override public String lengthMeaning() { return "none: the wave period sets the time scale 1/omega"; }
    @Override public double timeScale() { return 1.0 / omega; }
    @Override public boolean isStatic() { return false; }
    @Override public boolean hasElectricField() { return true; }
    @Override public boolean hasPotential() { return true; }

    @Override
    public double potential(double t, double x, double y, double z) {
        return -e0 * Math.sin(omega * t) * x;
    }

    /** A = (0, B0 x, 0), the gauge in which p_y is the canonical momentum. */
    @Override
    public void vectorPotential(double t, double x, double y, double z, double[] out) {
        out[0] = 0;
        out[1] = b0 * x;
        out[2] = 0;
    }

    @Override public List<Invariant> invariants() { return invariants; }
    @Override public Vec3 defaultStart() { return Vec3.ZERO; }

    /** The library entry. */
    public static final class Provider implements FieldProvider {
        @Override public String name() { return "wave"; }
        @Override public String description() {
            return "uniform B0 along z with an oscillating E0 sin(omega t) along x: E x B and polarization drifts";
        }
        @Override public List<ParameterSpec> parameters() {
            return List.of(ParameterSpec.positive("B0", 1.0, "T", "magnetic field strength"),
                    ParameterSpec.any("E0", 1.0e3, "V/m", "electric amplitude along x"),
                    ParameterSpec.positive("omega_ratio", 0.05, "1",
                            "wave frequency over the species' gyrofrequency |q| B0/m, not 1"));
        }
        @Override public String lengthMeaning() { return "none; time scale 1/omega"; }
        @Override public String invariantsMeaning() {
            return "energy and mu are not exact (E depends on time); the exact driven solution (forced oscillator) "
                    + "gives the drift; p_y = m u_y + q B0 x and p_z = m u_z are exact (E and B do not depend on y, z)";
        }
        @Override public Field create(FieldParameters p, Species species) {
            if (species == null) {
                throw new FieldParameterException("field 'wave' needs the particle species: omega is given relative to its gyrofrequency");
            }
            double ratio = p.get("omega_ratio");
            // At omega = Omega the drive is resonant and the driven solution grows without bound.
            if (Math.abs(ratio - 1.0) < 1e-3) {
                throw new FieldParameterException("parameter 'omega_ratio' of field 'wave' must be > 0 and not within 0.001 of 1 "
                        + "(cyclotron resonance), got " + ratio);
            }
            double b0 = p.get("B0");
            double omega = ratio * Math.abs(species.charge()) * b0 / species.mass();
            return new WaveField(b0, p.get("E0"), omega, species);
        }
    }
}
