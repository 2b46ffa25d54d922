package org.twinorbit.harness.export;

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
import org.twinorbit.shared.Constants;
import org.twinorbit.shared.Species;

/**
 * {@code export} writes what an outside code needs, and it is what a run integrates. Checked
 * against the definitions of the case, not against the exporter's own code:
 * <ul>
 *   <li>every particle has the case's kinetic energy, (γ − 1) m c² with γ² = 1 + |u|²/c², and
 *       its pitch angle to b at the start (b = ẑ on the mirror axis), and lies ρ0 sin α from
 *       the guiding center with ρ0 = p/(|q| B0) (zeroth-order placement; common practice);</li>
 *   <li>the field card holds at least 50 points and, on the axis of the paraxial mirror,
 *       B_z = B0 (1 + (Rm − 1) z²/Lm²) (docs/design.md mirror field; Chen, Introduction to Plasma
 *       Physics, 1984, §2.3.3);</li>
 *   <li>the main run spans the end time in whole steps, and the convergence sweep halves dt
 *       at the same span (derived).</li>
 * </ul>
 */
class CaseExportTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path tmp;

    @Test
    void initialStatesHaveTheCaseEnergyPitchAndGyroradius() throws IOException {
        TestCommandLine.succeeded("export", "--field", "mirror", "--eps", "0.05", "--pitch", "60", "--phases", "6",
                "--duration", "2", "--duration-unit", "bounces", "--out", tmp.toString());
        Path dir = tmp.resolve("mirror-proton");
        JsonNode m = JSON.readTree(dir.resolve("manifest.json").toFile());
        assertEquals(1, m.get("schema_version").asInt());
        double energyEv = m.get("case").get("energy_ev").asDouble();
        double rho = m.get("case").get("rho_m").asDouble();
        List<String> rows = Files.readAllLines(dir.resolve("initial-states.csv"));
        assertEquals("phase,x_m,y_m,z_m,ux_m_per_s,uy_m_per_s,uz_m_per_s", rows.get(0));
        assertEquals(7, rows.size());
        Species p = Species.PROTON;
        double c2 = Constants.C * Constants.C;
        for (String row : rows.subList(1, rows.size())) {
            double[] v = java.util.Arrays.stream(row.split(",")).mapToDouble(Double::parseDouble).toArray();
            double u2 = v[4] * v[4] + v[5] * v[5] + v[6] * v[6];
            double gamma = Math.sqrt(1 + u2 / c2);
            double kinetic = (gamma - 1) * p.mass() * c2 / Constants.E;
            assertEquals(energyEv, kinetic, 1e-9 * energyEv, row);
            assertEquals(Math.cos(Math.toRadians(60)), v[6] / Math.sqrt(u2), 1e-12, row);
            assertEquals(rho * Math.sin(Math.toRadians(60)), Math.hypot(v[1], v[2]), 1e-12 * rho, row);
            assertEquals(0.0, v[3], 0.0, row);
        }
        // the HDF5 copy holds the very same doubles
        try (io.jhdf.HdfFile h = new io.jhdf.HdfFile(dir.resolve("initial-states.h5"))) {
            double[][] x = (double[][]) h.getDatasetByPath("/x_m").getData();
            double[][] u = (double[][]) h.getDatasetByPath("/u_m_per_s").getData();
            for (int k = 0; k < 6; k++) {
                double[] v = java.util.Arrays.stream(rows.get(k + 1).split(",")).mapToDouble(Double::parseDouble).toArray();
                assertEquals(v[1], x[k][0], 0.0);
                assertEquals(v[6], u[k][2], 0.0);
            }
        }
    }

    @Test
    void runsSpanTheEndTimeAndTheSweepHalvesTheStep() throws IOException {
        TestCommandLine.succeeded("export", "--field", "gradient", "--eps", "0.01", "--duration", "10",
                "--out", tmp.toString());
        JsonNode m = JSON.readTree(tmp.resolve("gradient-proton").resolve("manifest.json").toFile());
        JsonNode runs = m.get("runs");
        JsonNode main = runs.get(0);
        assertEquals("main", main.get("purpose").asText());
        double end = m.get("case").get("end_time_s").asDouble();
        assertEquals(end, main.get("dt_s").asDouble() * main.get("steps").asLong(), 1e-12 * end);
        assertEquals(1, main.get("output_every_steps").asInt());
        assertEquals(4, runs.size(), "main and sweep levels 1-3");
        double span = runs.get(1).get("dt_s").asDouble() * runs.get(1).get("steps").asLong();
        for (int l = 1; l < runs.size(); l++) {
            JsonNode r = runs.get(l);
            assertEquals("convergence", r.get("purpose").asText());
            assertEquals(l, r.get("level").asInt());
            assertEquals(main.get("dt_s").asDouble() / (1 << l), r.get("dt_s").asDouble(), 1e-15 * end);
            assertEquals(span, r.get("dt_s").asDouble() * r.get("steps").asLong(), 1e-12 * span);
        }
    }

    @Test
    void theMessageNamesEveryFileWritten() throws IOException {
        String said = TestCommandLine.succeeded("export", "--field", "gradient", "--eps", "0.05", "--out", tmp.toString());
        try (var files = Files.list(tmp.resolve("gradient-proton"))) {
            for (Path f : files.toList()) {
                assertTrue(said.contains(f.getFileName().toString()), f.getFileName() + " not named in: " + said);
            }
        }
    }

    /** A field read from a file has no provider: export must still describe and tabulate it (it failed before). */
    @Test
    void aG_EqdskCaseIsExportedWithItsFieldCard() throws IOException {
        String field = "geqdsk:../examples/geqdsk-demo/shaped-deuteron.geqdsk";
        TestCommandLine.succeeded("export", "--field", field, "--species", "deuteron", "--energy", "20e3", "--pitch", "75",
                "--duration", "20", "--out", tmp.toString());
        // the case folder is named after the file, not its path (a path would have put it elsewhere)
        Path dir = tmp.resolve("geqdsk-shaped-deuteron-deuteron");
        JsonNode card = JSON.readTree(dir.resolve("field-card.json").toFile());
        assertEquals(field, card.get("field").asText());
        assertTrue(card.get("invariants").asText().contains("energy"), card.toString());
        assertTrue(Files.readString(dir.resolve("case.csv")).contains("field," + field), "case.csv names the file");
        // a card row is the field at that point, as probe gives it
        List<String> rows = Files.readAllLines(dir.resolve("field-card.csv"));
        String[] row = rows.get(10).split(",");
        String again = TestCommandLine.succeeded("probe", "--field", field, "--species", "deuteron",
                "--at", row[0] + "," + row[1] + "," + row[2]);
        assertEquals(rows.get(10), again.strip().split("\n")[1]);
    }

    @Test
    void fieldCardMatchesTheMirrorOnItsAxis() throws IOException {
        TestCommandLine.succeeded("export", "--field", "mirror", "--eps", "0.05", "--out", tmp.toString());
        Path dir = tmp.resolve("mirror-proton");
        JsonNode card = JSON.readTree(dir.resolve("field-card.json").toFile());
        double b0 = 0, rm = 0, lm = 0;
        for (JsonNode p : card.get("parameters")) {
            switch (p.get("name").asText()) {
                case "B0" -> b0 = p.get("value").asDouble();
                case "Rm" -> rm = p.get("value").asDouble();
                case "Lm" -> lm = p.get("value").asDouble();
                default -> { }
            }
        }
        List<String> rows = Files.readAllLines(dir.resolve("field-card.csv"));
        List<String> cols = List.of(rows.get(0).split(","));
        assertEquals(card.get("table_columns").size(), cols.size());
        long inside = rows.stream().skip(1).filter(r -> r.endsWith(",true")).count();
        assertTrue(inside >= 50, inside + " points in the domain");
        double z = 0.3;
        String probe = TestCommandLine.succeeded("probe", "--field", "mirror", "--at", "0,0," + z);
        String[] v = probe.strip().split("\n")[1].split(",");
        assertEquals(b0 * (1 + (rm - 1) * z * z / (lm * lm)), Double.parseDouble(v[cols.indexOf("bz_t")]),
                1e-12 * b0);
        // every card row equals the probe at its point
        String[] row = rows.get(10).split(",");
        String again = TestCommandLine.succeeded("probe", "--field", "mirror", "--at", row[0] + "," + row[1] + "," + row[2]);
        assertEquals(rows.get(10), again.strip().split("\n")[1]);
    }

    @Test
    void aSuiteIsExportedCaseByCaseAndBadOptionsAreRefused() throws IOException {
        TestCommandLine.succeeded("export", "--suite", "quick", "--out", tmp.toString());
        JsonNode index = JSON.readTree(tmp.resolve("index.json").toFile());
        assertTrue(index.get("cases").size() >= 10);
        for (JsonNode name : index.get("cases")) {
            assertTrue(Files.exists(tmp.resolve(name.asText()).resolve("manifest.json")), name.asText());
        }
        TestCommandLine.Outcome suite = TestCommandLine.exec("export", "--suite", "medium", "--out", tmp.toString());
        assertEquals(2, suite.code());
        assertTrue(suite.err().contains("allowed: quick, full"), suite.err());
    }
}
