package org.twinorbit.harness;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.FieldProvider;
import org.twinorbit.fields.Fields;
import org.twinorbit.fields.ParameterSpec;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ToolInfo;
import org.twinorbit.shared.Species;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code twinorbit fields}: the field library with parameters, L and invariants. */
@Command(name = "fields", mixinStandardHelpOptions = true,
        description = "List the field library: parameters with defaults and units, the length L "
                + "that defines eps = rho/L, and the invariants of the motion.")
public final class FieldsCommand implements Runnable {

    /** JSON: {@code tool} ({@link ToolInfo}), then {@code fields}: name, description, parameters, length_meaning, l_m, ... */
    @Option(names = "--json", description = "Print the listing as JSON.")
    boolean json;

    @Option(names = "--grid-file", paramLabel = "FILE", description = "Describe this grid file instead of the library: "
            + "its grid, L, domain, invariants and the largest |div B| L/|B| of its interpolant over the cell centres.")
    java.nio.file.Path gridFile;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        PrintWriter out = spec.commandLine().getOut();
        List<Map<String, Object>> rows = new ArrayList<>();
        if (gridFile != null) {
            rows.add(describe(org.twinorbit.fields.GridFile.read(gridFile)));
        } else {
            for (FieldProvider p : Fields.all()) {
                rows.add(describe(p));
            }
        }
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("fields", rows);
            out.print(ResultJson.write(ToolInfo.stamped(doc)));
        } else {
            for (Map<String, Object> r : rows) {
                printText(out, r);
            }
        }
        out.flush();
    }

    /** The facts listed for one field; L is computed with the default parameters. */
    static Map<String, Object> describe(FieldProvider p) {
        Map<String, Object> r = new LinkedHashMap<>();
        r.put("name", p.name());
        r.put("description", p.description());
        List<Map<String, Object>> params = new ArrayList<>();
        for (ParameterSpec s : p.parameters()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", s.name());
            m.put("default", s.defaultValue());
            m.put("unit", s.unit());
            m.put("allowed", s.allowed());
            m.put("description", s.description());
            params.add(m);
        }
        r.put("parameters", params);
        Field f = Fields.create(p.name(), Species.PROTON);
        r.put("length_meaning", p.lengthMeaning());
        r.put("l_m", Double.isFinite(f.length()) ? f.length() : null);
        if (!f.isStatic()) {
            r.put("time_scale_s_for_proton", f.timeScale());
        }
        r.put("domain", f.domainMeaning());
        r.put("invariants", p.invariantsMeaning());
        return r;
    }

    /** The facts listed for a grid file. */
    static Map<String, Object> describe(org.twinorbit.fields.GriddedField g) {
        Map<String, Object> r = new LinkedHashMap<>();
        r.put("name", g.name());
        r.put("description", g.gridSummary());
        r.put("parameters", List.of());
        r.put("length_meaning", g.lengthMeaning());
        r.put("l_m", g.length());
        r.put("domain", g.domainMeaning());
        r.put("invariants", g.hasElectricField() ? "energy (W = kinetic + q Phi)" : "energy");
        r.put("geometry", g.geometry().key());
        r.put("max_div_b", g.maxDivergence());
        return r;
    }

    @SuppressWarnings("unchecked")
    private static void printText(PrintWriter out, Map<String, Object> r) {
        out.printf("%s — %s%n", r.get("name"), r.get("description"));
        for (Map<String, Object> m : (List<Map<String, Object>>) r.get("parameters")) {
            out.printf("    %-12s = %-10s %-8s %s (%s)%n", m.get("name"), Format.number((double) m.get("default")),
                    m.get("unit"), m.get("description"), m.get("allowed"));
        }
        Object l = r.get("l_m");
        out.printf("    L: %s%s%n", r.get("length_meaning"), l == null ? "" : " = " + Format.number((double) l) + " m");
        if (r.containsKey("time_scale_s_for_proton")) {
            out.printf("    time scale for a proton: %s s%n", Format.number((double) r.get("time_scale_s_for_proton")));
        }
        out.printf("    domain: %s%n", r.get("domain"));
        if (r.containsKey("max_div_b")) {
            out.printf("    max |div B| L/|B| of the interpolant over the cell centres: %s%n",
                    Format.number((double) r.get("max_div_b")));
        }
        out.printf("    invariants: %s%n%n", r.get("invariants"));
    }
}
