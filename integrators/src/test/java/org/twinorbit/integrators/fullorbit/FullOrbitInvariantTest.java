package org.twinorbit.integrators.fullorbit;

import org.twinorbit.integrators.Orbits;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Over 1e5 steps (32 per gyration) the leapfrog schemes keep each exact invariant of the field
 * with a bounded error that does not grow (Hairer &amp; Lubich, "Energy behaviour of the Boris
 * method for charged-particle dynamics", BIT 58, 2018; for p_y and p_φ, symmetry of the field,
 * Noether), while RK4 drifts secularly. Measured: the largest relative error in the first and in
 * the last tenth of the run. A bounded error gives a ratio near 1 (at most 2 allowed); a linear
 * drift gives about 10 (more than 5 required). The bounded level itself, ~1e-2 at 32 steps per
 * gyration, is the leapfrog ripple: the discrete orbit's radius exceeds ρ by (Ω Δt)²/8 (common
 * practice, from the polygon the Boris orbit traces), the same for all three schemes.
 */
class FullOrbitInvariantTest {

    static final long STEPS = 100_000;

    static Stream<Arguments> cases() {
        return Stream.of(
                Arguments.of(FieldCasesForOrbits.gradient(), "p_y"),
                Arguments.of(FieldCasesForOrbits.dipole(), "p_phi"),
                Arguments.of(FieldCasesForOrbits.tokamak(), "p_phi"));
    }

    static Stream<Arguments> leapfrogCases() {
        return cases().flatMap(a -> Stream.of(new BorisPusher(), new VayPusher(), new HigueraCaryPusher())
                .map(p -> Arguments.of(p, a.get()[0], a.get()[1])));
    }

    @ParameterizedTest(name = "{0}: {2} in {1}")
    @MethodSource("leapfrogCases")
    void leapfrogKeepsTheInvariantBounded(FullOrbitPusher pusher, FieldCasesForOrbits c, String invariant) {
        double[] tenths = run(pusher, c, invariant);
        assertTrue(tenths[1] <= 2 * tenths[0], "first tenth " + tenths[0] + ", last tenth " + tenths[1]);
    }

    @ParameterizedTest(name = "rk4: {1} in {0}")
    @MethodSource("cases")
    void rk4Drifts(FieldCasesForOrbits c, String invariant) {
        double[] tenths = run(new LorentzRk4Pusher(), c, invariant);
        assertTrue(tenths[1] > 5 * tenths[0], "first tenth " + tenths[0] + ", last tenth " + tenths[1]);
    }

    private static double[] run(FullOrbitPusher pusher, FieldCasesForOrbits c, String invariant) {
        FullOrbitStepper s = pusher.stepper(c.field(), c.species(), c.gyroPeriod() / 32);
        double[] t = Orbits.invariantDriftByTenths(s, c.species(), c.field(),
                Orbits.invariant(c.field(), invariant), c.x0(), c.u0(), STEPS);
        System.out.printf("%s %s %s: first tenth %.3e, last tenth %.3e%n", pusher.name(), c.name(), invariant, t[0], t[1]);
        return t;
    }
}
