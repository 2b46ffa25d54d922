package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Cylindrical and axisymmetric grid files end to end. In cylindrical components the paraxial
 * mirror is B_R = −R B0 (Rm − 1) z/Lm², B_φ = 0, B_Z = B0 (1 + (Rm − 1) z²/Lm²) (docs/design.md):
 * polynomials of degree at most 2 in R and Z and constant in φ, which the second-order nodal
 * differences and cubic Hermite interpolation reproduce exactly (derived), so runs on both grids
 * agree with the analytic run to round-off (1e-9 here).
 */
class CurvilinearGridRunTest {

    @TempDir
    Path tmp;

    private static JsonNode row(JsonNode doc, String integrator) {
        for (JsonNode r : doc.get("results")) {
            if (r.get("integrator").asText().equals(integrator)) {
                return r;
            }
        }
        throw new AssertionError("no row " + integrator);
    }

    private static JsonNode run(String field, String... rest) throws IOException {
        String[] args = new String[rest.length + 3];
        args[0] = "run";
        args[1] = "--field";
        args[2] = field;
        System.arraycopy(rest, 0, args, 3, rest.length);
        return new ObjectMapper().readTree(TestCommandLine.succeeded(args));
    }

    @Test
    void aMirrorOnCylindricalAndAxisymmetricGridsRunsLikeTheAnalyticOne() throws IOException {
        Path axi = tmp.resolve("mirror-axi.h5");
        Path cyl = tmp.resolve("mirror-cyl.h5");
        String wrote = TestCommandLine.succeeded("grid", "--field", "mirror", "--geometry", "axisymmetric", "--box",
                "0.02,0.3,-1,1", "--nodes", "8,9", "--out", axi.toString());
        assertTrue(wrote.contains("max |div B| L/|B| of the interpolant over the cell centres = "), wrote);
        TestCommandLine.succeeded("grid", "--field", "mirror", "--geometry", "cylindrical", "--box", "0.02,0.3,-1,1",
                "--nodes", "8,6,9", "--out", cyl.toString());
        String info = TestCommandLine.succeeded("fields", "--grid-file", axi.toString());
        assertTrue(info.contains("axisymmetric grid of 8 x 9 nodes (R, Z)") && info.contains("max |div B| L/|B| of the "
                + "interpolant over the cell centres: "), info);
        assertEquals(2, TestCommandLine.exec("fields", "--grid-file", tmp.resolve("none.h5").toString()).code());
        String[] common = {"--start", "0.1,0,0", "--eps", "0.02", "--pitch", "60", "--duration", "1", "--duration-unit",
            "bounces", "--pushers", "none", "--gc-integrators", "none", "--phases", "2", "--quiet", "--json"};
        JsonNode a = row(run("mirror", common), "gc-reference");
        for (Path grid : new Path[] {axi, cyl}) {
            JsonNode g = row(run("grid:" + grid, common), "gc-reference");
            for (String m : new String[] {"bounce_period_s", "mu_change", "drift_error"}) {
                double x = a.get(m).get("worst").asDouble();
                assertEquals(x, g.get(m).get("worst").asDouble(), 1e-9 * Math.abs(x) + 1e-15, grid + " " + m);
            }
        }
    }

    /**
     * A proton drifting vertically out of an axisymmetric grid of the vacuum toroidal field is lost
     * when it reaches the grid's top. The guiding center drifts at v_d = (m/(q B R)) (v∥² + v⊥²/2)
     * (grad-B plus curvature drift; Chen, Introduction to Plasma Physics, 1984), so it reaches
     * Z = 0.05 m at t = 0.05/v_d; the full orbit touches it one Larmor radius earlier, within a
     * gyroperiod.
     */
    @Test
    void aParticleLeavingTheGridIsLostAtThatTime() throws IOException {
        Path file = tmp.resolve("toroidal.h5");
        TestCommandLine.succeeded("grid", "--field", "toroidal", "--geometry", "axisymmetric", "--box",
                "0.8,1.2,-0.05,0.05", "--nodes", "9,9", "--out", file.toString());
        JsonNode doc = run("grid:" + file, "--start", "1,0,0", "--eps", "0.01", "--pitch", "45", "--duration", "200",
                "--phases", "2", "--pushers", "boris", "--gc-integrators", "none", "--quiet", "--json");
        // B0 = 1 T, R0 = 1 m (toroidal defaults); eps = rho0/L with rho0 = v/Omega and L = R0 = 1 m
        double omega = 1.602176634e-19 / 1.67262192369e-27;
        double v = 0.01 * omega;
        double alpha = Math.toRadians(45);
        double vd = v * v / omega * (Math.cos(alpha) * Math.cos(alpha) + Math.sin(alpha) * Math.sin(alpha) / 2);
        double tc = 2 * Math.PI / omega;
        JsonNode gc = row(doc, "gc-reference");
        assertEquals("lost", gc.get("status").asText());
        assertEquals(0.05 / vd, gc.get("status_time_s").asDouble(), 0.01 * 0.05 / vd);
        JsonNode boris = row(doc, "boris");
        assertEquals("lost", boris.get("status").asText());
        double rhoPerp = v * Math.sin(alpha) / omega;
        assertEquals((0.05 - rhoPerp) / vd, boris.get("status_time_s").asDouble(), tc);
    }

    @Test
    void aMalformedGridFileIsRefusedWithExitCode2NamingTheDataset() {
        Path file = tmp.resolve("bad.h5");
        try (WritableHdfFile f = HdfFile.write(file)) {
            f.putAttribute("geometry", "cylindrical");
            f.putDataset("r_m", new double[] {0, 0.1, 0.2, 0.3});
        }
        TestCommandLine.Outcome o = TestCommandLine.exec("run", "--field", "grid:" + file);
        assertEquals(2, o.code());
        assertTrue(o.err().contains("/r_m must be > 0"), o.err());
        TestCommandLine.Outcome g = TestCommandLine.exec("grid", "--field", "tokamak", "--geometry", "axisymmetric",
                "--box", "1,2,-0.5", "--nodes", "9,9", "--out", tmp.resolve("x.h5").toString());
        assertEquals(2, g.code());
        assertTrue(g.err().contains("--box: the axisymmetric grid takes R0,R1,Z0,Z1"), g.err());
    }
}
