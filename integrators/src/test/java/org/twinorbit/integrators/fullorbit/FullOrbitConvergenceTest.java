package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.reference.FullOrbitReference;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.twinorbit.shared.Vec3;

/**
 * The measured order of convergence against the Dormand–Prince reference: the position error
 * after 3 gyrations at 32, 64 and 128 steps per gyration falls by 2^p per halving, p = 2 for
 * the leapfrog schemes and 4 for RK4 (the schemes' published orders; Boris 1970, Vay 2008,
 * Higuera &amp; Cary 2017, Kutta 1901). ±0.15 allows for the next-order term at 32 steps per
 * gyration, (Ω Δt)² ≈ 0.04 of the leading one.
 */
class FullOrbitConvergenceTest {

    static Stream<Arguments> cases() {
        Stream.Builder<Arguments> b = Stream.builder();
        for (FieldCasesForOrbits c : new FieldCasesForOrbits[] {FieldCasesForOrbits.dipole(), FieldCasesForOrbits.gradient()}) {
            for (FullOrbitPusher p : new FullOrbitPusher[] {new BorisPusher(), new VayPusher(),
                    new HigueraCaryPusher(), new LorentzRk4Pusher()}) {
                b.add(Arguments.of(p, c));
            }
        }
        return b.build();
    }

    @ParameterizedTest(name = "{0} in {1}")
    @MethodSource("cases")
    void convergesAtItsOrder(FullOrbitPusher pusher, FieldCasesForOrbits c) {
        double tEnd = 3 * c.gyroPeriod();
        FullOrbitReference.Estimate ref = new FullOrbitReference(c.field(), c.species()).estimate(0, c.x0(), c.u0(), tEnd);
        Vec3 xRef = ref.result().position();
        double[] err = new double[3];
        double[] x = new double[3];
        for (int r = 0; r < 3; r++) {
            int perGyro = 32 << r;
            FullOrbitStepper s = pusher.stepper(c.field(), c.species(), c.gyroPeriod() / perGyro);
            s.start(0, c.x0(), c.u0());
            for (int k = 0; k < 3 * perGyro; k++) {
                assertTrue(s.step(), s.status().label());
            }
            assertEquals(tEnd, s.time(), 1e-12 * tEnd);
            s.position(x);
            err[r] = Vec3.of(x).minus(xRef).norm() / c.gyroRadius();
        }
        // the reference must be far more accurate than the finest run
        assertTrue(ref.positionError() < 1e-3 * err[2], "reference error " + ref.positionError() + " vs " + err[2]);
        double p1 = Math.log(err[0] / err[1]) / Math.log(2), p2 = Math.log(err[1] / err[2]) / Math.log(2);
        System.out.printf("%s in %s: errors %.3e %.3e %.3e rho, orders %.3f %.3f, reference %.1e%n",
                pusher.name(), c.name(), err[0], err[1], err[2], p1, p2, ref.positionError());
        assertEquals(pusher.order(), p1, 0.15, "order from 32 -> 64 steps per gyration, errors " + err[0] + ", " + err[1]);
        assertEquals(pusher.order(), p2, 0.15, "order from 64 -> 128 steps per gyration, errors " + err[1] + ", " + err[2]);
    }
}
