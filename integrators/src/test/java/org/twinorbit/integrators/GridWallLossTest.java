package org.twinorbit.integrators;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.fields.GridFile;
import org.twinorbit.fields.GriddedField;
import org.twinorbit.fields.ToroidalField;
import org.twinorbit.fields.WallPolygon;
import org.twinorbit.integrators.reference.FullOrbitReference;
import org.twinorbit.integrators.reference.GuidingCenterReference;
import org.twinorbit.integrators.reference.GuidingCenterResult;
import org.twinorbit.shared.Species;

/**
 * A wall polygon stored in an axisymmetric grid file of the vacuum toroidal field
 * B = B0 R0/R φ̂: a proton drifts straight up at the curvature + grad-B drift
 * v_d = (m/(qRB))(v∥² + v⊥²/2) (Northrop, The Adiabatic Motion of Charged Particles, 1963;
 * Jackson, Classical Electrodynamics, 3rd ed., ch. 12), its guiding center at fixed R, so it
 * reaches the wall's horizontal top edge, a height d above its start, at t = d/v_d and is lost
 * then. The full orbit circles its guiding center at the Larmor radius ρ in the R–Z plane, so it
 * touches the edge within the gyroperiod after its guiding center is ρ below it, t = (d − ρ)/v_d
 * (common practice). The same grid without the wall keeps the particle.
 */
class GridWallLossTest {

    @TempDir
    Path tmp;

    private static final double B0 = 1.0, R0 = 1.0;
    /** The wall's top edge (m): a rectangle R 0.9–1.1 m, Z −0.1–0.02 m inside the grid's annulus. */
    private static final double TOP = 0.02;
    private static final Species P = Species.PROTON;
    /** Speed (m/s) and pitch 45°: v∥ = v⊥. */
    private static final double V = 2e5, V_PAR = V / Math.sqrt(2), V_PERP = V / Math.sqrt(2);

    private GriddedField grid(WallPolygon wall, String name) {
        Path file = tmp.resolve(name);
        GridFile.writeAxisymmetric(new ToroidalField(B0, R0), 0.85, 1.15, -0.15, 0.15, 31, 31, wall, file);
        return GridFile.read(file);
    }

    private static WallPolygon wall() {
        return new WallPolygon(new double[] {0.9, 1.1, 1.1, 0.9}, new double[] {-0.1, -0.1, TOP, TOP});
    }

    /** v_d (m/s) at R0 from the formula, for V at pitch 45° (γ − 1 = 2e-7, neglected). */
    private static double drift() {
        return P.mass() / (P.charge() * R0 * B0) * (V_PAR * V_PAR + V_PERP * V_PERP / 2);
    }

    @Test
    void guidingCenterIsLostWhenItsDriftReachesTheWall() {
        GriddedField walled = grid(wall(), "walled.h5");
        double mu = P.mass() * V_PERP * V_PERP / (2 * B0);
        double expected = TOP / drift();
        GuidingCenterResult r = new GuidingCenterReference(walled, P, mu)
                .run(0, new double[] {R0, 0, 0}, P.mass() * V_PAR, 2 * expected, 0, null);
        System.out.printf("gc wall crossing: %.6e s, d/v_d = %.6e s%n", r.endTime(), expected);
        assertEquals(OrbitStatus.LOST, r.status());
        // the interpolant's error in ∇B, O(h²/R²) = 1e-4 with h = 0.01 m, sets the drift's
        // (measured 3.3e-5); the crossing height to the event's location
        assertEquals(expected, r.endTime(), 1e-4 * expected);
        assertEquals(TOP, r.position().z(), 1e-6);
        GuidingCenterResult open = new GuidingCenterReference(grid(null, "open.h5"), P, mu)
                .run(0, new double[] {R0, 0, 0}, P.mass() * V_PAR, 2 * expected, 0, null);
        assertEquals(OrbitStatus.OK, open.status());
    }

    @Test
    void fullOrbitIsLostWithinAGyroperiodOfThePredictedCrossing() {
        GriddedField walled = grid(wall(), "walled-fo.h5");
        double omega = P.charge() * B0 / P.mass();
        double rho = V_PERP / omega;
        double period = 2 * Math.PI / omega;
        // u⊥ along −R with B along +φ puts the guiding center ρ below the particle (x − X = m B × v/(qB²))
        double[] x0 = {R0, 0, rho};
        double[] u0 = {-V_PERP, V_PAR, 0};
        double touch = (TOP - rho) / drift();
        FullOrbitReference.Result r = new FullOrbitReference(walled, P).run(0, x0, u0, 2 * TOP / drift());
        System.out.printf("full-orbit wall crossing: %.6e s, (d - rho)/v_d = %.6e s, gyroperiod %.3e s%n",
                r.endTime(), touch, period);
        assertEquals(OrbitStatus.LOST, r.status());
        assertTrue(r.endTime() > touch - period && r.endTime() < touch + period,
                "lost at " + r.endTime() + " s, predicted " + touch + " s within " + period + " s");
        assertEquals(TOP, r.position().z(), 1e-6);
    }
}
