package org.twinorbit.harness.scan;

import java.util.LinkedHashMap;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * How a field of the library is scanned, with defaults chosen so that a scan with no options
 * crosses the breakdown of the guiding-center model. Static fields with a length L scan ε = ρ0/L
 * through the energy; {@code ramp} and {@code wave} scan their time-scale ratio at a fixed energy
 * by setting their own parameter ({@code tau_periods} = 1/(2π ε), {@code omega_ratio} = ε).
 *
 * @param epsMin    default smallest ε
 * @param epsMax    default largest ε
 * @param pitchDeg  default pitch angle (degrees): trapped for the fields with a bounce motion
 * @param duration  default duration
 * @param energyEv  the fixed energy (eV) of a time-scale scan; NaN for energy scans
 * @param parameter the field parameter set from ε (time-scale scans), or null
 */
public record ScanField(double epsMin, double epsMax, double pitchDeg, ScanDuration duration,
                        double energyEv, String parameter) {

    private static final ScanDuration GYRO_20 = new ScanDuration(20, ScanDuration.Unit.GYROPERIODS);
    private static final ScanDuration BOUNCE_3 = new ScanDuration(3, ScanDuration.Unit.BOUNCES);

    /**
     * The scan recipe of a field by its library name; G-EQDSK files scan like {@code solovev}, other
     * fields outside the library like a static field at 60°.
     */
    public static ScanField of(String field) {
        if (field.startsWith(org.twinorbit.fields.GeqdskFile.PREFIX)) {
            // a tokamak equilibrium scans like the library's tokamaks: bounces of a trapped orbit
            return of("solovev");
        }
        return switch (field) {
            case "gradient", "toroidal", "shear" -> new ScanField(1e-3, 0.3, field.equals("gradient") ? 90 : 60,
                    GYRO_20, Double.NaN, null);
            // 60° lies well outside the loss cone sin²α = 1/Rm = 1/4 of the default mirror
            case "mirror" -> new ScanField(3e-3, 0.3, 60, BOUNCE_3, Double.NaN, null);
            case "dipole" -> new ScanField(1e-3, 0.3, 60, BOUNCE_3, Double.NaN, null);
            // trapped at the outboard start r = a/2 when sin²α > (1 − r/R0)/(1 + r/R0) = 0.71, α > 57.7°
            case "tokamak" -> new ScanField(1e-3, 0.1, 75, BOUNCE_3, Double.NaN, null);
            // deuterons at the default start (halfway from the axis to the outer edge, R = 1.98 m) are
            // trapped at 75° (and still at 65°, close to the trapped-passing boundary; measured with
            // run --duration-unit bounces at eps = 0.01 on the default shape)
            case "solovev" -> new ScanField(1e-3, 0.1, 75, BOUNCE_3, Double.NaN, null);
            // 30° mirrors where |B| = 4 Bn, about 4 R_c from the sheet: each bounce crosses the
            // curved region from where the particle is adiabatic. κ = 10 at the smallest ε is deep
            // in the adiabatic regime; two bounces give two sheet crossings in each direction.
            case "current-sheet" -> new ScanField(0.01, 0.6, 30, new ScanDuration(2, ScanDuration.Unit.BOUNCES),
                    Double.NaN, null);
            case "ramp" -> new ScanField(1e-3, 0.3, 90, new ScanDuration(1, ScanDuration.Unit.FIELD_PERIODS),
                    1e3, "tau_periods");
            case "wave" -> new ScanField(0.01, 0.5, 90, new ScanDuration(2, ScanDuration.Unit.FIELD_PERIODS),
                    1e3, "omega_ratio");
            default -> new ScanField(1e-3, 0.3, 60, GYRO_20, Double.NaN, null);
        };
    }

    /**
     * The default initial guiding center: the field's own, except
     * <ul>
     * <li>in the mirror, where the scan starts off the axis at r = 0.2 Lm in the midplane. On the
     *     axis the gyration ring is centred on the symmetry axis, so every gyrophase is the same
     *     orbit turned about the axis (p_φ is conserved, Noether; common practice) and the ensemble
     *     samples nothing. μ still jumps there (4.4e-4 at ε = 0.124 on the axis, as measured by
     *     this tool): p_φ fixes the orbit's shape about the axis, not the adiabatic invariant;
     * <li>in the ramp, where the scan starts at r = 3 ρ0 so that the inward E×B drift of the
     *     compression, v_E = r/(2(τ + t)), is not zero; at r = 3 ρ0 it is 1.5 ε v⊥ at the start,
     *     below the particle's speed over most of the range.
     * </ul>
     *
     * @param energyEv the scan's kinetic energy (eV), used by the ramp
     */
    public Vec3 start(String name, Field f, Species species, double energyEv) {
        return switch (name) {
            case "mirror" -> new Vec3(0.2 * f.length(), 0, 0);
            case "ramp" -> {
                FieldSample s = new FieldSample();
                f.evaluate(0, 0, 0, 0, s);
                yield new Vec3(3 * Relativity.momentumFromKinetic(species, energyEv)
                        / (Math.abs(species.charge()) * s.bMag()), 0, 0);
            }
            default -> f.defaultStart();
        };
    }

    /** True when ε is a time-scale ratio set through a field parameter, at fixed energy. */
    public boolean timeScale() {
        return parameter != null;
    }

    /** What ε means, for tables. */
    public String meaning(String field) {
        if (!timeScale()) {
            return field.equals("current-sheet") ? "rho0/R_c" : "rho0/L";
        }
        return parameter.equals("tau_periods") ? "1/(Omega tau)" : "omega/Omega";
    }

    /** The field parameters at ε: the user's, with the scanned parameter set from ε. */
    public Map<String, Double> parametersAt(Map<String, Double> base, double eps) {
        Map<String, Double> p = new LinkedHashMap<>(base);
        if (parameter != null) {
            p.put(parameter, parameter.equals("tau_periods") ? 1.0 / (2 * Math.PI * eps) : eps);
        }
        return p;
    }

    /**
     * The field's time scale in (non-relativistic) gyroperiods at ε: τ/T_c = 1/(2πε) for the
     * ramp, (2π/ω)/T_c = 1/ε for the wave; NaN for static fields.
     */
    public double periodInGyroperiods(double eps) {
        if (parameter == null) {
            return Double.NaN;
        }
        return parameter.equals("tau_periods") ? 1.0 / (2 * Math.PI * eps) : 1.0 / eps;
    }
}
