package org.twinorbit.harness.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.ReferenceSummary;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.run.Stat;
import org.twinorbit.harness.verdict.Finding;
import org.twinorbit.harness.verdict.RowVerdict;
import org.twinorbit.harness.verdict.Verdicts;

/**
 * The JSON contract of {@code run.json} and, per case, of {@code validation.json}. Every key the
 * contract names is snake_case and lower-case; the keys of {@code field_parameters} are the
 * field's parameter names exactly as {@code -P} takes them (e.g. {@code B0}, {@code Rm}), since
 * they are data rather than names of the contract. SI units are in the names where a quantity
 * has one; a value that is not defined (a μ change for a guiding center, a drift error where the
 * reference has no drift) is {@code null}; every count is a JSON integer. Wall-clock times are
 * left out, so the file is byte-identical for any thread count and on any machine.
 *
 * <pre>
 * tool:       name, version (Maven project version), git_commit ({@link ToolInfo}); at the top of
 *             run.json and validation.json, once per file
 * case:       name, field, field_parameters {name: value}, species, mass_kg, charge_c, start_m [x,y,z]
 *             (initial guiding center), energy_ev, pitch_deg, phases, duration, duration_unit,
 *             pushers [..], steps_per_gyro, gc_integrators [..], gc_step_gyro, reference_rtol,
 *             gc_start (matched: each phase against its own guiding center; shared: one for all),
 *             eps (ρ0/L), rho_m (ρ0 = p/(|q|B)), l_m (L; null when infinite), b0_t (|B| at the start),
 *             gyro_period_s (T_c), end_time_s, bounce_period_s (measured first when the duration is
 *             in bounces, else null), full_orbit_dt_s, gc_dt_s
 * results:    one object per integrator, then the model row:
 *             integrator, model (full-orbit | guiding-center), error_kind (discretisation | model),
 *             status (ok | lost | unstable | model-failure | failed (the integrator threw), the worst over the ensemble; the
 *             model row also lost-full-orbit | lost-guiding-center | unstable-full-orbit when
 *             the two models disagree, plain lost only when both lost the particle),
 *             status_time_s (when that status was reached, earliest phase; null when ok),
 *             orbit_class (trapped | passing | lost, '/'-joined when phases differ),
 *             class_agreement (fraction of phases classed like the reference),
 *             mu_change, reference_mu_change, mu_jump, energy_error, phase_error, drift_error,
 *             position_error_rho, particle_position_error_rho, bounce_period_s, bounce_period_error,
 *             mirror_field_t, mirror_field_error —
 *             each {mean, rms, worst} over the gyrophase ensemble of the signed per-phase values
 *             (worst = largest magnitude, sign kept; phase_error is φ/φ_ref − 1, the gyrophase
 *             turned over the gyrophase the reference turned in the same time; drift_error is
 *             along the reference drift; position_error_rho is the gyro-averaged center's (the
 *             guiding center's) error in ρ0 per bounce period, signed ahead/behind along the
 *             reference motion; particle_position_error_rho (full-orbit rows) is the particle's
 *             own |x − x_ref|/ρ0 at the end time, signed along the reference particle's velocity;
 *             reference_mu_change (full-orbit rows) is the full-orbit reference's own mu_change
 *             for the same phases, the physical ripple beside the row's),
 *             mu_jump_from (the points mu_jump compared: sheet-exit | mirror-points |
 *             first-last-gyration, '/'-joined when phases differ; null for a guiding-center row),
 *             invariant_error {invariant: {mean, rms, worst}} (full-orbit rows; the invariant's name
 *             lower-cased, e.g. l_z, p_phi; |I − I0|/S0 with S0 the invariant's scale at the start:
 *             m|u| for momenta, m|u|R for angular momenta),
 *             order (slope of log error vs log dt over dt, dt/2, dt/4; null when not measurable),
 *             convergence {dt_s [..], error_rho [..]} (end-position error of phase 0 against the reference),
 *             steps, field_evaluations (integers: per orbit, the mean over the ensemble rounded to
 *             the nearest integer),
 *             verdict (integrator rows): result (pass | fail | expected-fail) and findings [{check
 *             (stable | class | runaway | order | energy-trend | reference-margin), severity
 *             (failure | warning), expected, detail}], the checks the row did not pass
 * reference:  full_orbit and guiding_center: method, rtol, self_error_rho (|x − x_tight|/ρ0 at the end,
 *             x_tight from a run at rtol/100), energy_error, status, steps (null: the adaptive
 *             references do not count them), field_evaluations (integers, rounded means as above)
 * </pre>
 */
public final class ResultJson {

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultJson() {}

    /** The whole document of one run (run.json, {@code run --json}): the tool, then {@link #caseDocument}. */
    public static Map<String, Object> document(CaseResult r) {
        return ToolInfo.stamped(caseDocument(r, Verdicts.judge(r)));
    }

