package org.twinorbit.integrators;

import org.twinorbit.integrators.guidingcenter.GcRk4;
import org.twinorbit.integrators.guidingcenter.GuidingCenterStepper;
import org.twinorbit.integrators.maps.InitialCondition;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import org.junit.jupiter.api.Test;
import org.twinorbit.fields.DipoleField;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/** The hot path (one RK4 step = four right-hand sides) allocates nothing (BRIEF.md standard). */
class GcRk4AllocationTest {

    @Test
    void stepsAllocateNothing() {
        java.lang.management.ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        if (!(mx instanceof com.sun.management.ThreadMXBean bean) || !bean.isThreadAllocatedMemorySupported()) {
            return; // the JVM cannot count allocations: nothing to check
        }
        DipoleField f = new DipoleField(3e-5, 6.4e6, 4);
        InitialCondition ic = InitialCondition.ofEnergy(f, Species.PROTON, 1e4, 45, new Vec3(4 * 6.4e6, 0, 0));
        GuidingCenterStepper st = new GcRk4().stepper(f, Species.PROTON, ic.mu(), 1e-3);
        st.start(0, ic.position().toArray(), ic.parallelMomentum());
        for (int i = 0; i < 20000; i++) {
            st.step(); // warm-up so that nothing is counted from class loading or compilation
        }
        long id = Thread.currentThread().getId();
        long before = bean.getThreadAllocatedBytes(id);
        for (int i = 0; i < 100000; i++) {
            st.step();
        }
        long bytes = bean.getThreadAllocatedBytes(id) - before;
        // a single allocation per step would be ≥ 1.6 MB over 10⁵ steps; allow the JVM's own few kB
        assertTrue(bytes < 100_000, bytes + " bytes allocated over 1e5 steps");
        assertTrue(st.status() == OrbitStatus.OK && st.steps() == 120000, "the steps really ran");
    }
}
