package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Results do not depend on the number of threads: serial and parallel runs print the same JSON.
 * The reference is the serial run itself, no physics value (bit-identical results for any thread
 * count is common practice for reproducible numerical tools).
 */
class ThreadCountTest {

    @Test
    void serialAndParallelJsonAreIdentical() {
        String[] base = {"run", "--quiet", "--json", "--field", "dipole", "--eps", "0.03", "--pitch", "50",
            "--phases", "4", "--duration", "1", "--duration-unit", "bounces", "--pushers", "boris,rk4"};
        TestCommandLine.Outcome one = TestCommandLine.exec(concat(base, "--threads", "1"));
        TestCommandLine.Outcome three = TestCommandLine.exec(concat(base, "--threads", "3"));
        assertEquals(0, one.code(), one.err());
        assertEquals(0, three.code(), three.err());
        assertTrue(one.out().contains("\"error_kind\" : \"model\""), one.out());
        assertEquals(one.out(), three.out());
    }

    private static String[] concat(String[] a, String... b) {
        String[] r = new String[a.length + b.length];
        System.arraycopy(a, 0, r, 0, a.length);
        System.arraycopy(b, 0, r, a.length, b.length);
        return r;
    }
}
