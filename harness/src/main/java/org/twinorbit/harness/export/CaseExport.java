package org.twinorbit.harness.export;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.fields.Field;
import org.twinorbit.fields.FieldProvider;
import org.twinorbit.fields.Fields;
import org.twinorbit.fields.ParameterSpec;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.report.AtomicFiles;
import org.twinorbit.harness.report.ResultJson;
import org.twinorbit.harness.report.ToolInfo;
import org.twinorbit.harness.run.CaseRunner;
import org.twinorbit.harness.run.RunSchedule;
import org.twinorbit.shared.FieldSample;

/**
 * The exported form of a case, for codes that cannot load this jar. One directory per case:
 * <pre>
 * manifest.json       schema "twinorbit-case-export", schema_version; tool {name, version,
 *                     git_commit}; case {name, field, field_parameters, species, mass_kg,
 *                     charge_c, energy_ev, pitch_deg, eps, rho_m, gyro_period_s, phases,
 *                     duration, duration_unit, end_time_s, bounce_period_s}; definition (the
 *                     case in the keys of a case file, for the scorer); time_origin_s (0);
 *                     initial_states (file name); runs [{purpose: main | convergence, level,
 *                     dt_s, steps, phases (list of phase indices), output_every_steps (1: every
 *                     step, the first sample the initial state), trajectory_file}]: the main run
 *                     of every phase, and levels 1–3 of the convergence sweep (dt/2, dt/4,
 *                     dt/8) for phase 0 — level 0 is the main run's phase 0;
 *                     trajectory_columns; guiding_center {start {x_m, p_par_kg_m_per_s,
 *                     mu_j_per_t}, runs [{level 0 (the run) to 3 (dt/8), dt_s, steps,
 *                     trajectory_file}], trajectory_columns} for an outside guiding-center
 *                     integrator (one shared guiding center, μ constant); field_card,
 *                     field_card_table
 * gc-start.csv        x_m, y_m, z_m, p_par_kg_m_per_s, mu_j_per_t: the same start as CSV
 * gc-runs.csv         level, dt_s, steps, trajectory_file: the same runs as CSV
 * case.csv            key,value,unit: field, mass, charge, field.NAME for each parameter (the
 *                     same facts for readers without JSON)
 * runs.csv            purpose,level,dt_s,steps,phases,trajectory_file: the runs of the manifest,
 *                     phases space-separated
 * initial-states.h5   the same in HDF5: /x_m and /u_m_per_s, [phases][3]
 * initial-states.csv  phase, x_m, y_m, z_m, ux_m_per_s, uy_m_per_s, uz_m_per_s: every gyrophase
 *                     at t = 0, u = γv (the state a pusher starts from; a leapfrog scheme offsets
 *                     its own half step)
 * field-card.json     the field in words: name, description, parameters [{name, value, unit,
 *                     description}], length_meaning, l_m, domain, invariants; the sample table's
 *                     file and columns
 * field-card.csv      the columns of {@code twinorbit probe} at {@value #CARD_SIDE}³ points around
 *                     the start (±{@value #CARD_HALF_WIDTH_RHO} ρ0 a side), so an outside field
 *                     implementation can test itself point by point
 * </pre>
 * A trajectory written back (one file per run, columns {@link #TRAJECTORY_COLUMNS}, a row per
 * phase and sample, time increasing within each phase, the first sample at t = 0) is what a
 * scorer reads. All quantities SI.
 */
public final class CaseExport {

    /** The layout version: raised when a file or a key changes meaning. */
    public static final int SCHEMA_VERSION = 1;
    /** Points per side of the field card's sample grid (64 points). */
    static final int CARD_SIDE = 4;
    /** Half-width of the sample grid, in initial gyroradii. */
    static final double CARD_HALF_WIDTH_RHO = 5;
    /** Columns of a guiding-center trajectory file written back by an outside code (μ is constant). */
    public static final List<String> GC_TRAJECTORY_COLUMNS = List.of("t_s", "x_m", "y_m", "z_m", "p_par_kg_m_per_s");

    /** Columns of a trajectory file written back by an outside code. */
    public static final List<String> TRAJECTORY_COLUMNS = List.of("phase", "t_s", "x_m", "y_m", "z_m", "ux_m_per_s",
            "uy_m_per_s", "uz_m_per_s");

    private CaseExport() {}

