package org.twinorbit.harness.run;

import org.twinorbit.integrators.maps.GyroParticle;
import org.twinorbit.integrators.maps.GyroPlacement;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.shared.Species;

/**
 * The model error of the guiding-center drift in the {@code gradient} field against the exact
 * finite-ε drift: for B = B0(1 + x/Lg) ẑ the exact orbit keeps |u| and p_y = m u_y + q A_y(x),
 * A_y = B0(x + x²/(2Lg)), so x oscillates between the two points where u_y = ±|u| and the mean
 * drift follows by quadrature over one period (Brizard, Phys. Plasmas 24, 2017, "On the validity
 * of the guiding-center approximation in the presence of strong magnetic gradients"). The
 * guiding-center drift is μ B0/(γ q Lg B) (Northrop 1963; Jackson §12.4). The harness must
 * report their relative difference as the model row's drift error, phase by phase.
 */
class GradientDriftModelErrorTest {

    private static final double B0 = 1.0;
    private static final double LG = 1.0;

    @ParameterizedTest
    @ValueSource(doubles = {0.01, 0.05})
    void modelDriftErrorMatchesExactFiniteEpsDrift(double eps) {
        CaseSpec s = TestCases.spec("gradient", "none", "none");
        s.eps = eps;
        s.pitch = 90.0;
        s.phases = 4;
        // the exact drift of each phase is compared with the one guiding center the ring shares
        s.gcStart = "shared";
        s.duration = 20.0;
        CaseResult r = TestCases.run(s);
        ResultRow model = TestCases.row(r, "gc-reference");
        Species p = Species.PROTON;
        double gamma = r.resolved().gamma();
        double mu = r.resolved().initial().mu();
        double gcDrift = mu * B0 / (gamma * p.charge() * LG * B0); // at X = 0, B = B0
        List<GyroParticle> ring = r.resolved().initial().particles(4, GyroPlacement.ZEROTH_EXB);
        double sum = 0;
        double sumSq = 0;
        double worst = 0;
        for (GyroParticle g : ring) {
            double exact = exactDrift(p, g.position().toArray(), g.u().toArray(), gamma);
            // signed along the drift (both drifts are along y): negative when the model is slow
            double e = (gcDrift - exact) / exact;
            sum += e;
            sumSq += e * e;
            worst = Math.abs(e) > Math.abs(worst) ? e : worst;
        }
        double mean = sum / ring.size();
        double rms = Math.sqrt(sumSq / ring.size());
        // the harness measures the same quantity from the two references (rtol 1e-10) over whole
        // gyrations: agreement to 1e-4 of the error itself plus 1e-7 absolute
        Stat d = model.metric("drift_error");
        assertEquals(mean, d.mean(), 1e-4 * Math.abs(mean) + 1e-7, "mean at eps " + eps);
        assertEquals(rms, d.rms(), 1e-4 * rms + 1e-7, "rms at eps " + eps);
        assertEquals(worst, d.worst(), 1e-4 * Math.abs(worst) + 1e-7, "worst at eps " + eps);
        // the model error is a finite-ε effect: it must be there, and small
        assertTrue(Math.abs(mean) > 1e-6 && Math.abs(mean) < 10 * eps, "model drift error " + mean + " at eps " + eps);
    }

    /** Exact mean drift v_y (m/s) of a particle with x0 (m), u0 = γv (m/s), by quadrature. */
    static double exactDrift(Species s, double[] x0, double[] u0, double gamma) {
        double m = s.mass();
        double q = s.charge();
        double u = Math.sqrt(u0[0] * u0[0] + u0[1] * u0[1] + u0[2] * u0[2]);
        double py = m * u0[1] + q * ay(x0[0]);
        double xLo = xOfA((py - m * u) / q);
        double xHi = xOfA((py + m * u) / q);
        double xm = 0.5 * (xLo + xHi);
        double h = 0.5 * (xHi - xLo);
        // x = xm − h cos θ removes the inverse-square-root singularities at the turning points;
        // u² − u_y² = (u − u_y)(u + u_y) is formed from the distances to the turning points,
        // x − x_lo = 2h sin²(θ/2) and x_hi − x = 2h cos²(θ/2), so it keeps full precision there
        UnivariateFunction[] parts = new UnivariateFunction[2];
        for (int k = 0; k < 2; k++) {
            boolean numerator = k == 0;
            parts[k] = th -> {
                double x = xm - h * Math.cos(th);
                double dLo = 2 * h * Math.sin(th / 2) * Math.sin(th / 2);
                double dHi = 2 * h * Math.cos(th / 2) * Math.cos(th / 2);
                double minus = q * B0 * dLo * (1 + (x + xLo) / (2 * LG)) / m; // u − u_y
                double plus = q * B0 * dHi * (1 + (x + xHi) / (2 * LG)) / m;  // u + u_y
                double uy = 0.5 * (plus - minus);
                double w = h * Math.sin(th) / Math.sqrt(minus * plus);
                return numerator ? uy * w : w;
            };
        }
        double i1 = new IterativeLegendreGaussIntegrator(32, 1e-12, 1e-14).integrate(1_000_000, parts[0], 0, Math.PI);
        double i2 = new IterativeLegendreGaussIntegrator(32, 1e-12, 1e-14).integrate(1_000_000, parts[1], 0, Math.PI);
        // ⟨v_y⟩ = ∮ v_y dt / ∮ dt with dt = γ dx/u_x and v_y = u_y/γ
        return i1 / (gamma * i2);
    }

    private static double ay(double x) {
        return B0 * (x + x * x / (2 * LG));
    }

    private static double xOfA(double a) {
        return -LG + Math.sqrt(LG * LG + 2 * LG * a / B0);
    }
}
