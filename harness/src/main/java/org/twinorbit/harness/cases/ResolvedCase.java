package org.twinorbit.harness.cases;

import org.twinorbit.integrators.maps.InitialCondition;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.harness.Format;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A case checked against its field: the field built, the starting point inside the domain,
 * the energy and ε = ρ0/L fixed, and the scales every metric is measured in (docs/design.md "What is
 * measured"): ρ0 = p/(|q|B) with p the total momentum and B at the initial guiding center,
 * T_c = 2πγm/(|q|B); ε = ρ0/L with ρ0 taken in the field's {@link Field#epsilonFieldStrength}
 * (the normal field Bn of a current sheet, wherever the particle starts).
 */
public final class ResolvedCase {

    private final Case spec;
    private final Field field;
    private final Vec3 start;
    private final double b0;
    private final double energyEv;
    private final double gamma;
    private final double momentum;
    private final double rho0;
    private final double eps;
    private final double gyroPeriod;
    private final InitialCondition initial;

    /** @throws IllegalArgumentException naming the option and the allowed values */
    public ResolvedCase(Case c) {
        this.spec = c;
        Species s = c.species();
        boolean grid = Fields.isFile(c.field());
        if (!grid) {
            try {
                Fields.provider(c.field());
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("field: " + e.getMessage(), e);
            }
        }
        try {
            this.field = Fields.create(c.field(), c.fieldParameters(), s);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException((grid ? "field: " : "field-param: ") + e.getMessage(), e);
        }
        this.start = c.start() != null ? c.start() : field.defaultStart();
        if (!field.inDomain(start.x(), start.y(), start.z())) {
            throw new IllegalArgumentException("start: the guiding center (" + start.x() + ", " + start.y()
                    + ", " + start.z() + ") m lies outside the domain of field '" + c.field() + "' ("
                    + field.domainMeaning() + ")");
        }
        FieldSample fs = new FieldSample();
        field.evaluate(0, start.x(), start.y(), start.z(), fs);
        this.b0 = fs.bMag();
        if (!(b0 > 0) || !Double.isFinite(b0)) {
            throw new IllegalArgumentException("start: |B| is zero or not finite at the starting point of field '"
                    + c.field() + "'; choose another start");
        }
        double length = field.length();
        if (c.eps() != null) {
            if (!Double.isFinite(length)) {
                throw new IllegalArgumentException("eps: field '" + c.field()
                        + "' has no length L (it is infinite); give --energy instead");
            }
            this.energyEv = InitialCondition.ofEpsilon(field, s, c.eps(), c.pitchDeg(), start).kineticEv();
        } else {
            this.energyEv = c.energyEv();
        }
        this.initial = InitialCondition.ofEnergy(field, s, energyEv, c.pitchDeg(), start);
        this.gamma = initial.gamma();
        this.momentum = initial.momentum();
        this.rho0 = initial.gyroradius();
        this.eps = Double.isFinite(length) ? initial.epsilon() : 0.0;
        if (!(eps < 1)) {
            // the guiding-center model needs rho0 << L; --eps is held to the same bound
            throw new IllegalArgumentException("energy: " + Format.number(energyEv) + " eV gives eps = rho0/L = "
                    + Format.number(eps) + " in field '" + c.field() + "' (L = " + Format.number(length)
                    + " m); eps must be < 1: give a smaller energy");
        }
        this.gyroPeriod = initial.gyroperiod();
    }

    /** The initial condition: guiding-center state and gyrophase ensemble. */
    public InitialCondition initial() { return initial; }

    public Case spec() { return spec; }
    public Field field() { return field; }
    public Species species() { return spec.species(); }
    /** Initial guiding-center position (m). */
    public Vec3 start() { return start; }
    /** |B| at the initial guiding center (T). */
    public double b0() { return b0; }
    /** Kinetic energy (eV). */
    public double energyEv() { return energyEv; }
    public double gamma() { return gamma; }
    /** Total momentum p = γmv (kg m/s). */
    public double momentum() { return momentum; }
    /** ρ0 = p/(|q|B) (m). */
    public double rho0() { return rho0; }
    /** ε = ρ0/L, ρ0 taken in {@link Field#epsilonFieldStrength}; 0 for a field without a length. */
    public double eps() { return eps; }
    /** The field's L (m); +∞ when it has none. */
    public double length() { return field.length(); }
    /** Initial gyroperiod T_c (s). */
    public double gyroPeriod() { return gyroPeriod; }
    /** Full-orbit step dt = T_c / steps-per-gyro (s). */
    public double fullOrbitStep() { return gyroPeriod / spec.stepsPerGyro(); }
}
