package org.twinorbit.harness.score;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.Fields;
import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.fullorbit.FullOrbitStepper;
import org.twinorbit.shared.Species;

/**
 * Plays the part of an outside code in tests: reads an export (manifest.json and
 * initial-states.csv) as a C or Python program would, pushes every run the manifest asks for
 * with a given scheme, and writes the trajectory files in the documented layout.
 */
final class OutsideCode {

    private OutsideCode() {}

    static void push(Path caseDir, FullOrbitPusher scheme) throws IOException {
        JsonNode m = new ObjectMapper().readTree(caseDir.resolve("manifest.json").toFile());
        Species s = Species.parse(m.get("case").get("species").asText());
        Field f = field(m, s);
        List<String> init = Files.readAllLines(caseDir.resolve("initial-states.csv"));
        for (JsonNode run : m.get("runs")) {
            double dt = run.get("dt_s").asDouble();
            long steps = run.get("steps").asLong();
            StringBuilder sb = new StringBuilder("phase,t_s,x_m,y_m,z_m,ux_m_per_s,uy_m_per_s,uz_m_per_s\n");
            for (JsonNode ph : run.get("phases")) {
                int k = ph.asInt();
                double[] v = java.util.Arrays.stream(init.get(k + 1).split(",")).mapToDouble(Double::parseDouble).toArray();
                FullOrbitStepper st = scheme.stepper(f, s, dt);
                st.start(0, new double[] {v[1], v[2], v[3]}, new double[] {v[4], v[5], v[6]});
                double[] x = new double[3];
                double[] u = new double[3];
                for (long i = 0; i <= steps; i++) {
                    if (i > 0 && !st.step()) {
                        break;
                    }
                    st.position(x);
                    st.velocity(u);
                    sb.append(k).append(',').append(i * dt).append(',').append(x[0]).append(',').append(x[1]).append(',')
                            .append(x[2]).append(',').append(u[0]).append(',').append(u[1]).append(',').append(u[2])
                            .append('\n');
                }
            }
            Files.writeString(caseDir.resolve(run.get("trajectory_file").asText()), sb.toString());
        }
    }

    /** The same for an outside guiding-center integrator: every run of the manifest's guiding_center section. */
    static void pushGuidingCenter(Path caseDir, org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrator scheme)
            throws IOException {
        JsonNode m = new ObjectMapper().readTree(caseDir.resolve("manifest.json").toFile());
        Species s = Species.parse(m.get("case").get("species").asText());
        Field f = field(m, s);
        JsonNode gc = m.get("guiding_center");
        JsonNode start = gc.get("start");
        double[] x0 = {start.get("x_m").get(0).asDouble(), start.get("x_m").get(1).asDouble(),
            start.get("x_m").get(2).asDouble()};
        double p0 = start.get("p_par_kg_m_per_s").asDouble();
        double mu = start.get("mu_j_per_t").asDouble();
        for (JsonNode run : gc.get("runs")) {
            double dt = run.get("dt_s").asDouble();
            long steps = run.get("steps").asLong();
            org.twinorbit.integrators.guidingcenter.GuidingCenterStepper st = scheme.stepper(f, s, mu, dt);
            st.start(0, x0.clone(), p0);
            StringBuilder sb = new StringBuilder("t_s,x_m,y_m,z_m,p_par_kg_m_per_s\n");
            double[] x = new double[3];
            for (long i = 0; i <= steps; i++) {
                if (i > 0 && !st.step()) {
                    break;
                }
                st.position(x);
                sb.append(i * dt).append(',').append(x[0]).append(',').append(x[1]).append(',').append(x[2]).append(',')
                        .append(st.parallelMomentum()).append('\n');
            }
            Files.writeString(caseDir.resolve(run.get("trajectory_file").asText()), sb.toString());
        }
    }

    /** The field the manifest names, with its parameters. */
    private static Field field(JsonNode m, Species s) {
        JsonNode c = m.get("case");
        java.util.Map<String, Double> params = new java.util.LinkedHashMap<>();
        c.get("field_parameters").fields().forEachRemaining(e -> params.put(e.getKey(), e.getValue().asDouble()));
        return Fields.create(c.get("field").asText(), params, s);
    }
}
