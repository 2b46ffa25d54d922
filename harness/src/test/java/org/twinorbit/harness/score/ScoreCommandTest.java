package org.twinorbit.harness.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;
import org.twinorbit.harness.verdict.SkewedBorisPusher;
import org.twinorbit.integrators.fullorbit.Pushers;

/**
 * {@code score} treats an outside code's trajectories exactly as a built-in pusher: the
 * trajectories of the built-in Boris, exported, pushed "outside" and read back, must give the
 * very numbers of {@code run --pushers boris} on the same case (the same samples enter the same
 * observers; a double written with Double.toString reads back unchanged: Java SE API
 * specification of Double.toString, common practice). A scheme that breaks |u| fails its
 * verdict, and malformed files are refused with exit 2 and a message naming the problem.
 */
class ScoreCommandTest {

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String[] CASE = {"--field", "gradient", "--eps", "0.02", "--pitch", "60", "--phases", "2",
        "--duration", "10"};

    @TempDir
    Path tmp;

    private Path exported() {
        String[] args = new String[CASE.length + 3];
        args[0] = "export";
        System.arraycopy(CASE, 0, args, 1, CASE.length);
        args[CASE.length + 1] = "--out";
        args[CASE.length + 2] = tmp.toString();
        TestCommandLine.succeeded(args);
        return tmp.resolve("gradient-proton");
    }

    private static JsonNode row(JsonNode doc, String integrator) {
        for (JsonNode r : doc.get("results")) {
            if (r.get("integrator").asText().equals(integrator)) {
                return r;
            }
        }
        throw new AssertionError("no row " + integrator);
    }

    @Test
    void borisPushedOutsideScoresExactlyLikeTheBuiltInBoris() throws IOException {
        Path dir = exported();
        OutsideCode.push(dir, Pushers.byName("boris"));
        JsonNode scored = JSON.readTree(TestCommandLine.succeeded("score", "--export", dir.toString(), "--name",
                "outside-boris", "--order", "2", "--property", "time-reversible", "--property", "volume-preserving",
                "--property", "relativistic", "--quiet", "--json"));
        String[] run = new String[CASE.length + 7];
        run[0] = "run";
        System.arraycopy(CASE, 0, run, 1, CASE.length);
        System.arraycopy(new String[] {"--pushers", "boris", "--gc-integrators", "gc-rk4", "--quiet", "--json"}, 0, run,
                CASE.length + 1, 6);
        JsonNode builtIn = JSON.readTree(TestCommandLine.succeeded(run));
        JsonNode a = row(scored, "outside-boris");
        JsonNode b = row(builtIn, "boris");
        for (String metric : List.of("mu_change", "mu_jump", "energy_error", "phase_error", "position_error_rho")) {
            for (String st : List.of("mean", "rms", "worst")) {
                double x = a.get(metric).get(st).asDouble();
                double y = b.get(metric).get(st).asDouble();
                assertEquals(y, x, 1e-12 * Math.abs(y), metric + " " + st);
            }
        }
        assertEquals(b.get("order").asDouble(), a.get("order").asDouble(), 1e-12);
        assertEquals("pass", a.get("verdict").get("result").asText());
    }

    /** The same for guiding centers: the built-in gc-rk4, pushed outside, scores like gc-rk4 itself. */
    @Test
    void guidingCentersPushedOutsideScoreLikeTheBuiltInIntegrator() throws IOException {
        Path dir = exported();
        OutsideCode.pushGuidingCenter(dir, org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrators.byName("gc-rk4"));
        JsonNode scored = JSON.readTree(TestCommandLine.succeeded("score", "--export", dir.toString(), "--model",
                "guiding-center", "--name", "outside-gc", "--order", "4", "--property", "relativistic", "--quiet",
                "--json"));
        String[] run = new String[CASE.length + 7];
        run[0] = "run";
        System.arraycopy(CASE, 0, run, 1, CASE.length);
        System.arraycopy(new String[] {"--pushers", "none", "--gc-integrators", "gc-rk4", "--quiet", "--json"}, 0, run,
                CASE.length + 1, 6);
        JsonNode builtIn = JSON.readTree(TestCommandLine.succeeded(run));
        JsonNode a = row(scored, "outside-gc");
        JsonNode b = row(builtIn, "gc-rk4");
        for (String metric : List.of("energy_error", "drift_error", "position_error_rho")) {
            double x = a.get(metric).get("worst").asDouble();
            double y = b.get(metric).get("worst").asDouble();
            // the replay's clock is k·dt, the integrator's its own sum of steps: the two differ in the
            // last bits, which moves round-off-level errors (a zero drift error) by ~1e-16
            assertEquals(y, x, 1e-12 * Math.abs(y) + 1e-14, metric);
        }
        assertEquals(b.get("order").asDouble(), a.get("order").asDouble(), 1e-9);
        Path first = dir.resolve("gc-trajectory-0.csv");
        Files.writeString(first, "t,x,y,z,p\n0,0,0,0,0\n");
        TestCommandLine.Outcome o = TestCommandLine.exec("score", "--export", dir.toString(), "--model", "guiding-center",
                "--order", "4", "--quiet");
        assertEquals(2, o.code());
        assertTrue(o.err().contains("must be the header t_s,x_m,y_m,z_m,p_par_kg_m_per_s"), o.err());
        TestCommandLine.Outcome m = TestCommandLine.exec("score", "--export", dir.toString(), "--model", "drift-kinetic",
                "--order", "4");
        assertEquals(2, m.code());
        assertTrue(m.err().contains("allowed: full-orbit, guiding-center"), m.err());
    }

