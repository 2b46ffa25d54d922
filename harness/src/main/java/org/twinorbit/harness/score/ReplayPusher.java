package org.twinorbit.harness.score;

import java.util.List;
import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.fullorbit.EnsembleStepper;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.shared.Species;

/**
 * An outside code's trajectories, played back as if they were a pusher: the case runner asks
 * it for a run from an initial state at a step, and it returns the file's samples of the run
 * with that step and that initial state, one per step. So an outside pusher gets exactly the
 * metrics, verdicts and reports of a built-in one, against the same references.
 */
public final class ReplayPusher implements FullOrbitPusher {

    /** One recorded run: its step (s) and the series of each phase, indexed like the initial states. */
    public record Recording(double dt, List<TrajectoryFile.Series> byPhase) {}

    private final String name;
    private final int order;
    private final Set<String> properties;
    private final List<Recording> recordings;

    /**
     * @param name       the row's name in reports
     * @param order      the order the outside scheme declares
     * @param properties the properties it declares ("time-reversible", "relativistic", ...)
     * @param recordings its runs; a phase a run does not hold is null in {@code byPhase}
     */
    public ReplayPusher(String name, int order, Set<String> properties, List<Recording> recordings) {
        this.name = name;
        this.order = order;
        this.properties = Set.copyOf(properties);
        this.recordings = List.copyOf(recordings);
    }

    @Override public String name() { return name; }
    @Override public String description() { return "trajectories of an outside code, played back"; }
    @Override public int order() { return order; }
    @Override public Set<String> properties() { return properties; }

    @Override
    public FullOrbitStepper stepper(Field field, Species species, double dt) {
        return new Stepper(field, dt);
    }

    @Override
    public EnsembleStepper ensemble(Field field, Species species, double dt, int n) {
        throw new UnsupportedOperationException("a played-back trajectory has no ensemble stepper");
    }

    /** The recorded series with this step whose first state is x0 (m), u0 (m/s). */
    TrajectoryFile.Series find(double dt, double[] x0, double[] u0) {
        for (Recording r : recordings) {
            if (Math.abs(r.dt() - dt) > 1e-9 * dt) {
                continue;
            }
            for (TrajectoryFile.Series s : r.byPhase()) {
                if (s != null && close(s.x()[0], x0) && close(s.u()[0], u0)) {
                    return s;
                }
            }
        }
        throw new IllegalStateException("no recorded run at dt = " + dt + " s from that state");
    }

    private static boolean close(double[] a, double[] b) {
        double d = 0;
        double n = 0;
        for (int i = 0; i < 3; i++) {
            d = Math.max(d, Math.abs(a[i] - b[i]));
            n = Math.max(n, Math.abs(b[i]));
        }
        return d <= 1e-12 * n || d == 0;
    }

    private final class Stepper implements FullOrbitStepper {
        private final Field field;
        private final double dt;
        private TrajectoryFile.Series s;
        private Playback play;

        Stepper(Field field, double dt) {
            this.field = field;
            this.dt = dt;
        }

        @Override
        public void start(double t0, double[] x0, double[] u0) {
            s = find(dt, x0, u0);
            play = new Playback(field, dt, s.x());
        }

        @Override public boolean step() { return play.advance(); }
        @Override public OrbitStatus status() { return play.status(); }
        @Override public double time() { return play.time(); }
        @Override public void position(double[] out) { System.arraycopy(s.x()[play.index()], 0, out, 0, 3); }
        @Override public void velocity(double[] out) { System.arraycopy(s.u()[play.index()], 0, out, 0, 3); }
        @Override public long steps() { return play.index(); }
        @Override public long fieldEvaluations() { return play.index(); }
    }
}
