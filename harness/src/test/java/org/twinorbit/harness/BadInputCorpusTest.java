package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A corpus of bad command lines over every command (docs/design.md, bad-input rules): each is
 * refused with exit code 2, a message naming the option (or the argument) at fault, and no stack
 * trace. 174 command lines; before the fixes that came with this test, 161 were handled well.
 * In the arguments, {@code OUT} stands for a fresh directory, {@code BASE} for a valid
 * baseline file, {@code EXPORT} for a case directory written by 'export', {@code FILES} for a
 * directory of odd input files.
 */
class BadInputCorpusTest {

    @TempDir
    static Path tmp;

    private static Path base;
    private static Path export;

    @BeforeAll
    static void inputs() throws IOException {
        Path files = Files.createDirectories(tmp.resolve("files"));
        Files.writeString(files.resolve("colour.yaml"), "field: mirror\ncolour: red\n");
        Files.writeString(files.resolve("pitch.yaml"), "field: mirror\npitch: 400\n");
        Files.writeString(files.resolve("notjson.json"), "this is not JSON\n");
        Files.writeString(files.resolve("tol.yaml"), "mu_jump: [\n");
        Files.writeString(files.resolve("points.csv"), "a,b\n1,2\n");
        base = tmp.resolve("base.json");
        TestCommandLine.succeeded("baseline", base.toString(), "run", "--field", "uniform", "--duration", "5",
                "--phases", "2", "--pushers", "boris", "--gc-integrators", "gc-rk4");
        Path exports = tmp.resolve("export");
        TestCommandLine.succeeded("export", "--field", "uniform", "--duration", "5", "--phases", "2", "--out",
                exports.toString());
        try (Stream<Path> dirs = Files.list(exports)) {
            export = dirs.filter(Files::isDirectory).findFirst().orElseThrow();
        }
    }

    /** One bad command line: what the message must contain, then the arguments. */
    private static Arguments bad(String names, String... args) {
        return Arguments.of(names, args);
    }