    /** Writes the four files of case c into dir. */
    public static void write(Case c, Path dir) {
        RunSchedule s = CaseRunner.schedule(c);
        ResolvedCase rc = s.resolved();
        AtomicFiles.write(dir.resolve("initial-states.csv"), initialStates(s));
        // the same states in HDF5 for codes that read that rather than CSV: /x_m and /u_m_per_s [phases][3]
        try (io.jhdf.WritableHdfFile h = io.jhdf.HdfFile.write(dir.resolve("initial-states.h5"))) {
            h.putDataset("x_m", s.x0());
            h.putDataset("u_m_per_s", s.u0());
        }
        AtomicFiles.write(dir.resolve("case.csv"), caseTable(rc));
        AtomicFiles.write(dir.resolve("runs.csv"), runTable(s));
        AtomicFiles.write(dir.resolve("gc-start.csv"), guidingCenterStart(s));
        AtomicFiles.write(dir.resolve("gc-runs.csv"), guidingCenterRunTable(s));
        AtomicFiles.write(dir.resolve("field-card.csv"), cardTable(rc));
        AtomicFiles.write(dir.resolve("field-card.json"), ResultJson.write(ToolInfo.stamped(card(rc))));
        AtomicFiles.write(dir.resolve("manifest.json"), ResultJson.write(ToolInfo.stamped(manifest(s))));
    }

