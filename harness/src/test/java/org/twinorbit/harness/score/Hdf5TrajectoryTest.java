package org.twinorbit.harness.score;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.jhdf.HdfFile;
import io.jhdf.WritableHdfFile;
import io.jhdf.api.WritableGroup;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.twinorbit.harness.TestCommandLine;
import org.twinorbit.integrators.fullorbit.Pushers;
import org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrators;

/**
 * Trajectories written back as HDF5 (the open format of the trade) score exactly as the same
 * samples in CSV: each CSV of an outside run is converted to the documented HDF5 layout with
 * the jHDF writer and removed, and the scores must not change (the same doubles reach the same
 * observers; derived). A group that is missing, or a file that is not HDF5, is refused with exit 2.
 */
class Hdf5TrajectoryTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path tmp;

    private Path exported() {
        TestCommandLine.succeeded("export", "--field", "gradient", "--eps", "0.02", "--phases", "2", "--duration", "10",
                "--out", tmp.toString());
        return tmp.resolve("gradient-proton");
    }

    /** Rewrites a full-orbit CSV trajectory as /phase_K/{t_s, x_m, u_m_per_s} and deletes the CSV. */
    private static void toHdf5(Path csv) throws IOException {
        List<String> lines = Files.readAllLines(csv);
        java.util.Map<Integer, List<double[]>> rows = new java.util.TreeMap<>();
        for (String l : lines.subList(1, lines.size())) {
            double[] v = java.util.Arrays.stream(l.split(",")).mapToDouble(Double::parseDouble).toArray();
            rows.computeIfAbsent((int) v[0], k -> new ArrayList<>()).add(v);
        }
        Path h5 = csv.resolveSibling(csv.getFileName().toString().replace(".csv", ".h5"));
        try (WritableHdfFile f = HdfFile.write(h5)) {
            for (var e : rows.entrySet()) {
                WritableGroup g = f.putGroup("phase_" + e.getKey());
                List<double[]> r = e.getValue();
                double[] t = new double[r.size()];
                double[][] x = new double[r.size()][3];
                double[][] u = new double[r.size()][3];
                for (int i = 0; i < r.size(); i++) {
                    t[i] = r.get(i)[1];
                    System.arraycopy(r.get(i), 2, x[i], 0, 3);
                    System.arraycopy(r.get(i), 5, u[i], 0, 3);
                }
                g.putDataset("t_s", t);
                g.putDataset("x_m", x);
                g.putDataset("u_m_per_s", u);
            }
        }
        Files.delete(csv);
    }

    private static void gcToHdf5(Path csv) throws IOException {
        List<String> lines = Files.readAllLines(csv);
        int n = lines.size() - 1;
        double[] t = new double[n];
        double[][] x = new double[n][3];
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            double[] v = java.util.Arrays.stream(lines.get(i + 1).split(",")).mapToDouble(Double::parseDouble).toArray();
            t[i] = v[0];
            System.arraycopy(v, 1, x[i], 0, 3);
            p[i] = v[4];
        }
        try (WritableHdfFile f = HdfFile.write(csv.resolveSibling(csv.getFileName().toString().replace(".csv", ".h5")))) {
            f.putDataset("t_s", t);
            f.putDataset("x_m", x);
            f.putDataset("p_par_kg_m_per_s", p);
        }
        Files.delete(csv);
    }

    private static JsonNode score(Path dir, String model, String order) throws IOException {
        return JSON.readTree(TestCommandLine.succeeded("score", "--export", dir.toString(), "--model", model, "--name",
                "outside", "--order", order, "--quiet", "--json"));
    }

    private static JsonNode row(JsonNode doc) {
        for (JsonNode r : doc.get("results")) {
            if (r.get("integrator").asText().equals("outside")) {
                return r;
            }
        }
        throw new AssertionError("no outside row");
    }

    @Test
    void hdf5ScoresExactlyAsCsv() throws IOException {
        Path dir = exported();
        OutsideCode.push(dir, Pushers.byName("boris"));
        OutsideCode.pushGuidingCenter(dir, GuidingCenterIntegrators.byName("gc-rk4"));
        JsonNode csvFo = row(score(dir, "full-orbit", "2"));
        JsonNode csvGc = row(score(dir, "guiding-center", "4"));
        try (var files = Files.list(dir)) {
            for (Path p : files.filter(p -> p.getFileName().toString().matches("(gc-)?trajectory.*\\.csv")).toList()) {
                if (p.getFileName().toString().startsWith("gc-")) {
                    gcToHdf5(p);
                } else {
                    toHdf5(p);
                }
            }
        }
        assertTrue(Files.exists(dir.resolve("trajectory-main.h5")) && !Files.exists(dir.resolve("trajectory-main.csv")));
        JsonNode h5Fo = row(score(dir, "full-orbit", "2"));
        JsonNode h5Gc = row(score(dir, "guiding-center", "4"));
        for (String m : List.of("energy_error", "phase_error", "position_error_rho", "mu_change")) {
            assertEquals(csvFo.get(m).toString(), h5Fo.get(m).toString(), m);
        }
        for (String m : List.of("energy_error", "drift_error", "position_error_rho")) {
            assertEquals(csvGc.get(m).toString(), h5Gc.get(m).toString(), m);
        }
    }

    @Test
    void aMissingGroupOrAFileThatIsNotHdf5IsRefused() throws IOException {
        Path dir = exported();
        OutsideCode.push(dir, Pushers.byName("boris"));
        toHdf5(dir.resolve("trajectory-main.csv"));
        Path h5 = dir.resolve("trajectory-main.h5");
        try (WritableHdfFile f = HdfFile.write(h5)) {
            f.putGroup("phase_0").putDataset("t_s", new double[] {0.0});
        }
        TestCommandLine.Outcome o = TestCommandLine.exec("score", "--export", dir.toString(), "--order", "2", "--quiet");
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("dataset /phase_0/x_m is missing") || o.err().contains("phase_1 is missing"), o.err());
        Files.writeString(h5, "phase,t_s\n0,0\n");
        TestCommandLine.Outcome n = TestCommandLine.exec("score", "--export", dir.toString(), "--order", "2", "--quiet");
        assertEquals(2, n.code(), n.out() + n.err());
        assertTrue(n.err().contains("not a readable HDF5 trajectory"), n.err());
    }
}
