package org.twinorbit.harness.run;

import org.twinorbit.integrators.reference.GuidingCenterResult;
import java.util.List;
import org.twinorbit.harness.metrics.GuidingCenterRecorder;

/**
 * One guiding-center integration as recorded.
 *
 * @param outcome   status and cost
 * @param recorder  track and energy error
 * @param finalX    guiding-center position (m) at the last sample
 * @param finalTime time (s) of the last sample
 * @param mirrorPoints mirror points located by the integrator's event detection (reference only; else empty)
 */
public record GuidingCenterRecord(Outcome outcome, GuidingCenterRecorder recorder, double[] finalX, double finalTime,
                                  List<GuidingCenterResult.MirrorPoint> mirrorPoints) {}
