package org.twinorbit.harness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * {@code probe} against closed forms and against its own B by finite differences:
 * <ul>
 *   <li>toroidal B = B0 R0/R φ̂: |∇|B|| = B0 R0/R² pointing to the axis, field-line curvature
 *       1/R pointing to the axis (circles about the axis; common practice);</li>
 *   <li>dipole on the equator: |B| = B_s (R_p/r)³ and curvature radius r/3 (Jackson, Classical
 *       Electrodynamics, 1999, eq. 5.56; the r/3 from differentiating r = L cos²λ, common
 *       practice);</li>
 *   <li>every field's Jacobian column against central differences of the probed B, error
 *       O(h²) (common practice).</li>
 * </ul>
 */
class ProbeCommandTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path tmp;

    private static JsonNode probe(String... args) throws IOException {
        String[] full = new String[args.length + 2];
        full[0] = "probe";
        System.arraycopy(args, 0, full, 1, args.length);
        full[full.length - 1] = "--json";
        return JSON.readTree(TestCommandLine.succeeded(full)).get("points");
    }

    @Test
    void toroidalGradientAndCurvatureMatchTheClosedForm() throws IOException {
        // defaults B0 = 1 T at R0 = 1 m (twinorbit fields)
        JsonNode p = probe("--field", "toroidal", "--at", "0,2,0.3").get(0);
        double r = 2.0;
        assertEquals(1.0 / r, p.get("b_t").asDouble(), 1e-15);
        assertEquals(-1.0 / (r * r), p.get("grad_b_y_t_per_m").asDouble(), 1e-15);
        assertEquals(0.0, p.get("grad_b_x_t_per_m").asDouble(), 1e-15);
        assertEquals(-1.0 / r, p.get("curvature_y_per_m").asDouble(), 1e-15);
        assertTrue(p.get("in_domain").asBoolean());
    }

    @Test
    void dipoleEquatorMatchesTheDipoleFormula() throws IOException {
        double rp = 6.4e6, bs = 3e-5, r = 5 * rp;
        JsonNode p = probe("--field", "dipole", "--at", r + ",0,0").get(0);
        assertEquals(bs * Math.pow(rp / r, 3), p.get("b_t").asDouble(), 1e-12 * bs);
        double k = Math.hypot(p.get("curvature_x_per_m").asDouble(), p.get("curvature_z_per_m").asDouble());
        assertEquals(3 / r, k, 1e-12 * 3 / r);
    }

    @ParameterizedTest
    @CsvSource({"gradient, 0.2;0.1;0.3", "toroidal, 1.3;0.4;0.2", "mirror, 0.1;0.05;0.3", "dipole, 2.1e7;1.0e7;6.0e6",
            "tokamak, 1.7;0.1;0.2", "current-sheet, 1e5;2e5;3e6", "shear, 0.3;0.1;0.2"})
    void jacobianMatchesCentralDifferencesOfB(String field, String at) throws IOException {
        double[] x = java.util.Arrays.stream(at.split(";")).mapToDouble(Double::parseDouble).toArray();
        JsonNode c = probe("--field", field, "--at", x[0] + "," + x[1] + "," + x[2]).get(0);
        double scale = Math.sqrt(x[0] * x[0] + x[1] * x[1] + x[2] * x[2]);
        String[] comp = {"x", "y", "z"};
        for (int j = 0; j < 3; j++) {
            double h = 1e-5 * scale;
            double[] xp = x.clone();
            double[] xm = x.clone();
            xp[j] += h;
            xm[j] -= h;
            JsonNode p = probe("--field", field, "--at", xp[0] + "," + xp[1] + "," + xp[2]).get(0);
            JsonNode m = probe("--field", field, "--at", xm[0] + "," + xm[1] + "," + xm[2]).get(0);
            for (int i = 0; i < 3; i++) {
                String key = "db" + comp[i] + "_d" + comp[j] + "_t_per_m";
                double fd = (p.get("b" + comp[i] + "_t").asDouble() - m.get("b" + comp[i] + "_t").asDouble()) / (2 * h);
                double exact = c.get(key).asDouble();
                double tol = 1e-6 * c.get("b_t").asDouble() / scale + 1e-6 * Math.abs(exact);
                assertEquals(exact, fd, tol, field + " " + key);
            }
        }
    }

    @Test
    void pointsComeFromACsvAndBadFilesAreRefused() throws IOException {
        Path ok = tmp.resolve("points.csv");
        Files.writeString(ok, "x_m,y_m,z_m\n1.5,0,0\n\n0,1.5,0\n");
        String csv = TestCommandLine.succeeded("probe", "--field", "toroidal", "--points", ok.toString());
        assertEquals(3, csv.strip().split("\n").length, csv);
        Path header = tmp.resolve("header.csv");
        Files.writeString(header, "x,y,z\n1,0,0\n");
        TestCommandLine.Outcome h = TestCommandLine.exec("probe", "--field", "toroidal", "--points", header.toString());
        assertEquals(2, h.code());
        assertTrue(h.err().contains("must start with the header x_m,y_m,z_m"), h.err());
        Path bad = tmp.resolve("bad.csv");
        Files.writeString(bad, "x_m,y_m,z_m\n1,0,0\n1,zero,0\n");
        TestCommandLine.Outcome b = TestCommandLine.exec("probe", "--field", "toroidal", "--points", bad.toString());
        assertEquals(2, b.code());
        assertTrue(b.err().contains("line 3") && b.err().contains("'zero'"), b.err());
        TestCommandLine.Outcome none = TestCommandLine.exec("probe", "--field", "toroidal");
        assertEquals(2, none.code());
        TestCommandLine.Outcome missing = TestCommandLine.exec("probe", "--field", "toroidal", "--points",
                tmp.resolve("nowhere.csv").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("cannot read"), missing.err());
    }

    @Test
    void pointsOutsideTheDomainAreMarkedNotEvaluated() throws IOException {
        JsonNode p = probe("--field", "dipole", "--at", "1e6,0,0").get(0);   // inside the planet
        assertTrue(!p.get("in_domain").asBoolean());
        assertTrue(p.get("b_t").isNull(), p.toString());
    }
}
