package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.twinorbit.harness.cases.CaseSpec;
import org.twinorbit.harness.metrics.OrbitMetrics;
import org.twinorbit.harness.metrics.Track;

/**
 * The drift error of an orbit against itself is zero whatever the sampling (an identity, no
 * source needed). A passing guiding center in the {@code tokamak} follows helical field lines;
 * with the parallel part removed from each chord using b at its midpoint, a chord one gyroperiod
 * long leaves a residue that one 1/32 of a gyroperiod long does not, so the same orbit sampled
 * coarsely and finely used to differ by a few per cent (gc-rk4, one step per gyroperiod,
 * showed 0.029 against its reference in the suite, for a position error of 0.003 ρ0).
 */
class DriftSamplingTest {

    @Test
    void oneOrbitSampledTwoWaysHasNoDriftError() {
        CaseSpec s = TestCases.spec("tokamak", "boris", "none");
        s.species = "proton";
        s.eps = 0.02;
        s.pitch = 20.0;
        s.phases = 1;
        s.duration = 150.0;
        CaseResult r = TestCases.run(s);
        Track fine = r.gcTrack();
        Track coarse = new Track(0);
        for (int i = 0; i < fine.size(); i += 32) {
            coarse.add(fine.time(i), fine.coord(i, 0), fine.coord(i, 1), fine.coord(i, 2), fine.vParallel(i));
        }
        double rho = r.resolved().rho0();
        double[] w = {coarse.firstTime(), coarse.lastTime()};
        double measured = Assembly.drift(r.resolved().field(), coarse, fine, w, rho);
        // read on the same times, the fine track differs from the coarse one only by linear
        // interpolation between its own samples (1/32 gyroperiod apart), i.e. not at all at the
        // coarse times, which are among its samples: round-off
        assertTrue(measured < 1e-9, "drift error of an orbit against itself: " + measured);
        // each on its own chords they differ: the test can fail
        double ownChords = OrbitMetrics.driftError(
                OrbitMetrics.meanPerpendicularVelocity(r.resolved().field(), coarse, w[0], w[1]),
                OrbitMetrics.meanPerpendicularVelocity(r.resolved().field(), fine, w[0], w[1]), 0);
        assertTrue(ownChords > 1e-3, "own chords: " + ownChords);
    }
}
