package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.Test;
import org.twinorbit.fields.Field;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.metrics.GyroAverager;
import org.twinorbit.integrators.maps.GyroParticle;
import org.twinorbit.integrators.maps.GyroPlacement;
import org.twinorbit.shared.FieldSample;

/**
 * The first-order gap between a particle's exact canonical momentum and its guiding center's, in
 * the tokamak ({@link MatchedStart#gyroCorrection}). Two independent first-order routes to the
 * guiding center's p∥ must agree to O(ε²): the exact invariant p_φ = m R u_φ + q ψ with the
 * μ-dependent gap added, and the gyration mean γm⟨v·b⟩ plus the Baños term mμ(b·∇×b)/q (Baños,
 * J. Plasma Phys. 1, 1967). Without the gap the two differ at O(ε) — the start that left the
 * tokamak's drift error with a floor of ~1e-4.
 */
class MatchedStartMomentumTest {

    private static final double[] EPS = {0.0025, 0.005, 0.01};

    /** |p∥ from p_φ − Baños p∥| / p with and without the gap, at one ε (75°, the default start). */
    private static double[] gaps(double eps) {
        CaseSpec s = TestCases.spec("tokamak", "none", "none");
        s.eps = eps;
        s.pitch = 75.0;
        s.phases = 1;
        ResolvedCase rc = new ResolvedCase(TestCases.build(s));
        GyroParticle gp = rc.initial().particles(1, GyroPlacement.ZEROTH_EXB).get(0);
        double[] x0 = gp.position().toArray();
        double[] u0 = gp.u().toArray();
        Field f = rc.field();
        GyroAverager g = References.fullOrbit(f, rc.species(), x0, u0, 4 * rc.gyroPeriod(), 4 * 64, 1e-11, 1, 0)
                .gyro();
        MatchedStart.State st = MatchedStart.of(f, rc.species(), g, x0, u0, rc.gamma(), rc.momentum());
        double[] x = st.x();
        FieldSample fs = new FieldSample();
        f.evaluate(st.t0(), x[0], x[1], x[2], fs);
        double[] b = fs.unitB(new double[3]);
        double[] curl = fs.curlUnitB(new double[3]);
        double twist = b[0] * curl[0] + b[1] * curl[1] + b[2] * curl[2];
        double m = rc.species().mass();
        double q = rc.species().charge();
        double banos = rc.gamma() * m * MatchedStart.centered(g.centers(), 3) + m * g.mu(0) * twist / q;
        double bk = x[0] * b[1] - x[1] * b[0]; // b·(ẑ × X)
        double gap = MatchedStart.gyroCorrection(f, f.invariants().get(1), rc.species(), st.t0(), x, b, fs.bMag(),
                g.mu(0), twist, bk);
        double p = rc.momentum();
        return new double[] {Math.abs(st.pPar() - banos) / p, Math.abs(st.pPar() - gap / bk - banos) / p};
    }

    @Test
    void exactMomentumWithTheGapGivesTheBanosParallelMomentum() {
        SimpleRegression with = new SimpleRegression();
        SimpleRegression without = new SimpleRegression();
        for (double eps : EPS) {
            double[] d = gaps(eps);
            with.addData(Math.log(eps), Math.log(d[0]));
            without.addData(Math.log(eps), Math.log(d[1]));
            // the gap is the O(ε) part: with it the two routes agree far better
            assertTrue(d[0] < 0.1 * d[1], "eps " + eps + ": " + d[0] + " against " + d[1] + " without the gap");
        }
        assertTrue(with.getSlope() >= 1.8, "slope with the gap " + with.getSlope());
        assertTrue(without.getSlope() > 0.8 && without.getSlope() < 1.2, "slope without the gap " + without.getSlope());
    }
}
