package org.twinorbit.harness.cases;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.twinorbit.harness.run.TestCases;
import org.twinorbit.shared.Relativity;
import org.twinorbit.shared.Species;

/**
 * In a current sheet ε = ρ/R_c and κ = sqrt(R_c/ρ) take ρ in the normal field Bn (Büchner &
 * Zelenyi, J. Geophys. Res. 94 (1989)), so the energy of a given ε does not depend on where the
 * particle starts. Off the sheet |B| is far larger than Bn: at z = 3δ, |B| ≈ 10 Bn with the
 * default B0 = 10 Bn.
 */
class CurrentSheetEpsilonTest {

    private static final double B0 = 20e-9;
    private static final double BN = 2e-9;
    private static final double DELTA = 6.4e6;

    private static ResolvedCase at(double z, double eps) {
        CaseSpec s = TestCases.spec("current-sheet", "boris", "gc-rk4");
        s.species = "proton";
        s.eps = eps;
        s.pitch = 30.0;
        s.start = List.of(0.0, 0.0, z);
        return new ResolvedCase(TestCases.build(s));
    }

    @Test
    void epsilonIsTakenInBnWhereverTheParticleStarts() {
        double rc = DELTA * BN / B0;
        // p = ε R_c |q| Bn: the definition of ε with ρ in Bn (Büchner & Zelenyi (1989))
        double p = 0.1 * rc * Species.PROTON.charge() * BN;
        double expectedEv = Relativity.kineticFromU(Species.PROTON, p / Species.PROTON.mass());
        for (double z : new double[] {0.0, 3 * DELTA}) {
            ResolvedCase rc1 = at(z, 0.1);
            assertEquals(expectedEv, rc1.energyEv(), 1e-12 * expectedEv, "energy of eps = 0.1 at z = " + z);
            assertEquals(0.1, rc1.eps(), 1e-12, "reported eps at z = " + z);
        }
    }
}
