package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.Orbits;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.shared.FieldSample;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * Library fields with a particle in them, for the convergence and long-run tests: a start
 * position, u0 at a pitch angle to the local B, the initial gyroperiod and gyroradius.
 */
record FieldCasesForOrbits(String name, Field field, Species species, double[] x0, double[] u0,
                           double gyroPeriod, double gyroRadius) {

    /**
     * @param kineticEv kinetic energy (eV)
     * @param pitchDeg  pitch angle (degrees) to the local B
     */
    static FieldCasesForOrbits of(String fieldName, Species s, double kineticEv, double pitchDeg) {
        Field f = Fields.create(fieldName, Map.of(), s);
        double[] x0 = f.defaultStart().toArray();
        FieldSample fs = new FieldSample();
        f.evaluate(0, x0[0], x0[1], x0[2], fs);
        double[] b = fs.unitB(new double[3]);
        // a unit vector across B: b × ẑ, or b × x̂ when b is along z
        double[] e1 = Math.abs(b[2]) > 0.9 ? new double[] {0, b[2], -b[1]} : new double[] {b[1], -b[0], 0};
        double n = Orbits.norm(e1);
        double u = Relativity.uFromKinetic(s, kineticEv);
        double par = Relativity.parallel(u, pitchDeg), perp = Relativity.perpendicular(u, pitchDeg);
        double[] u0 = new double[3];
        for (int i = 0; i < 3; i++) {
            u0[i] = par * b[i] + perp * e1[i] / n;
        }
        double bm = fs.bMag();
        double tc = 2 * Math.PI * Relativity.gammaFromKinetic(s, kineticEv) * s.mass() / (Math.abs(s.charge()) * bm);
        return new FieldCasesForOrbits(fieldName, f, s, x0, u0, tc, s.mass() * u / (Math.abs(s.charge()) * bm));
    }

    /** ε = 0.036: a 1 MeV proton at L = 4 in the default dipole, 45° pitch (trapped). */
    static FieldCasesForOrbits dipole() {
        return of("dipole", Species.PROTON, 1e6, 45);
    }

    /** ε = 0.046: a 100 keV proton in the default gradient field (1 T, Lg = 1 m), 60° pitch. */
    static FieldCasesForOrbits gradient() {
        return of("gradient", Species.PROTON, 1e5, 60);
    }

    /** A 10 keV proton at the default tokamak start (R0 + a/2, outboard midplane), 70° pitch. */
    static FieldCasesForOrbits tokamak() {
        return of("tokamak", Species.PROTON, 1e4, 70);
    }

    @Override
    public String toString() {
        return name;
    }
}
