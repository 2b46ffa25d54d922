package org.twinorbit.harness.score;

import java.util.List;
import java.util.Set;
import org.twinorbit.fields.Field;
import org.twinorbit.integrators.OrbitStatus;
import org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrator;
import org.twinorbit.integrators.guidingcenter.GuidingCenterStepper;
import org.twinorbit.shared.Species;

/**
 * An outside code's guiding-center trajectories played back as a guiding-center integrator:
 * asked for a run at a step, it returns the file's samples of the run with that step.
 */
public final class ReplayGuidingCenter implements GuidingCenterIntegrator {

    /** One recorded run and its step (s). */
    public record Recording(double dt, GuidingCenterTrajectory trajectory) {}

    private final String name;
    private final int order;
    private final Set<String> properties;
    private final List<Recording> recordings;

    public ReplayGuidingCenter(String name, int order, Set<String> properties, List<Recording> recordings) {
        this.name = name;
        this.order = order;
        this.properties = Set.copyOf(properties);
        this.recordings = List.copyOf(recordings);
    }

    @Override public String name() { return name; }
    @Override public String description() { return "guiding-center trajectories of an outside code, played back"; }
    @Override public int order() { return order; }
    @Override public Set<String> properties() { return properties; }

    @Override
    public GuidingCenterStepper stepper(Field field, Species species, double mu, double dt) {
        for (Recording r : recordings) {
            if (Math.abs(r.dt() - dt) <= 1e-9 * dt) {
                return new Stepper(field, dt, r.trajectory());
            }
        }
        throw new IllegalStateException("no recorded guiding-center run at dt = " + dt + " s");
    }

    private static final class Stepper implements GuidingCenterStepper {
        private final GuidingCenterTrajectory s;
        private final Playback play;

        Stepper(Field field, double dt, GuidingCenterTrajectory s) {
            this.s = s;
            this.play = new Playback(field, dt, s.x());
        }

        @Override public void start(double t0, double[] gc0, double pPar0) { }
        @Override public boolean step() { return play.advance(); }
        @Override public OrbitStatus status() { return play.status(); }
        @Override public double time() { return play.time(); }
        @Override public void position(double[] out) { System.arraycopy(s.x()[play.index()], 0, out, 0, 3); }
        @Override public double parallelMomentum() { return s.pPar()[play.index()]; }
        @Override public long steps() { return play.index(); }
        @Override public long fieldEvaluations() { return play.index(); }
    }
}
