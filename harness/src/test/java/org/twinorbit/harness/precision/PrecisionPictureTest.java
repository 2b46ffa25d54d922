package org.twinorbit.harness.precision;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.twinorbit.harness.report.PictureChecks;

/**
 * The work-precision plot renders at its size, is not blank and has its series. A picture test,
 * no physics values: the numbers plotted are checked in PrecisionCommandTest against Boris's
 * closed-form phase error.
 */
class PrecisionPictureTest {

    @Test
    void workPrecisionHasEveryPusherTheGuidesAndTheReferenceFloor() {
        List<WorkPrecision.Point> pts = List.of(
                new WorkPrecision.Point("boris", 16, 320, 321, 1e-4, 1e-2, 0.4, 1e-15, 1e-4),
                new WorkPrecision.Point("boris", 32, 640, 641, 2e-4, 2.5e-3, 0.1, 1e-15, 1e-4),
                new WorkPrecision.Point("boris", 64, 1280, 1281, 4e-4, 6e-4, 0.025, 1e-15, 1e-4),
                new WorkPrecision.Point("rk4", 16, 320, 1281, 3e-4, 1e-3, 0.05, 1e-3, 1e-3),
                new WorkPrecision.Point("rk4", 32, 640, 2561, 6e-4, 6e-5, 0.003, 6e-5, 6e-5),
                new WorkPrecision.Point("rk4", 64, 1280, 5121, 1.2e-3, 4e-6, 2e-4, 4e-6, 4e-6));
        var c = WorkPrecisionReport.plot(new WorkPrecision.Result(pts, 1e-8, "gradient-proton"));
        PictureChecks.check(c, 1000, 560, List.of("boris", "rk4", "order 2 guide", "order 4 guide",
                "reference's own error"));
        PictureChecks.logTicks(c, true, true);
    }
}
