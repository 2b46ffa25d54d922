package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.twinorbit.shared.FieldSample;

/**
 * {@link Field#evaluateForce} is a shortcut, not a second model: at every test point of every
 * library field it gives B and E equal, to the last bit, to those of {@link Field#evaluate}
 * (an exact identity), even when the sample it writes into holds another point's values.
 */
class FieldForceTest {

    static Stream<FieldCases.Case> cases() {
        return FieldCases.all();
    }

    @ParameterizedTest
    @MethodSource("cases")
    void givesTheSameForceAsTheFullEvaluation(FieldCases.Case c) {
        FieldSample full = new FieldSample();
        FieldSample force = new FieldSample();
        for (double[] p : c.points()) {
            c.field().evaluate(p[0], p[1], p[2], p[3], full);
            c.field().evaluateForce(p[0], p[1], p[2], p[3], force);
            double[] a = {full.bx, full.by, full.bz, full.ex, full.ey, full.ez};
            double[] b = {force.bx, force.by, force.bz, force.ex, force.ey, force.ez};
            for (int i = 0; i < 6; i++) {
                assertEquals(a[i], b[i], 0.0, c.name() + " component " + i + " at " + java.util.Arrays.toString(p));
            }
        }
    }
}
