package org.twinorbit.harness;

import org.twinorbit.integrators.fullorbit.FullOrbitPusher;
import org.twinorbit.integrators.guidingcenter.GuidingCenterIntegrator;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ToolInfo;
import org.twinorbit.harness.run.References;
import org.twinorbit.harness.run.Registry;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code twinorbit integrators}: every full-orbit pusher and guiding-center integrator. */
@Command(name = "integrators", mixinStandardHelpOptions = true,
        description = "List the full-orbit pushers and guiding-center integrators: name, model, order, properties, method.")
public final class IntegratorsCommand implements Runnable {

    @Option(names = "--json", description = "Print the listing as JSON.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        List<Map<String, Object>> rows = new ArrayList<>();
        for (FullOrbitPusher p : Registry.pushers()) {
            rows.add(entry(p.name(), "full-orbit", p.order(), List.copyOf(new java.util.TreeSet<>(p.properties())),
                    p.description()));
        }
        for (GuidingCenterIntegrator g : Registry.guidingCenterIntegrators()) {
            rows.add(entry(g.name(), "guiding-center", g.order(), List.copyOf(new java.util.TreeSet<>(g.properties())),
                    g.description()));
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("integrators", rows);
            Map<String, Object> refs = new LinkedHashMap<>();
            refs.put("full_orbit", References.fullOrbitMethod());
            refs.put("guiding_center", References.guidingCenterMethod());
            doc.put("references", refs);
            out.print(ResultJson.write(ToolInfo.stamped(doc)));
        } else {
            org.twinorbit.harness.report.TextTable t = new org.twinorbit.harness.report.TextTable(
                    List.of("name", "model", "order", "properties"));
            for (Map<String, Object> r : rows) {
                t.add(List.of((String) r.get("name"), (String) r.get("model"), r.get("order").toString(),
                        String.join(", ", castList(r.get("properties")))));
            }
            out.print(t.aligned());
            out.println();
            for (Map<String, Object> r : rows) {
                out.printf("%-14s %s%n", r.get("name"), r.get("description"));
            }
            out.println();
            out.println("references: full orbit — " + References.fullOrbitMethod());
            out.println("            guiding center — " + References.guidingCenterMethod());
        }
        out.flush();
    }

    private static Map<String, Object> entry(String name, String model, int order, List<String> props, String desc) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", name);
        m.put("model", model);
        m.put("order", order);
        m.put("properties", props);
        m.put("description", desc);
        return m;
    }

    @SuppressWarnings("unchecked")
    private static List<String> castList(Object o) {
        return (List<String>) o;
    }
}
