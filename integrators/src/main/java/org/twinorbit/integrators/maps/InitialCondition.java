package org.twinorbit.integrators.maps;

import org.twinorbit.integrators.guidingcenter.GuidingCenterState;
import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Gyration;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * One initial condition as users state it: species, kinetic energy (or ε), pitch angle and
 * guiding-center position, at time 0. It gives the guiding-center state and the gyrophase
 * ensemble of particles that start both models from the same point.
 *
 * <p>The kinetic energy and pitch angle are those of the gyration in the E×B frame (with no E
 * they are the laboratory ones); the pitch angle is measured from b at the guiding center.
 * ε = ρ0/L with ρ0 = p/(|q|B), p the total momentum, B = |B| at the guiding center (or the
 * field's {@link Field#epsilonFieldStrength}) and L the field's {@link Field#length()}.
 */
public final class InitialCondition {

    private final Field field;
    private final Species species;
    private final double kineticEv;
    private final double pitchDeg;
    private final Vec3 position;
    private final double bMag;

    private InitialCondition(Field field, Species species, double kineticEv, double pitchDeg,
                             Vec3 position, double bMag) {
        this.field = field;
        this.species = species;
        this.kineticEv = kineticEv;
        this.pitchDeg = pitchDeg;
        this.position = position;
        this.bMag = bMag;
    }

    /**
     * @param kineticEv kinetic energy (eV), &gt; 0
     * @param pitchDeg  pitch angle from b (degrees), in [0, 180]
     * @param position  guiding-center position (m), inside the field's domain
     * @throws IllegalArgumentException naming the option and its allowed range
     */
    public static InitialCondition ofEnergy(Field field, Species species, double kineticEv,
                                            double pitchDeg, Vec3 position) {
        if (!(kineticEv > 0) || !Double.isFinite(kineticEv)) {
            throw new IllegalArgumentException("energy must be a finite number > 0 eV, got " + kineticEv);
        }
        return new InitialCondition(field, species, kineticEv, checkPitch(pitchDeg), position,
                fieldStrength(field, position));
    }

    /**
     * The kinetic energy chosen so that ρ0/L = ε.
     *
     * @param epsilon  ρ0/L, in (0, 1); the field must have a finite length L
     * @param pitchDeg pitch angle from b (degrees), in [0, 180]
     * @param position guiding-center position (m), inside the field's domain
     * @throws IllegalArgumentException naming the option and its allowed range
     */
    public static InitialCondition ofEpsilon(Field field, Species species, double epsilon,
                                             double pitchDeg, Vec3 position) {
        if (!(epsilon > 0 && epsilon < 1)) {
            throw new IllegalArgumentException("eps must be > 0 and < 1 (the guiding-center model needs"
                    + " rho0/L < 1), got " + epsilon);
        }
        double length = field.length();
        if (!(length > 0) || !Double.isFinite(length)) {
            throw new IllegalArgumentException("eps cannot be used with field '" + field.name()
                    + "': its length L is " + length + "; give an energy instead");
        }
        checkPitch(pitchDeg);
        double b = fieldStrength(field, position);
        double p = epsilon * length * Math.abs(species.charge()) * field.epsilonFieldStrength(b);
        double ev = Relativity.kineticFromU(species, p / species.mass());
        return new InitialCondition(field, species, ev, pitchDeg, position, b);
    }

    private static double checkPitch(double pitchDeg) {
        if (!(pitchDeg >= 0 && pitchDeg <= 180)) {
            throw new IllegalArgumentException("pitch must be in [0, 180] degrees, got " + pitchDeg);
        }
        return pitchDeg;
    }

    private static double fieldStrength(Field field, Vec3 x) {
        if (!x.isFinite() || !field.inDomain(x.x(), x.y(), x.z())) {
            throw new IllegalArgumentException("start position " + x + " m is outside the domain of field '"
                    + field.name() + "' (" + field.domainMeaning() + ")");
        }
        FieldSample s = new FieldSample();
        field.evaluate(0, x.x(), x.y(), x.z(), s);
        double b = s.bMag();
        if (!(b > 0)) {
            throw new IllegalArgumentException("start position " + x + " m has |B| = " + b
                    + " T; a guiding center needs |B| > 0");
        }
        return b;
    }

    public Field field() { return field; }
    public Species species() { return species; }
    /** Kinetic energy (eV). */
    public double kineticEv() { return kineticEv; }
    /** Pitch angle (degrees). */
    public double pitchDeg() { return pitchDeg; }
    /** Guiding-center position (m). */
    public Vec3 position() { return position; }
    /** |B| at the guiding center (T). */
    public double fieldStrength() { return bMag; }

    /** Total momentum p = m|u| (kg m/s). */
    public double momentum() {
        return Relativity.momentumFromKinetic(species, kineticEv);
    }

    /** Lorentz factor. */
    public double gamma() {
        return Relativity.gammaFromKinetic(species, kineticEv);
    }

    /** ρ0 = p/(|q|B) (m). */
    public double gyroradius() {
        return momentum() / (Math.abs(species.charge()) * bMag);
    }

    /** ε = p/(|q| B_ε L), B_ε = {@link Field#epsilonFieldStrength}; 0 for a field with infinite L. */
    public double epsilon() {
        return momentum() / (Math.abs(species.charge()) * field.epsilonFieldStrength(bMag) * field.length());
    }

    /** Initial gyroperiod T_c = 2πγm/(|q|B) (s). */
    public double gyroperiod() {
        return Gyration.period(species, bMag, gamma());
    }

    /** Speed |v| (m/s). */
    public double speed() {
        return momentum() / (gamma() * species.mass());
    }

    /** Transit time L/|v| (s) over the field's length; +∞ for a field without one. */
    public double transitTime() {
        return field.length() / speed();
    }

    /** p∥ = p cos α (kg m/s). */
    public double parallelMomentum() {
        return momentum() * Math.cos(Math.toRadians(pitchDeg));
    }

    /** μ = p⊥²/(2mB) (J/T), p⊥ = p sin α. */
    public double mu() {
        double pPerp = momentum() * Math.sin(Math.toRadians(pitchDeg));
        return pPerp * pPerp / (2.0 * species.mass() * bMag);
    }

    /** The guiding-center state at gyrophase 0. */
    public GuidingCenterState guidingCenter() {
        return new GuidingCenterState(position, parallelMomentum(), mu(), 0.0);
    }

    /** The gyrophase ensemble: n particles at θ = 2πk/n (see {@link GyroMaps}). */
    public List<GyroParticle> particles(int n, GyroPlacement placement) {
        return GyroMaps.ensemble(field, species, 0.0, guidingCenter(), n, 0.0, placement);
    }
}