    /**
     * One case without the tool object: an element of validation.json's {@code cases}.
     *
     * @param verdicts the verdicts of its integrator rows (with the suite's expectations applied)
     */
    public static Map<String, Object> caseDocument(CaseResult r, List<RowVerdict> verdicts) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("case", caseObject(r));
        List<Object> results = new ArrayList<>();
        for (ResultRow row : r.rows()) {
            Map<String, Object> o = rowObject(row);
            if (row.errorKind().equals("discretisation")) {
                verdicts.stream().filter(v -> v.integrator().equals(row.integrator())).findFirst()
                        .ifPresent(v -> o.put("verdict", verdictObject(v)));
            }
            results.add(o);
        }
        m.put("results", results);
        Map<String, Object> refs = new LinkedHashMap<>();
        for (ReferenceSummary s : r.references()) {
            refs.put(s.model().replace('-', '_'), referenceObject(s));
        }
        m.put("reference", refs);
        return m;
    }

    public static Map<String, Object> caseObject(CaseResult r) {
        ResolvedCase rc = r.resolved();
        Case c = rc.spec();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", c.name());
        m.put("field", c.field());
        m.put("field_parameters", new LinkedHashMap<>(c.fieldParameters()));
        m.put("species", c.species().name());
        m.put("mass_kg", c.species().mass());
        m.put("charge_c", c.species().charge());
        m.put("start_m", List.of(rc.start().x(), rc.start().y(), rc.start().z()));
        m.put("energy_ev", num(rc.energyEv()));
        m.put("pitch_deg", c.pitchDeg());
        m.put("phases", c.phases());
        m.put("duration", c.duration());
        m.put("duration_unit", c.durationUnit().label());
        m.put("pushers", c.pushers());
        m.put("steps_per_gyro", c.stepsPerGyro());
        m.put("gc_integrators", c.gcIntegrators());
        m.put("gc_step_gyro", c.gcStepGyro());
        m.put("reference_rtol", c.referenceRtol());
        m.put("gc_start", c.gcStart().label());
        m.put("eps", num(rc.eps()));
        m.put("rho_m", num(rc.rho0()));
        m.put("l_m", num(rc.length()));
        m.put("b0_t", num(rc.b0()));
        m.put("gyro_period_s", num(rc.gyroPeriod()));
        m.put("end_time_s", num(r.endTime()));
        m.put("bounce_period_s", num(r.bouncePeriod()));
        m.put("full_orbit_dt_s", num(rc.fullOrbitStep()));
        m.put("gc_dt_s", num(r.gcStep()));
        return m;
    }

    public static Map<String, Object> rowObject(ResultRow row) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("integrator", row.integrator());
        m.put("model", row.model());
        m.put("error_kind", row.errorKind());
        m.put("status", row.status());
        m.put("status_time_s", num(row.statusTime()));
        m.put("orbit_class", row.orbitClass());
        m.put("class_agreement", num(row.classAgreement()));
        row.metrics().forEach((k, v) -> m.put(k, stat(v)));
        m.put("mu_jump_from", row.muJumpFrom());
        Map<String, Object> inv = new LinkedHashMap<>();
        row.invariants().forEach((k, v) -> inv.put(k.toLowerCase(Locale.ROOT), stat(v)));
        m.put("invariant_error", inv);
        m.put("order", num(row.order()));
        Map<String, Object> conv = new LinkedHashMap<>();
        conv.put("dt_s", nums(row.convergenceDt()));
        conv.put("error_rho", nums(row.convergenceError()));
        m.put("convergence", conv);
        m.put("steps", count(row.steps()));
        m.put("field_evaluations", count(row.fieldEvaluations()));
        return m;
    }

    static Map<String, Object> verdictObject(RowVerdict v) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("result", v.label());
        List<Object> findings = new ArrayList<>();
        for (Finding f : v.findings()) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("check", f.check().label());
            o.put("severity", f.failure() ? "failure" : "warning");
            o.put("expected", f.expected());
            o.put("detail", f.detail());
            findings.add(o);
        }
        m.put("findings", findings);
        return m;
    }

    static Map<String, Object> referenceObject(ReferenceSummary s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("method", s.method());
        m.put("rtol", s.rtol());
        m.put("self_error_rho", num(s.selfErrorRho()));
        m.put("energy_error", num(s.energyError()));
        m.put("status", s.status());
        m.put("steps", count(s.steps()));
        m.put("field_evaluations", count(s.fieldEvaluations()));
        return m;
    }

    private static Map<String, Object> stat(Stat s) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("mean", num(s.mean()));
        m.put("rms", num(s.rms()));
        m.put("worst", num(s.worst()));
        return m;
    }

    /** A finite number, or null. */
    public static Double num(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /** A count as an integer, a mean over the ensemble rounded to the nearest; null when not counted. */
    public static Long count(double v) {
        return Double.isFinite(v) ? Math.round(v) : null;
    }

    private static List<Double> nums(double[] v) {
        List<Double> l = new ArrayList<>();
        for (double d : v) {
            l.add(num(d));
        }
        return l;
    }

    /** Pretty-printed JSON with a trailing newline. */
    public static String write(Object tree) {
        try {
            return JSON.writeValueAsString(tree).replace("\r\n", "\n") + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
