package org.twinorbit.harness.run;

import org.twinorbit.harness.metrics.GuidingCenterRecorder;

/**
 * One guiding-center integration as recorded.
 *
 * @param outcome   status and cost
 * @param recorder  track and energy error
 * @param finalX    guiding-center position (m) at the last sample
 * @param finalTime time (s) of the last sample
 */
public record GuidingCenterRecord(Outcome outcome, GuidingCenterRecorder recorder, double[] finalX, double finalTime) {}
