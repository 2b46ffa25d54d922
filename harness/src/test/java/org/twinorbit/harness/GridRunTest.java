package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A gridded field end to end: {@code grid} samples the paraxial mirror, and {@code run --field
 * grid:FILE} on it gives the analytic mirror's numbers. Every component of the paraxial mirror is
 * a polynomial of degree at most 2 in each coordinate (B_z = B0(1 + (Rm − 1) z²/Lm²),
 * B_r = −(r/2) dB_z/dz; docs/design.md), which central differences and cubic Hermite
 * interpolation reproduce exactly (derived), so the two runs agree to round-off (1e-9 here).
 */
class GridRunTest {

    @TempDir
    Path tmp;

    private static JsonNode model(JsonNode doc) {
        for (JsonNode r : doc.get("results")) {
            if (r.get("error_kind").asText().equals("model")) {
                return r;
            }
        }
        throw new AssertionError("no model row");
    }

    @Test
    void aGriddedMirrorRunsLikeTheAnalyticOne() throws IOException {
        Path file = tmp.resolve("mirror.h5");
        String wrote = TestCommandLine.succeeded("grid", "--field", "mirror", "--box", "-0.3,0.3,-0.3,0.3,-1,1",
                "--nodes", "7,7,9", "--out", file.toString());
        assertTrue(wrote.contains("use it as --field grid:"), wrote);
        String[] common = {"--start", "0.1,0,0", "--eps", "0.02", "--pitch", "60", "--duration", "1", "--duration-unit",
            "bounces", "--pushers", "none", "--gc-integrators", "none", "--phases", "2", "--quiet", "--json"};
        String[] grid = new String[common.length + 3];
        grid[0] = "run";
        grid[1] = "--field";
        grid[2] = "grid:" + file;
        System.arraycopy(common, 0, grid, 3, common.length);
        String[] analytic = grid.clone();
        analytic[2] = "mirror";
        ObjectMapper json = new ObjectMapper();
        JsonNode a = model(json.readTree(TestCommandLine.succeeded(analytic)));
        JsonNode g = model(json.readTree(TestCommandLine.succeeded(grid)));
        for (String m : new String[] {"bounce_period_s", "mu_change", "drift_error"}) {
            double x = a.get(m).get("worst").asDouble();
            assertEquals(x, g.get(m).get("worst").asDouble(), 1e-9 * Math.abs(x) + 1e-15, m);
        }
        TestCommandLine.Outcome missing = TestCommandLine.exec("run", "--field", "grid:" + tmp.resolve("none.h5"));
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("no such file"), missing.err());
    }

    /** An export can carry the field on a grid, in the same layout; it reads back as the field. */
    @Test
    void anExportCarriesTheFieldOnAGridWhenAsked() {
        TestCommandLine.succeeded("export", "--field", "mirror", "--eps", "0.02", "--grid-box", "-0.3,0.3,-0.3,0.3,-1,1",
                "--grid-nodes", "5,5,9", "--out", tmp.toString());
        Path grid = tmp.resolve("mirror-proton").resolve("field-grid.h5");
        org.twinorbit.fields.Field g = org.twinorbit.fields.GridFile.read(grid);
        org.twinorbit.shared.FieldSample s = new org.twinorbit.shared.FieldSample();
        g.evaluate(0, 0.05, 0.02, 0.4, s);
        // B_z = B0 (1 + (Rm - 1) z^2 / Lm^2) with B0 = 0.5 T, Rm = 4, Lm = 1 m (docs/design.md)
        assertEquals(0.5 * (1 + 3 * 0.16), s.bz, 1e-12);
    }

    /** {@code grid --wall} stores a wall polygon that the file's domain then names; bad corner lists exit 2. */
    @Test
    void gridStoresAWallAndRefusesBadCorners() {
        Path file = tmp.resolve("walled.h5");
        String wrote = TestCommandLine.succeeded("grid", "--field", "tokamak", "--geometry", "axisymmetric", "--box",
                "0.95,2.05,-0.55,0.55", "--nodes", "6,6", "--wall", "1.1,-0.4,1.9,-0.4,1.9,0.4,1.1,0.4", "--out",
                file.toString());
        assertTrue(wrote.contains("wall: 4 corners in (R, Z)"), wrote);
        org.twinorbit.fields.Field g = org.twinorbit.fields.GridFile.read(file);
        assertTrue(g.inDomain(1.5, 0, 0) && !g.inDomain(1.5, 0, 0.45) && !g.inDomain(1.0, 0, 0));
        String[] grid = {"grid", "--field", "tokamak", "--geometry", "axisymmetric", "--box", "0.95,2.05,-0.55,0.55",
            "--nodes", "6,6", "--out", tmp.resolve("bad.h5").toString(), "--wall", ""};
        for (String[] bad : new String[][] {{"1.1,-0.4,1.9,-0.4,1.9"}, {"1.1,-0.4,1.9,-0.4"}}) {
            grid[grid.length - 1] = bad[0];
            TestCommandLine.Outcome o = TestCommandLine.exec(grid);
            assertEquals(2, o.code(), o.err());
            assertTrue(o.err().contains("--wall:"), o.err());
        }
    }
}
