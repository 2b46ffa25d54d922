package org.twinorbit.integrators.reference;

import org.twinorbit.integrators.OrbitStatus;
import java.util.List;
import org.twinorbit.shared.Vec3;

/**
 * How a guiding-center integration ended.
 *
 * @param status           why it stopped ({@link OrbitStatus#OK} when it reached the end time
 *                         or the requested number of mirror points)
 * @param endTime          time (s) of the final state: the end time, or when the guiding center
 *                         left the domain, or when B*∥ reached 0 (model failure)
 * @param position         final guiding-center position (m)
 * @param parallelMomentum final p∥ (kg m/s)
 * @param fieldEvaluations field evaluations, including those of the event detectors
 * @param mirrorPoints     every p∥ = 0 crossing located, in time order
 */
public record GuidingCenterResult(OrbitStatus status, double endTime, Vec3 position,
                                  double parallelMomentum, long fieldEvaluations,
                                  List<MirrorPoint> mirrorPoints) {

    public GuidingCenterResult {
        mirrorPoints = List.copyOf(mirrorPoints);
    }

    /**
     * Mean bounce period (s): the time between the first mirror point and the last one at the
     * same end of the orbit (every second mirror point), divided by the bounces between them;
     * NaN with fewer than three mirror points.
     */
    public double bouncePeriod() {
        int n = mirrorPoints.size();
        if (n < 3) {
            return Double.NaN;
        }
        int last = (n - 1) % 2 == 0 ? n - 1 : n - 2;
        return (mirrorPoints.get(last).time() - mirrorPoints.get(0).time()) / (last / 2);
    }

    /**
     * A mirror point, where p∥ changes sign.
     *
     * @param time          (s)
     * @param position      guiding-center position (m)
     * @param fieldStrength |B| there (T)
     */
    public record MirrorPoint(double time, Vec3 position, double fieldStrength) {}
}
