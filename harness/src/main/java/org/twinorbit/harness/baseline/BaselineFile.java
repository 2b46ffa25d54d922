package org.twinorbit.harness.baseline;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.BadInputException;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ToolInfo;

/**
 * The baseline file: schema-versioned JSON, written atomically, with no wall-clock time in it
 * (for one build it is the same bytes on every machine and thread count).
 *
 * <pre>
 * schema:          "twinorbit-baseline"
 * schema_version:  1 ({@link Baseline#SCHEMA_VERSION}); a check refuses any other
 * tool:            name, version, git_commit of the build that wrote it
 * kind:            run | suite --quick | suite | scan
 * cases:           (run, suite) every case fully resolved: name, field, field_parameters,
 *                  species {name, mass_kg, charge_c}, start_m ([x,y,z] m or null: the field's),
 *                  energy_ev or eps (the other null), pitch_deg, phases, duration, duration_unit,
 *                  pushers, steps_per_gyro, gc_integrators, gc_step_gyro, reference_rtol, gc_start
 * scan:            (scan) field, field_parameters, species, start_m, energy_ev (ramp, wave; else
 *                  null), eps_min, eps_max, points, pitch_deg [..], phases, duration,
 *                  duration_unit, reference_rtol, gc_start, integrators, tolerances
 *                  {metric: [..]}, statistic
 * rows:            one per case and integrator (scan: per point and per threshold):
 *                  case, row, labels {status, orbit_class, mu_jump_from, verdict | outcome},
 *                  values {metric.summary: number | null (not defined) | "inf" | "-inf"}
 * </pre>
 */
public final class BaselineFile {

    private static final ObjectMapper JSON = new ObjectMapper();

    private BaselineFile() {}

    /** Writes {@code b} to {@code file} atomically, stamped with this build's tool object. */
    public static void write(Baseline b, Path file) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("schema", Baseline.SCHEMA);
        m.put("schema_version", Baseline.SCHEMA_VERSION);
        m.put("tool", ToolInfo.json());
        m.put("kind", b.kind().label());
        if (b.kind() == Baseline.Kind.SCAN) {
            m.put("scan", b.scan());
        } else {
            List<Object> cases = new ArrayList<>();
            for (Case c : b.cases()) {
                cases.add(CaseDefinition.write(c));
            }
            m.put("cases", cases);
        }
        List<Object> rows = new ArrayList<>();
        for (MeasuredRow r : b.rows()) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("case", r.caseName());
            o.put("row", r.row());
            o.put("labels", r.labels());
            Map<String, Object> v = new LinkedHashMap<>();
            r.values().forEach((k, x) -> v.put(k, JsonFields.write(x)));
            o.put("values", v);
            rows.add(o);
        }
        m.put("rows", rows);
        AtomicFiles.write(file, ResultJson.write(m));
    }

    /**
     * @throws BadInputException for a missing, unreadable or corrupt file, or one of another
     *         schema version, naming the file and what is wrong
     */
    public static Baseline read(Path file) {
        String text;
        try {
            text = Files.readString(file);
        } catch (NoSuchFileException e) {
            throw new BadInputException("baseline: no such file " + file);
        } catch (IOException e) {
            throw new BadInputException("baseline: cannot read " + file + ": " + e.getMessage());
        }
        JsonNode root;
        try {
            root = JSON.readTree(text);
        } catch (JsonProcessingException e) {
            throw new BadInputException("baseline " + file + ": not valid JSON (line " + e.getLocation().getLineNr()
                    + ", column " + e.getLocation().getColumnNr() + "): " + e.getOriginalMessage());
        }
        String source = "baseline " + file;
        if (root == null || !root.isObject() || !Baseline.SCHEMA.equals(root.path("schema").asText(null))) {
            throw new BadInputException(source + ": not a twinorbit baseline (it needs \"schema\": \""
                    + Baseline.SCHEMA + "\"; write one with 'twinorbit baseline FILE suite --quick')");
        }
        JsonNode version = root.get("schema_version");
        if (version == null || !version.isInt() || version.asInt() != Baseline.SCHEMA_VERSION) {
            throw new BadInputException(source + ": schema_version " + version + " is not supported; this twinorbit ("
                    + ToolInfo.version() + ") reads schema_version " + Baseline.SCHEMA_VERSION
                    + " only: write the baseline again with this build ('twinorbit baseline')");
        }
        JsonFields f = new JsonFields(source);
        Map<String, Object> tool = new LinkedHashMap<>();
        JsonNode t = f.object(root, "tool", "");
        t.fields().forEachRemaining(e -> tool.put(e.getKey(), e.getValue().asText()));
        Baseline.Kind kind;
        try {
            kind = Baseline.Kind.parse(f.text(root, "kind", ""));
        } catch (IllegalArgumentException e) {
            throw f.bad("kind", e.getMessage());
        }
        List<Case> cases = new ArrayList<>();
        JsonNode scan = null;
        if (kind == Baseline.Kind.SCAN) {
            scan = f.object(root, "scan", "");
        } else {
            JsonNode list = f.array(root, "cases", "");
            for (int i = 0; i < list.size(); i++) {
                cases.add(CaseDefinition.read(list.get(i), f, "cases[" + i + "]."));
            }
            if (cases.isEmpty()) {
                throw f.bad("cases", "holds no case");
            }
        }
        List<MeasuredRow> rows = new ArrayList<>();
        JsonNode list = f.array(root, "rows", "");
        for (int i = 0; i < list.size(); i++) {
            JsonNode r = list.get(i);
            String p = "rows[" + i + "].";
            rows.add(new MeasuredRow(f.text(r, "case", p), f.text(r, "row", p), f.textMap(r, "labels", p),
                    f.numberMap(r, "values", p)));
        }
        return new Baseline(kind, tool, cases, scan, rows);
    }
}
