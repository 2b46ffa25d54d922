package org.twinorbit.fields;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.twinorbit.shared.FieldSample;

/**
 * The malformed-file corpus (src/test/resources/geqdsk-malformed, made as its README says): each
 * file is refused with the line and the quantity that are wrong (common practice for input
 * errors: say where and what).
 */
class GeqdskCorpusTest {

    static final Path DIR = Path.of("src", "test", "resources", "geqdsk-malformed");

    static Stream<Arguments> corpus() {
        return Stream.of(
                Arguments.of("01-truncated-in-psirz.geqdsk", "line 50: psirz (value 146 of 289)", "truncated"),
                Arguments.of("02-grid-size-too-small.geqdsk", "line 80: nbbbs", "grid sizes nw, nh"),
                Arguments.of("03-grid-size-too-large.geqdsk", "line 89: nbbbs", "grid sizes nw, nh"),
                Arguments.of("04-nan-in-fpol.geqdsk", "line 7: fpol (value 6 of 17)", "not a finite number"),
                Arguments.of("05-text-in-pres.geqdsk", "line 10: pres (value 2 of 17)", "'not-a-number' is not a number"),
                Arguments.of("06-negative-nw.geqdsk", "line 1: nw", "got -17"),
                Arguments.of("07-flat-psi.geqdsk", "line 3: sibry", "flat"),
                Arguments.of("08-non-monotonic-psi.geqdsk", "line 22: psirz", "not monotonic"),
                Arguments.of("09-missing-limiter-counts.geqdsk", "line 83: nbbbs", "missing"),
                Arguments.of("10-negative-limiter-count.geqdsk", "line 84: limitr", "must not be negative"),
                Arguments.of("11-limiter-truncated.geqdsk", "line 179: zlim (value 108 of 129)", "truncated"),
                Arguments.of("12-axis-outside-limiter.geqdsk", "line 137: rlim, zlim", "not inside the limiter"),
                Arguments.of("13-boundary-off-grid.geqdsk", "line 85: rbbbs, zbbbs", "boundary point 11"),
                Arguments.of("14-infinite-in-psirz.geqdsk", "line 30: psirz (value 41 of 289)", "not a finite number"),
                Arguments.of("15-zero-rdim.geqdsk", "line 2: rdim", "> 0 m"),
                Arguments.of("16-empty.geqdsk", "line 1: header", "empty"),
                Arguments.of("17-fpol-changes-sign.geqdsk", "line 6: fpol", "one sign"),
                Arguments.of("18-header-without-sizes.geqdsk", "line 1: nw", "whole number"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void malformedFileIsRefusedWithLineAndQuantity(String file, String where, String what) {
        FieldParameterException e = assertThrows(FieldParameterException.class,
                () -> GeqdskFile.read(DIR.resolve(file), Cocos.DEFAULT));
        assertTrue(e.getMessage().contains("geqdsk:") && e.getMessage().contains(where) && e.getMessage().contains(what),
                e.getMessage());
    }

    @Test
    void everyCorpusFileIsListedAndTheBaseReads() throws IOException {
        try (Stream<Path> files = Files.list(DIR)) {
            long malformed = files.filter(p -> p.toString().endsWith(".geqdsk") && !p.getFileName().toString().startsWith("valid")).count();
            assertEquals(corpus().count(), malformed);
        }
        GeqdskField f = GeqdskFile.read(DIR.resolve("valid-17x17.geqdsk"), Cocos.DEFAULT);
        FieldSample s = new FieldSample();
        f.evaluate(0, 1.7, 0, 0, s);
        // B_phi = F/R = R0 B0 / R in the vacuum-like toroidal field: 2.5 T at R0 up to the plasma's few per cent
        assertEquals(2.5, s.by, 0.1);
    }
}
