package org.twinorbit.harness.run;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.twinorbit.harness.cases.CaseSpec;

/**
 * On the mirror axis the guiding center keeps μ exactly in the model, so it turns where
 * B = B0/sin²α (the magnetic mirror condition; Chen, Introduction to Plasma Physics and Controlled
 * Fusion (1984)). The guiding-center reference, sampled 32 times per gyroperiod at rtol 1e-10,
 * must find that field to 1e-8: the parabola through the samples around the turn errs by ~h³,
 * far below that. Two samples at the same time (an event splitting a step) once made the
 * parabola amplify their tiny difference to 5e-5.
 */
class MirrorPointSamplesTest {

    @ParameterizedTest
    @ValueSource(doubles = {30, 45, 60, 75})
    void mirrorFieldOfTheReferenceIsB0OverSinSquared(double pitch) {
        CaseSpec s = TestCases.spec("mirror", "none", "none");
        s.eps = 0.02;
        s.pitch = pitch;
        s.phases = 1;
        // the guiding center of the stated pitch and μ on the axis, not one re-derived from the orbit
        s.gcStart = "shared";
        s.duration = 2.0;
        s.durationUnit = "bounces";
        ResultRow model = TestCases.row(TestCases.run(s), "gc-reference");
        double expected = 0.5 / Math.pow(Math.sin(Math.toRadians(pitch)), 2); // B0 = 0.5 T, the default
        double err = Math.abs(model.metric("mirror_field_t").worst() / expected - 1);
        assertTrue(err < 1e-8, "mirror field error " + err + " at pitch " + pitch);
    }
}
