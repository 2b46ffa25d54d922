package org.twinorbit.harness.scan;

import org.twinorbit.integrators.maps.GyroParticle;
import org.twinorbit.integrators.maps.GyroPlacement;
import org.twinorbit.integrators.maps.InitialCondition;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import java.util.List;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * The drift error of the guiding-center model in {@code gradient}, B = B0 (1 + x/L) ẑ, against
 * the exact finite-ε drift of the full orbit computed by quadrature (Brizard, Phys. Plasmas 24
 * (2017), "On the validity of the guiding-center approximation in the presence of strong magnetic
 * gradients"): for a particle with u_z = 0 the energy (|u|) and p_y = m u_y + q A_y(x),
 * A_y = B0 (x + x²/(2L)), are exact invariants, so the x motion is one-dimensional between the
 * turning points where |u_y(x)| = |u|, and over one period
 * T = 2 ∫ γ dx/|u_x|, Δy = 2 ∫ u_y dx/|u_x| with u_x² = u² − u_y(x)².
 * The guiding center drifts at the first-order grad-B velocity p⊥² B0/(2γ m q B² L) (Northrop,
 * The Adiabatic Motion of Charged Particles, 1963), so the exact model error of each particle of
 * the ensemble is |v_gc − Δy/T| / |Δy/T|.
 */
class GradientDriftScanTest {

    private static final Species P = Species.PROTON;
    private static final int PHASES = 4;

    @Test
    void driftErrorMatchesExactFiniteEpsDrift() {
        // the shared start: every phase's exact drift against the one guiding center of the ring
        ScanRequest.Built setup = ScanTestSupport.setup("--field", "gradient", "--phases", "4",
                "--pitch", "90", "--gc-start", "shared");
        Field f = Fields.create("gradient", P);
        EnergyScale scale = new EnergyScale(f, P, Vec3.ZERO);
        double b0 = 1.0;
        double length = f.length();
        for (double eps : new double[] {0.02, 0.05, 0.1}) {
            double energy = scale.energyEv(eps);
            Map<String, Double> m = setup.evaluator().measure(eps, energy, 90.0);
            double u = Relativity.uFromKinetic(P, energy);
            double gamma = Relativity.gammaFromKinetic(P, energy);
            double pPerp = P.mass() * u;
            double vGc = pPerp * pPerp * b0 / (2 * gamma * P.mass() * P.charge() * b0 * b0 * length);
            double sum = 0;
            double sumSq = 0;
            double worst = 0;
            // the ensemble the scan runs: zeroth-order placement around the same guiding center
            List<GyroParticle> ring = InitialCondition.ofEnergy(f, P, energy, 90.0, Vec3.ZERO)
                    .particles(PHASES, GyroPlacement.ZEROTH_EXB);
            for (GyroParticle pk : ring) {
                double vExact = exactDrift(pk.position().x(), pk.u().toArray(), gamma, b0, length);
                double e = (vGc - vExact) / vExact; // signed along the drift (y)
                sum += e;
                sumSq += e * e;
                worst = Math.max(worst, Math.abs(e));
            }
            double mean = sum / PHASES;
            double rms = Math.sqrt(sumSq / PHASES);
            // The error itself is O(eps^2) (about 0.6 eps^2 here). The scan measures it through
            // the full-orbit reference (relative tolerance 1e-10) and the mean drift of 20 whole
            // gyrations, whose ends are located by linear interpolation of the gyrophase; both
            // errors are orders of magnitude below 1e-3 of the drift error plus 1e-8, the
            // tolerance asked of it here.
            assertEquals(mean, m.get("drift_error_mean"), 1e-3 * Math.abs(mean) + 1e-8, "mean at eps " + eps);
            assertEquals(rms, m.get("drift_error_rms"), 1e-3 * rms + 1e-8, "rms at eps " + eps);
            assertEquals(worst, m.get("drift_error_worst"), 1e-3 * worst + 1e-8, "worst at eps " + eps);
            // the guiding center drifts too slowly: −0.6 ε² or so
            assertTrue(-mean > 0.3 * eps * eps && -mean < 1.2 * eps * eps, "O(eps^2) at eps " + eps + ": " + mean);
        }
    }

    /** Exact mean drift velocity v_y (m/s) by quadrature of the x motion (see class comment). */
    private static double exactDrift(double x0, double[] u0, double gamma, double b0, double length) {
        double m = P.mass();
        double q = P.charge();
        double u = Math.sqrt(u0[0] * u0[0] + u0[1] * u0[1]);
        double py = m * u0[1] + q * b0 * (x0 + x0 * x0 / (2 * length));
        // u_y(x) = (py − q B0 (x + x²/(2L)))/m; turning points where u_y = ±u
        double xa = turningPoint(py - m * u, q * b0, length, x0);
        double xb = turningPoint(py + m * u, q * b0, length, x0);
        double x1 = Math.min(xa, xb);
        double x2 = Math.max(xa, xb);
        double mid = 0.5 * (x1 + x2);
        double half = 0.5 * (x2 - x1);
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(32, 1e-11, 1e-300);
        // x = mid − half cos φ removes the inverse square-root singularities at the turning points
        double period = 2 * gl.integrate(100000, phi -> {
            double x = mid - half * Math.cos(phi);
            double uy = (py - q * b0 * (x + x * x / (2 * length))) / m;
            return gamma * half * Math.sin(phi) / Math.sqrt((u - uy) * (u + uy));
        }, 0, Math.PI);
        double dy = 2 * gl.integrate(100000, phi -> {
            double x = mid - half * Math.cos(phi);
            double uy = (py - q * b0 * (x + x * x / (2 * length))) / m;
            return uy * half * Math.sin(phi) / Math.sqrt((u - uy) * (u + uy));
        }, 0, Math.PI);
        return dy / period;
    }

    /** The root of q B0 (x + x²/(2L)) = c nearest to x0 (m). */
    private static double turningPoint(double c, double qb0, double length, double x0) {
        // x²/(2L) + x − c/(qB0) = 0
        double a = 1 / (2 * length);
        double disc = 1 + 4 * a * c / qb0;
        double r1 = (-1 + Math.sqrt(disc)) / (2 * a);
        double r2 = (-1 - Math.sqrt(disc)) / (2 * a);
        return Math.abs(r1 - x0) < Math.abs(r2 - x0) ? r1 : r2;
    }
}
