package org.twinorbit.integrators.guidingcenter;

import org.twinorbit.integrators.OrbitStatus;
import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.shared.Species;

/**
 * The classical fourth-order Runge–Kutta method (Kutta, Z. Math. Phys. 46, 435, 1901) with a
 * fixed step, applied to the first-order guiding-center equations
 * ({@link GuidingCenterEquations}). Not symplectic: in long runs its energy drifts secularly.
 */
public final class GcRk4 implements GuidingCenterIntegrator {

    /** Stable name used in tables, options and tests. */
    public static final String NAME = "gc-rk4";

    @Override public String name() { return NAME; }

    @Override
    public String description() {
        return "classical Runge-Kutta 4 (Kutta 1901), fixed step, on the first-order relativistic"
                + " guiding-center equations (Littlejohn 1983)";
    }

    @Override public int order() { return 4; }

    @Override public Set<String> properties() { return Set.of("relativistic"); }

    @Override
    public GuidingCenterStepper stepper(Field field, Species species, double mu, double dt) {
        if (!(dt > 0) || !Double.isFinite(dt)) {
            throw new IllegalArgumentException("time step dt must be a finite number > 0 s, got " + dt);
        }
        return new Stepper(new GuidingCenterEquations(field, species, mu), dt);
    }

    /** One guiding center; all buffers are allocated here, none per step. */
    private static final class Stepper implements GuidingCenterStepper {
        private final GuidingCenterEquations eq;
        private final Field field;
        private final double dt;
        private final double[] y = new double[4];
        private final double[] tmp = new double[4];
        private final double[] k1 = new double[4];
        private final double[] k2 = new double[4];
        private final double[] k3 = new double[4];
        private final double[] k4 = new double[4];
        private double t;
        private long steps;
        private long evaluationsAtStart;
        private OrbitStatus status = OrbitStatus.OK;

        Stepper(GuidingCenterEquations eq, double dt) {
            this.eq = eq;
            this.field = eq.field();
            this.dt = dt;
        }

        @Override
        public void start(double t0, double[] gc0, double pPar0) {
            t = t0;
            y[0] = gc0[0];
            y[1] = gc0[1];
            y[2] = gc0[2];
            y[3] = pPar0;
            steps = 0;
            evaluationsAtStart = eq.fieldEvaluations();
            status = OrbitStatus.OK;
            if (!field.inDomain(y[0], y[1], y[2])) {
                status = OrbitStatus.LOST;
            } else if (!(eq.parallelBStar(t, y) > 0)) {
                status = OrbitStatus.MODEL_FAILURE;
            }
        }

        @Override
        public boolean step() {
            if (status != OrbitStatus.OK) {
                return false;
            }
            double h = dt;
            if (!(eq.derivatives(t, y, k1) > 0)) {
                return fail(OrbitStatus.MODEL_FAILURE);
            }
            stage(y, k1, 0.5 * h);
            if (!(eq.derivatives(t + 0.5 * h, tmp, k2) > 0)) {
                return fail(OrbitStatus.MODEL_FAILURE);
            }
            stage(y, k2, 0.5 * h);
            if (!(eq.derivatives(t + 0.5 * h, tmp, k3) > 0)) {
                return fail(OrbitStatus.MODEL_FAILURE);
            }
            stage(y, k3, h);
            if (!(eq.derivatives(t + h, tmp, k4) > 0)) {
                return fail(OrbitStatus.MODEL_FAILURE);
            }
            double w = h / 6.0;
            for (int i = 0; i < 4; i++) {
                tmp[i] = y[i] + w * (k1[i] + 2.0 * (k2[i] + k3[i]) + k4[i]);
            }
            if (!(Double.isFinite(tmp[0]) && Double.isFinite(tmp[1]) && Double.isFinite(tmp[2])
                    && Double.isFinite(tmp[3]))) {
                return fail(OrbitStatus.UNSTABLE);
            }
            if (!field.inDomain(tmp[0], tmp[1], tmp[2])) {
                return fail(OrbitStatus.LOST);
            }
            System.arraycopy(tmp, 0, y, 0, 4);
            t += h;
            steps++;
            return true;
        }

        private void stage(double[] base, double[] k, double h) {
            for (int i = 0; i < 4; i++) {
                tmp[i] = base[i] + h * k[i];
            }
        }

        private boolean fail(OrbitStatus why) {
            status = why;
            return false;
        }

        @Override public OrbitStatus status() { return status; }
        @Override public double time() { return t; }

        @Override
        public void position(double[] out) {
            out[0] = y[0];
            out[1] = y[1];
            out[2] = y[2];
        }

        @Override public double parallelMomentum() { return y[3]; }
        @Override public long steps() { return steps; }
        @Override public long fieldEvaluations() { return eq.fieldEvaluations() - evaluationsAtStart; }
    }
}