    @Test
    void aSchemeThatBreaksTheRotationFailsItsVerdictWithExitOne() throws IOException {
        Path dir = exported();
        OutsideCode.push(dir, new SkewedBorisPusher());
        TestCommandLine.Outcome o = TestCommandLine.exec("score", "--export", dir.toString(), "--name", "outside-skewed",
                "--order", "2", "--property", "time-reversible", "--quiet");
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("outside-skewed: energy-trend"), o.out());
        // the legend of the columns under the table, before the verdicts, as run prints it
        int lastRow = o.out().indexOf("gc-reference ");
        int legend = o.out().indexOf("phase err: phi/phi_ref - 1");
        assertTrue(lastRow > 0 && legend > lastRow && o.out().indexOf("verdicts:") > legend, o.out());
    }

    /**
     * The sign error in the first electric half kick: the scheme converges to an orbit without
     * the E×B drift, so its error does not shrink with dt and the order verdict fails (local
     * orders near 0, declared 2), while the built-in Boris passes the same case.
     */
    @Test
    void aSignErrorInTheElectricKickFailsTheOrderVerdict() throws IOException {
        TestCommandLine.succeeded("export", "--field", "crossed", "--energy", "1e4", "--pitch", "90", "--phases", "2",
                "--duration", "10", "--out", tmp.toString());
        Path dir = tmp.resolve("crossed-proton");
        OutsideCode.push(dir, new FlippedKickBorisPusher());
        TestCommandLine.Outcome bad = TestCommandLine.exec("score", "--export", dir.toString(), "--name", "outside-bug",
                "--order", "2", "--property", "relativistic", "--quiet");
        assertEquals(1, bad.code(), bad.out() + bad.err());
        assertTrue(bad.out().contains("outside-bug: order: local orders"), bad.out());
        OutsideCode.push(dir, Pushers.byName("boris"));
        TestCommandLine.Outcome good = TestCommandLine.exec("score", "--export", dir.toString(), "--name", "outside-boris",
                "--order", "2", "--property", "relativistic", "--quiet");
        assertEquals(0, good.code(), good.out() + good.err());
    }

    @Test
    void malformedTrajectoriesAreRefusedWithTheProblemNamed() throws IOException {
        Path dir = exported();
        OutsideCode.push(dir, Pushers.byName("boris"));
        Path main = dir.resolve("trajectory-main.csv");
        List<String> good = Files.readAllLines(main);
        String header = good.get(0);
        // each entry: the file's lines, and what the message must say
        List<Object[]> corpus = List.of(
                new Object[] {List.of(), "the file is empty"},
                new Object[] {replace(good, 0, "phase,t,x,y,z,ux,uy,uz"), "must be the header"},
                new Object[] {replace(good, 3, good.get(3) + ",1"), "8 columns expected, got 9"},
                new Object[] {replace(good, 3, good.get(3).replaceFirst("^0,", "x,")), "is not a whole number"},
                new Object[] {replace(good, 3, good.get(3).replaceFirst("^0,", "7,")), "phase 7 is not one of"},
                new Object[] {replace(good, 4, good.get(4).replaceAll(",[^,]+$", ",abc")), "'abc' is not a number"},
                new Object[] {replace(good, 5, good.get(5).replaceAll(",[^,]+$", ",NaN")), "is NaN at t ="},
                new Object[] {swap(good, 5, 6), "expected"},
                new Object[] {remove(good, 7), "expected"},
                new Object[] {good.stream().filter(l -> !l.startsWith("1,")).toList(), "phase 1 is missing"},
                new Object[] {append(good, good.get(good.size() - 1)), "expected"},
                new Object[] {replace(good, 1, good.get(1).replaceFirst("^0,0.0,[^,]+,", "0,0.0,12.5,")),
                    "does not start at the exported initial state"});
        for (Object[] bad : corpus) {
            @SuppressWarnings("unchecked")
            List<String> lines = (List<String>) bad[0];
            Files.write(main, lines);
            TestCommandLine.Outcome o = TestCommandLine.exec("score", "--export", dir.toString(), "--order", "2", "--quiet");
            assertEquals(2, o.code(), bad[1] + ": " + o.out() + o.err());
            assertTrue(o.err().contains((String) bad[1]), "expected '" + bad[1] + "' in: " + o.err());
            assertTrue(!o.err().contains("Exception"), o.err());
        }
        Files.write(main, good);
        Files.delete(dir.resolve("trajectory-convergence-2.csv"));
        TestCommandLine.Outcome gone = TestCommandLine.exec("score", "--export", dir.toString(), "--order", "2", "--quiet");
        assertEquals(2, gone.code());
        assertTrue(gone.err().contains("cannot read"), gone.err());
        TestCommandLine.Outcome prop = TestCommandLine.exec("score", "--export", dir.toString(), "--order", "2",
                "--property", "symplectic");
        assertEquals(2, prop.code());
        assertTrue(prop.err().contains("allowed: relativistic, time-reversible"), prop.err());
        assertTrue(header.startsWith("phase,t_s"));
    }

    private static List<String> replace(List<String> l, int i, String line) {
        List<String> c = new java.util.ArrayList<>(l);
        c.set(i, line);
        return c;
    }

    private static List<String> swap(List<String> l, int i, int j) {
        List<String> c = new java.util.ArrayList<>(l);
        java.util.Collections.swap(c, i, j);
        return c;
    }

    private static List<String> remove(List<String> l, int i) {
        List<String> c = new java.util.ArrayList<>(l);
        c.remove(i);
        return c;
    }

    private static List<String> append(List<String> l, String line) {
        List<String> c = new java.util.ArrayList<>(l);
        c.add(line);
        return c;
    }
}