    static Stream<Arguments> corpus() {
        List<Arguments> c = new ArrayList<>();
        String[] run = {"run", "--quiet", "--out", "OUT"};
        // run: the case options, checked before any orbit
        c.add(bad("field", with(run, "--field", "bottle")));
        c.add(bad("field", with(run, "--field", "grid:/no/such/grid.h5")));
        c.add(bad("field-param", with(run, "--field", "mirror", "-P", "Xx=3")));
        c.add(bad("field-param", with(run, "--field", "mirror", "-P", "Rm")));
        c.add(bad("field-param", with(run, "--field", "mirror", "-P", "Rm=abc")));
        c.add(bad("field-param", with(run, "--field", "mirror", "-P", "Rm=0.5")));
        c.add(bad("field-param", with(run, "--field", "mirror", "-P", "Rm=3", "-P", "Rm=4")));
        c.add(bad("species", with(run, "--species", "muon")));
        c.add(bad("species", with(run, "--species", "1,2,3")));
        c.add(bad("species", with(run, "--species", "-1e-27,1e-19")));
        c.add(bad("species", with(run, "--species", "1e-27,0")));
        c.add(bad("energy", with(run, "--energy", "-5")));
        c.add(bad("energy", with(run, "--energy", "0")));
        c.add(bad("energy", with(run, "--energy", "abc")));
        c.add(bad("energy", with(run, "--energy", "1e300")));
        c.add(bad("energy", with(run, "--energy", "5 parsecs")));
        c.add(bad("energy, eps", with(run, "--energy", "20keV", "--eps", "0.1")));
        c.add(bad("energy", with(run, "--field", "mirror", "--energy", "1e9")));
        c.add(bad("eps", with(run, "--field", "mirror", "--eps", "0")));
        c.add(bad("eps", with(run, "--field", "mirror", "--eps", "1.5")));
        c.add(bad("eps", with(run, "--field", "mirror", "--eps", "abc")));
        c.add(bad("eps", with(run, "--field", "mirror", "--eps", "NaN")));
        c.add(bad("pitch", with(run, "--pitch", "200")));
        c.add(bad("pitch", with(run, "--pitch", "-1")));
        c.add(bad("pitch", with(run, "--pitch", "abc")));
        c.add(bad("pitch", with(run, "--pitch", "NaN")));
        c.add(bad("phases", with(run, "--phases", "0")));
        c.add(bad("phases", with(run, "--phases", "-3")));
        c.add(bad("phases", with(run, "--phases", "100000")));
        c.add(bad("phases", with(run, "--phases", "x")));
        c.add(bad("duration", with(run, "--duration", "-1")));
        c.add(bad("duration", with(run, "--duration", "0")));
        c.add(bad("duration", with(run, "--duration", "NaN")));
        c.add(bad("duration", with(run, "--duration", "Infinity")));
        c.add(bad("duration", with(run, "--duration", "abc")));
        c.add(bad("allow-long", with(run, "--duration", "1e7")));
        c.add(bad("duration-unit", with(run, "--duration-unit", "weeks")));
        c.add(bad("duration-unit", with(run, "--field", "uniform", "--duration-unit", "bounces")));
        c.add(bad("pushers", with(run, "--pushers", "leapfrog9")));
        c.add(bad("pushers", with(run, "--pushers", "boris,boris")));
        c.add(bad("gc-integrators", with(run, "--gc-integrators", "gc-euler")));
        c.add(bad("steps-per-gyro", with(run, "--steps-per-gyro", "2")));
        c.add(bad("steps-per-gyro", with(run, "--steps-per-gyro", "0")));
        c.add(bad("steps-per-gyro", with(run, "--steps-per-gyro", "abc")));
        c.add(bad("gc-step", with(run, "--gc-step", "0")));
        c.add(bad("gc-step", with(run, "--gc-step", "-1")));
        c.add(bad("gc-step", with(run, "--gc-step", "NaN")));
        c.add(bad("gc-start", with(run, "--gc-start", "sideways")));
        c.add(bad("reference-rtol", with(run, "--reference-rtol", "1")));
        c.add(bad("reference-rtol", with(run, "--reference-rtol", "0")));
        c.add(bad("reference-rtol", with(run, "--reference-rtol", "1e-20")));
        c.add(bad("threads", with(run, "--threads", "0")));
        c.add(bad("threads", with(run, "--threads", "-1")));
        c.add(bad("threads", with(run, "--threads", "5000")));
        c.add(bad("threads", with(run, "--threads", "x")));
        c.add(bad("start", with(run, "--start", "1,2")));
        c.add(bad("start", with(run, "--start", "a,b,c")));
        c.add(bad("start", with(run, "--field", "mirror", "--start", "0,0,1.5")));
        c.add(bad("start", with(run, "--start", "NaN,0,0")));
        c.add(bad("case", with(run, "--case", "/no/such/case.yaml")));
        c.add(bad("case", with(run, "--case", "FILES")));
        c.add(bad("'colour'", with(run, "--case", "FILES/colour.yaml")));
        c.add(bad("pitch", with(run, "--case", "FILES/pitch.yaml")));
        c.add(bad("out", "run", "--quiet", "--out="));
        c.add(bad("--no-such-option", with(run, "--no-such-option")));
        c.add(bad("'extra'", with(run, "extra")));
        // suite
        String[] suite = {"suite", "--quiet", "--no-safe-use", "--out", "OUT"};
        c.add(bad("pushers", with(suite, "--pushers", "leapfrog9")));
        c.add(bad("threads", with(suite, "--threads", "0")));
        c.add(bad("threads", with(suite, "--threads", "abc")));
        c.add(bad("out", "suite", "--quiet", "--out="));
        c.add(bad("--bogus", with(suite, "--bogus")));
        c.add(bad("'foo'", with(suite, "foo")));
        // scan
        String[] scan = {"scan", "--quiet", "--out", "OUT"};
        c.add(bad("field", scan));
        c.add(bad("field", with(scan, "--field", "bottle")));
        c.add(bad("field-param", with(scan, "--field", "mirror", "-P", "Xx=3")));
        c.add(bad("field-param", with(scan, "--field", "mirror", "-P", "Rm=abc")));
        c.add(bad("field-param", with(scan, "--field", "mirror", "-P", "Rm=0.5")));
        c.add(bad("field-param", with(scan, "--field", "ramp", "-P", "tau_periods=3")));
        c.add(bad("species", with(scan, "--field", "mirror", "--species", "muon")));
        c.add(bad("pitch", with(scan, "--field", "mirror", "--pitch", "200")));
        c.add(bad("pitch", with(scan, "--field", "mirror", "--pitch", "abc")));
        c.add(bad("eps-min", with(scan, "--field", "mirror", "--eps-min", "0")));
        c.add(bad("eps-min", with(scan, "--field", "mirror", "--eps-min", "0.5", "--eps-max", "0.1")));
        c.add(bad("eps-max", with(scan, "--field", "mirror", "--eps-max", "2")));
        c.add(bad("eps-max", with(scan, "--field", "mirror", "--eps-max", "NaN")));
        c.add(bad("points", with(scan, "--field", "mirror", "--points", "1")));
        c.add(bad("points", with(scan, "--field", "mirror", "--points", "0")));
        c.add(bad("allow-long", with(scan, "--field", "mirror", "--points", "100000")));
        c.add(bad("phases", with(scan, "--field", "mirror", "--phases", "0")));
        c.add(bad("energy", with(scan, "--field", "ramp", "--energy", "1e300")));
        c.add(bad("energy", with(scan, "--field", "ramp", "--energy", "-1")));
        c.add(bad("energy", with(scan, "--field", "mirror", "--energy", "20keV")));
        c.add(bad("energy-min", with(scan, "--field", "mirror", "--energy-min", "1e300")));
        c.add(bad("energy-min", with(scan, "--field", "mirror", "--energy-min", "1keV", "--eps-min", "0.01")));
        c.add(bad("energy-max", with(scan, "--field", "mirror", "--energy-max", "1e12")));
        c.add(bad("energy-min", with(scan, "--field", "ramp", "--energy-min", "1keV")));
        c.add(bad("duration", with(scan, "--field", "mirror", "--duration", "-1")));
        c.add(bad("duration-unit", with(scan, "--field", "mirror", "--duration-unit", "weeks")));
        c.add(bad("duration-unit", with(scan, "--field", "gradient", "--duration-unit", "bounces")));
        c.add(bad("duration-unit", with(scan, "--field", "mirror", "--duration-unit", "field-periods")));
        c.add(bad("tolerance", with(scan, "--field", "mirror", "--tolerance", "foo=1")));
        c.add(bad("tolerance", with(scan, "--field", "mirror", "--tolerance", "mu_jump=abc")));
        c.add(bad("tolerance", with(scan, "--field", "mirror", "--tolerance", "mu_jump")));
        c.add(bad("tolerance", with(scan, "--field", "mirror", "--tolerance", "mu_jump=-1")));
        c.add(bad("statistic", with(scan, "--field", "mirror", "--statistic", "median")));
        c.add(bad("gc-start", with(scan, "--field", "mirror", "--gc-start", "sideways")));
        c.add(bad("reference-rtol", with(scan, "--field", "mirror", "--reference-rtol", "1")));
        c.add(bad("pushers", with(scan, "--field", "mirror", "--pushers", "leapfrog9")));
        c.add(bad("integrators", with(scan, "--field", "mirror", "--integrators", "leapfrog9")));
        c.add(bad("threads", with(scan, "--field", "mirror", "--threads", "0")));
        c.add(bad("out", "scan", "--quiet", "--field", "mirror", "--out="));
        c.add(bad("field", with(scan, "--safe-use", "--field", "mirror")));
        c.add(bad("points", with(scan, "--safe-use", "--points", "1")));
        c.add(bad("start", with(scan, "--field", "mirror", "--start", "1,2")));
        c.add(bad("start", with(scan, "--field", "mirror", "--start", "0,0,5")));
        // baseline: its own arguments, then the command's options
        c.add(bad("FILE", "baseline"));
        c.add(bad("COMMAND", "baseline", "OUT/b.json"));
        c.add(bad("'frobnicate'", "baseline", "OUT/b.json", "frobnicate"));
        c.add(bad("pitch", "baseline", "OUT/b.json", "run", "--pitch", "200"));
        c.add(bad("field", "baseline", "OUT/b.json", "scan", "--field", "bottle"));
        c.add(bad("--out", "baseline", "OUT/b.json", "run", "--out", "OUT"));
        // check
        c.add(bad("BASELINE", "check"));
        c.add(bad("no/such/base.json", "check", "/no/such/base.json"));
        c.add(bad("notjson.json", "check", "FILES/notjson.json"));
        c.add(bad("tolerance", "check", "BASE", "--tolerance", "foo=1"));
        c.add(bad("tolerance", "check", "BASE", "--tolerance", "mu_jump=abc"));
        c.add(bad("tolerance", "check", "BASE", "--tolerance", "mu_jump"));
        c.add(bad("tolerances", "check", "BASE", "--tolerances", "/no/such/tol.yaml"));
        c.add(bad("tolerances", "check", "BASE", "--tolerances", "FILES/tol.yaml"));
        c.add(bad("cost-tolerance", "check", "BASE", "--cost-tolerance", "-1"));
        c.add(bad("cost-tolerance", "check", "BASE", "--cost-tolerance", "abc"));
        c.add(bad("threads", "check", "BASE", "--threads", "0"));
        c.add(bad("junit", "check", "BASE", "--junit="));
        // export
        String[] exp = {"export", "--out", "OUT"};
        c.add(bad("field", with(exp, "--field", "bottle")));
        c.add(bad("suite", with(exp, "--suite", "medium")));
        c.add(bad("grid-box", with(exp, "--field", "uniform", "--grid-box", "1,2,3", "--grid-nodes", "4,4,4")));
        c.add(bad("grid-nodes", with(exp, "--field", "uniform", "--grid-box", "0,1,0,1,0,1", "--grid-nodes", "1,1,1")));
        c.add(bad("grid-nodes", with(exp, "--field", "uniform", "--grid-box", "0,1,0,1,0,1", "--grid-nodes", "a,b,c")));
        c.add(bad("pitch", with(exp, "--pitch", "200")));
        c.add(bad("out", "export", "--field", "uniform"));
        // score
        c.add(bad("export", "score", "--order", "2"));
        c.add(bad("export", "score", "--export", "/no/such/dir", "--order", "2"));
        c.add(bad("model", "score", "--export", "EXPORT", "--order", "2", "--model", "weird"));
        c.add(bad("order", "score", "--export", "EXPORT", "--order", "0"));
        c.add(bad("order", "score", "--export", "EXPORT", "--order", "two"));
        c.add(bad("property", "score", "--export", "EXPORT", "--order", "2", "--property", "flying"));
        c.add(bad("trajectories", "score", "--export", "EXPORT", "--order", "2", "--trajectories", "/no/such/dir"));
        // probe
        c.add(bad("field", "probe", "--field", "bottle", "--at", "0,0,0"));
        c.add(bad("at", "probe", "--field", "mirror", "--at", "1,2"));
        c.add(bad("at", "probe", "--field", "mirror", "--at", "a,b,c"));
        c.add(bad("at", "probe", "--field", "mirror"));
        c.add(bad("points", "probe", "--field", "mirror", "--points", "/no/such/points.csv"));
        c.add(bad("points", "probe", "--field", "mirror", "--points", "FILES/points.csv"));
        c.add(bad("time", "probe", "--field", "mirror", "--at", "0,0,0", "--time", "NaN"));
        c.add(bad("time", "probe", "--field", "mirror", "--at", "0,0,0", "--time", "abc"));
        c.add(bad("species", "probe", "--field", "ramp", "--species", "muon", "--at", "0,0,0"));
        // grid
        c.add(bad("field", "grid"));
        c.add(bad("field", "grid", "--field", "bottle", "--box", "0,1,0,1,0,1", "--nodes", "8,8,8", "--out", "OUT/g.h5"));
        c.add(bad("box", "grid", "--field", "mirror", "--box", "1,0,0,1,0,1", "--nodes", "8,8,8", "--out", "OUT/g.h5"));
        c.add(bad("box", "grid", "--field", "mirror", "--box", "0,1,0,1", "--nodes", "8,8,8", "--out", "OUT/g.h5"));
        c.add(bad("nodes", "grid", "--field", "mirror", "--box", "0,1,0,1,0,1", "--nodes", "0,8,8", "--out", "OUT/g.h5"));
        c.add(bad("nodes", "grid", "--field", "mirror", "--box", "0,1,0,1,0,1", "--nodes", "a,b,c", "--out", "OUT/g.h5"));
        c.add(bad("out", "grid", "--field", "mirror", "--box", "0,1,0,1,0,1", "--nodes", "8,8,8", "--out="));
        // precision
        String[] prec = {"precision", "--quiet"};
        c.add(bad("sweep", with(prec, "--sweep", "8,16")));
        c.add(bad("sweep", with(prec, "--sweep", "a,b")));
        c.add(bad("sweep", with(prec, "--sweep", "2,3,4,5,6,7")));
        c.add(bad("field", with(prec, "--field", "bottle")));
        c.add(bad("pitch", with(prec, "--pitch", "200")));
        c.add(bad("pushers", with(prec, "--pushers", "leapfrog9")));
        // fields, integrators, the top level
        c.add(bad("--bogus", "fields", "--bogus"));
        c.add(bad("'extra'", "fields", "extra"));
        c.add(bad("--bogus", "integrators", "--bogus"));
        c.add(bad("name a command", new String[0]));
        c.add(bad("'frobnicate'", "frobnicate"));
        return c.stream();
    }