    /** index.json beside the case directories of an exported suite. */
    public static void writeIndex(List<String> caseNames, Path dir) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("schema", "twinorbit-case-export-index");
        m.put("schema_version", SCHEMA_VERSION);
        m.put("cases", caseNames);
        AtomicFiles.write(dir.resolve("index.json"), ResultJson.write(ToolInfo.stamped(m)));
    }

    static String initialStates(RunSchedule s) {
        StringBuilder sb = new StringBuilder("phase,x_m,y_m,z_m,ux_m_per_s,uy_m_per_s,uz_m_per_s\n");
        for (int k = 0; k < s.x0().length; k++) {
            double[] x = s.x0()[k];
            double[] u = s.u0()[k];
            sb.append(k).append(',').append(x[0]).append(',').append(x[1]).append(',').append(x[2]).append(',')
                    .append(u[0]).append(',').append(u[1]).append(',').append(u[2]).append('\n');
        }
        return sb.toString();
    }

    /** key,value,unit rows: species, field and its parameters, for readers without JSON. */
    static String caseTable(ResolvedCase rc) {
        Case c = rc.spec();
        StringBuilder sb = new StringBuilder("key,value,unit\n");
        sb.append("field,").append(c.field()).append(",\n");
        sb.append("mass,").append(c.species().mass()).append(",kg\n");
        sb.append("charge,").append(c.species().charge()).append(",C\n");
        if (Fields.isFile(c.field())) {
            // a grid or G-EQDSK file has no provider: its parameters are only those given (cocos)
            c.fieldParameters().forEach((k, v) -> sb.append("field.").append(k).append(',').append(v).append(",\n"));
            return sb.toString();
        }
        for (ParameterSpec ps : Fields.provider(c.field()).parameters()) {
            sb.append("field.").append(ps.name()).append(',')
                    .append(c.fieldParameters().getOrDefault(ps.name(), ps.defaultValue())).append(',').append(ps.unit())
                    .append('\n');
        }
        return sb.toString();
    }

    /** The runs of the manifest as CSV: purpose, level, dt_s, steps, phases (space-separated), trajectory_file. */
    static String runTable(RunSchedule s) {
        StringBuilder sb = new StringBuilder("purpose,level,dt_s,steps,phases,trajectory_file\n");
        StringBuilder all = new StringBuilder();
        for (int k = 0; k < s.x0().length; k++) {
            all.append(k == 0 ? "" : " ").append(k);
        }
        sb.append("main,0,").append(s.dt()).append(',').append(s.steps()).append(',').append(all)
                .append(",trajectory-main.csv\n");
        for (int l = 1; l < s.convergenceDt().length; l++) {
            sb.append("convergence,").append(l).append(',').append(s.convergenceDt()[l]).append(',')
                    .append(s.convergenceSteps()[l]).append(",0,trajectory-convergence-").append(l).append(".csv\n");
        }
        return sb.toString();
    }

    static String guidingCenterStart(RunSchedule s) {
        RunSchedule.GuidingCenterRuns g = s.guidingCenter();
        return "x_m,y_m,z_m,p_par_kg_m_per_s,mu_j_per_t\n" + g.x0()[0] + "," + g.x0()[1] + "," + g.x0()[2] + ","
                + g.pPar0() + "," + g.mu() + "\n";
    }

    static String guidingCenterRunTable(RunSchedule s) {
        RunSchedule.GuidingCenterRuns g = s.guidingCenter();
        StringBuilder sb = new StringBuilder("level,dt_s,steps,trajectory_file\n");
        for (int l = 0; l < g.dt().length; l++) {
            sb.append(l).append(',').append(g.dt()[l]).append(',').append(g.steps()[l]).append(",gc-trajectory-")
                    .append(l).append(".csv\n");
        }
        return sb.toString();
    }

    static Map<String, Object> manifest(RunSchedule s) {
        ResolvedCase rc = s.resolved();
        Case c = rc.spec();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("schema", "twinorbit-case-export");
        m.put("schema_version", SCHEMA_VERSION);
        Map<String, Object> k = new LinkedHashMap<>();
        k.put("name", c.name());
        k.put("field", c.field());
        k.put("field_parameters", new LinkedHashMap<>(c.fieldParameters()));
        k.put("species", c.species().name());
        k.put("mass_kg", c.species().mass());
        k.put("charge_c", c.species().charge());
        k.put("energy_ev", rc.energyEv());
        k.put("pitch_deg", c.pitchDeg());
        k.put("eps", finite(rc.eps()));
        k.put("rho_m", rc.rho0());
        k.put("gyro_period_s", rc.gyroPeriod());
        k.put("phases", c.phases());
        k.put("duration", c.duration());
        k.put("duration_unit", c.durationUnit().label());
        k.put("end_time_s", s.endTime());
        k.put("bounce_period_s", finite(s.bouncePeriod()));
        m.put("case", k);
        m.put("definition", definition(c));
        m.put("time_origin_s", 0.0);
        m.put("initial_states", "initial-states.csv");
        List<Object> runs = new ArrayList<>();
        List<Integer> all = new ArrayList<>();
        for (int i = 0; i < s.x0().length; i++) {
            all.add(i);
        }
        runs.add(run("main", -1, s.dt(), s.steps(), all, "trajectory-main.csv"));
        // level 0 of the sweep is phase 0 of the main run at the same step: no file of its own
        for (int l = 1; l < s.convergenceDt().length; l++) {
            runs.add(run("convergence", l, s.convergenceDt()[l], s.convergenceSteps()[l], List.of(0),
                    "trajectory-convergence-" + l + ".csv"));
        }
        m.put("runs", runs);
        m.put("trajectory_columns", TRAJECTORY_COLUMNS);
        RunSchedule.GuidingCenterRuns g = s.guidingCenter();
        Map<String, Object> gc = new LinkedHashMap<>();
        gc.put("start", Map.of("x_m", List.of(g.x0()[0], g.x0()[1], g.x0()[2]), "p_par_kg_m_per_s", g.pPar0(),
                "mu_j_per_t", g.mu()));
        List<Object> gcRuns = new ArrayList<>();
        for (int l = 0; l < g.dt().length; l++) {
            Map<String, Object> r = new LinkedHashMap<>();
            r.put("level", l);
            r.put("dt_s", g.dt()[l]);
            r.put("steps", g.steps()[l]);
            r.put("trajectory_file", "gc-trajectory-" + l + ".csv");
            gcRuns.add(r);
        }
        gc.put("runs", gcRuns);
        gc.put("trajectory_columns", GC_TRAJECTORY_COLUMNS);
        m.put("guiding_center", gc);
        m.put("field_card", "field-card.json");
        m.put("field_card_table", "field-card.csv");
        return m;
    }

    private static Map<String, Object> run(String purpose, int level, double dt, long steps, List<Integer> phases,
                                           String file) {
        Map<String, Object> r = new LinkedHashMap<>();
        r.put("purpose", purpose);
        r.put("level", level < 0 ? null : level);
        r.put("dt_s", dt);
        r.put("steps", steps);
        r.put("phases", phases);
        r.put("output_every_steps", 1);
        r.put("trajectory_file", file);
        return r;
    }

    /**
     * The case in the keys of a case file ({@code run --case}), so that a scorer rebuilds exactly
     * this case whatever the defaults of its own version are.
     */
    static Map<String, Object> definition(Case c) {
        Map<String, Object> d = new LinkedHashMap<>();
        d.put("name", c.name());
        d.put("field", c.field());
        d.put("field-parameters", new LinkedHashMap<>(c.fieldParameters()));
        d.put("species", c.species().name().startsWith("custom(") ? c.species().mass() + "," + c.species().charge()
                : c.species().name());
        d.put("start", c.start() == null ? null : List.of(c.start().x(), c.start().y(), c.start().z()));
        if (c.eps() != null) {
            d.put("eps", c.eps());
        } else {
            d.put("energy", c.energyEv());
        }
        d.put("pitch", c.pitchDeg());
        d.put("phases", c.phases());
        d.put("duration", c.duration());
        d.put("duration-unit", c.durationUnit().label());
        d.put("steps-per-gyro", c.stepsPerGyro());
        d.put("gc-integrators", c.gcIntegrators().isEmpty() ? List.of("none") : c.gcIntegrators());
        d.put("gc-step", c.gcStepGyro());
        d.put("gc-start", c.gcStart().label());
        d.put("reference-rtol", c.referenceRtol());
        return d;
    }

    static Map<String, Object> card(ResolvedCase rc) {
        Case c = rc.spec();
        boolean file = Fields.isFile(c.field());
        FieldProvider p = file ? null : Fields.provider(c.field());
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("schema", "twinorbit-field-card");
        m.put("schema_version", SCHEMA_VERSION);
        m.put("field", file ? c.field() : p.name());
        m.put("description", file ? "field read from the file " + c.field().substring(c.field().indexOf(':') + 1)
                : p.description());
        List<Object> params = new ArrayList<>();
        if (file) {
            c.fieldParameters().forEach((k, v) -> params.add(new LinkedHashMap<>(Map.of("name", k, "value", v))));
        } else {
            for (ParameterSpec ps : p.parameters()) {
                Map<String, Object> o = new LinkedHashMap<>();
                o.put("name", ps.name());
                o.put("value", c.fieldParameters().getOrDefault(ps.name(), ps.defaultValue()));
                o.put("unit", ps.unit());
                o.put("description", ps.description());
                params.add(o);
            }
        }
        m.put("parameters", params);
        m.put("length_meaning", file ? rc.field().lengthMeaning() : p.lengthMeaning());
        m.put("l_m", finite(rc.field().length()));
        m.put("domain", rc.field().domainMeaning());
        m.put("invariants", file ? String.join("; ", rc.field().invariants().stream().map(i -> i.description()).toList())
                : p.invariantsMeaning());
        m.put("table", "field-card.csv");
        List<String> cols = new ArrayList<>(List.of("x_m", "y_m", "z_m", "t_s"));
        cols.addAll(FieldProbe.COLUMNS);
        m.put("table_columns", cols);
        return m;
    }

    /** The probe columns on a grid of CARD_SIDE³ points centred on the start, at t = 0. */
    static String cardTable(ResolvedCase rc) {
        Field f = rc.field();
        StringBuilder sb = new StringBuilder("x_m,y_m,z_m,t_s," + String.join(",", FieldProbe.COLUMNS) + "\n");
        double[] x0 = {rc.start().x(), rc.start().y(), rc.start().z()};
        double h = CARD_HALF_WIDTH_RHO * rc.rho0();
        FieldSample s = new FieldSample();
        for (int i = 0; i < CARD_SIDE; i++) {
            for (int j = 0; j < CARD_SIDE; j++) {
                for (int k = 0; k < CARD_SIDE; k++) {
                    double[] p = {x0[0] + h * (2.0 * i / (CARD_SIDE - 1) - 1), x0[1] + h * (2.0 * j / (CARD_SIDE - 1) - 1),
                        x0[2] + h * (2.0 * k / (CARD_SIDE - 1) - 1), 0};
                    double[] v = FieldProbe.values(f, p, s);
                    sb.append(p[0]).append(',').append(p[1]).append(',').append(p[2]).append(',').append(p[3]);
                    for (int c = 0; c < v.length; c++) {
                        boolean flag = c == v.length - 1;
                        sb.append(',').append(flag ? (v[c] == 1 ? "true" : "false") : Double.isFinite(v[c]) ? Double.toString(v[c]) : "");
                    }
                    sb.append('\n');
                }
            }
        }
        return sb.toString();
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
