package org.twinorbit.harness.score;

import org.twinorbit.fields.Field;
import org.twinorbit.integrators.OrbitStatus;

/**
 * The cursor of a played-back trajectory, shared by the full-orbit and guiding-center replays:
 * one recorded sample per step, and the end of the file or a sample outside the field's domain
 * read as the particle being lost there (as a pusher reports it).
 */
final class Playback {

    private final Field field;
    private final double dt;
    private final double[][] positions;
    private int i;
    private OrbitStatus status = OrbitStatus.OK;

    /** @param dt the run's step (s) @param positions the recorded positions (m), one per sample */
    Playback(Field field, double dt, double[][] positions) {
        this.field = field;
        this.dt = dt;
        this.positions = positions;
    }

    /** Moves to the next sample; false (and lost) past the last one or outside the domain. */
    boolean advance() {
        if (i + 1 >= positions.length) {
            status = OrbitStatus.LOST;   // the file ends before the run: the outside code lost the particle
            return false;
        }
        double[] x = positions[i + 1];
        if (!field.inDomain(x[0], x[1], x[2])) {
            status = OrbitStatus.LOST;
            return false;
        }
        i++;
        return true;
    }

    int index() { return i; }
    double time() { return i * dt; }
    OrbitStatus status() { return status; }
}