    /**
     * An option's name (lower case, hyphens) must appear as the option, {@code --name}, or as the
     * key of a case file, {@code name:}; anything else (a file, an argument) as it is written.
     */
    private static boolean names(String err, String names) {
        if (names.matches("[a-z][a-z-]*")) {
            return err.contains("--" + names) || err.contains(names + ":");
        }
        return err.contains(names);
    }

    private static String[] with(String[] head, String... tail) {
        String[] all = Arrays.copyOf(head, head.length + tail.length);
        System.arraycopy(tail, 0, all, head.length, tail.length);
        return all;
    }

    @ParameterizedTest(name = "[{index}] {1}")
    @MethodSource("corpus")
    void isRefusedNamingTheOption(String names, String[] args) throws IOException {
        Path out = Files.createTempDirectory(tmp, "out");
        String[] real = new String[args.length];
        for (int i = 0; i < args.length; i++) {
            real[i] = args[i].replace("OUT", out.toString()).replace("BASE", base.toString())
                    .replace("EXPORT", export.toString()).replace("FILES", tmp.resolve("files").toString());
        }
        TestCommandLine.Outcome o = TestCommandLine.exec(real);
        String what = String.join(" ", real) + "\nstdout: " + o.out() + "\nstderr: " + o.err();
        assertEquals(2, o.code(), what);
        assertTrue(names(o.err(), names), "the message names '" + names + "': " + what);
        assertFalse(o.err().contains("Exception") || o.err().contains("at org.") || o.err().contains("\tat "),
                "no stack trace: " + what);
    }
}
