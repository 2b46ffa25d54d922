package org.twinorbit.harness.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.ResolvedCase;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.ReferenceSummary;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.run.Stat;

/**
 * The tables people read: one row per integrator with the worst case over the gyrophase
 * ensemble, discretisation rows and the model row kept apart; and the CSV with mean and worst.
 * Only the terminal table ({@link #tableWithWallTime}) has a wall-time column: what goes into a
 * file must not depend on the machine ({@link Timings}).
 */
public final class ResultTables {

    private ResultTables() {}

    /** Columns of the compact table. */
    public static final List<String> HEADER = List.of("integrator", "error kind", "status", "mu change",
            "ref mu change", "mu jump", "energy err", "invariant err", "phase err", "drift err", "center pos err/rho",
            "particle pos err/rho", "bounce err", "class", "order", "steps", "field evals");

    /** The compact table of one case (worst over the ensemble). @param kind discretisation, model or null for all */
    public static TextTable table(CaseResult r, String kind) {
        return table(r, kind, false);
    }

    /** The table of every row with the wall time summed over the ensemble last: for the terminal only. */
    public static TextTable tableWithWallTime(CaseResult r) {
        return table(r, null, true);
    }

    private static TextTable table(CaseResult r, String kind, boolean wall) {
        List<String> header = new ArrayList<>(HEADER);
        if (wall) {
            header.add("wall s");
        }
        TextTable t = new TextTable(header);
        for (ResultRow row : r.rows()) {
            if (kind != null && !row.errorKind().equals(kind)) {
                continue;
            }
            String status = row.status().equals("ok") ? "ok"
                    : row.status() + " at " + Format.number(row.statusTime() / r.resolved().gyroPeriod()) + " Tc";
            List<String> cells = new ArrayList<>(List.of(row.integrator(), row.errorKind(), status,
                    w(row, "mu_change"), w(row, "reference_mu_change"), w(row, "mu_jump"),
                    w(row, "energy_error"), Format.number(worstInvariant(row)), w(row, "phase_error"),
                    w(row, "drift_error"), w(row, "position_error_rho"), w(row, "particle_position_error_rho"),
                    w(row, "bounce_period_error"),
                    row.orbitClass() + (row.classAgreement() < 1 ? " (" + pct(row.classAgreement()) + " agree)" : ""),
                    Double.isNaN(row.order()) ? "—" : String.format(Locale.ROOT, "%.2f", row.order()),
                    Format.number(Math.rint(row.steps())), Format.number(Math.rint(row.fieldEvaluations()))));
            if (wall) {
                cells.add(Timings.seconds(row.wallSeconds()));
            }
            t.add(cells);
        }
        return t;
    }

    /** The largest worst-case drift over the row's exact invariants; NaN without any. */
    static double worstInvariant(ResultRow row) {
        double w = Double.NaN;
        for (Stat s : row.invariants().values()) {
            if (s.defined() && !(Math.abs(s.worst()) <= Math.abs(w))) {
                w = Math.abs(s.worst());
            }
        }
        return w;
    }

    private static String w(ResultRow row, String metric) {
        return Format.number(row.metric(metric).worst());
    }

    private static String pct(double f) {
        return String.format(Locale.ROOT, "%.0f%%", 100 * f);
    }

    /** Lines describing the case and its scales. */
    public static List<String> describe(CaseResult r) {
        ResolvedCase rc = r.resolved();
        Case c = rc.spec();
        List<String> l = new ArrayList<>();
        l.add(String.format(Locale.ROOT, "case %s: field %s%s, %s, %s eV, pitch %s deg, start (%s, %s, %s) m",
                c.name(), c.field(), c.fieldParameters().isEmpty() ? "" : " " + c.fieldParameters(), c.species().name(),
                Format.number(rc.energyEv()), Format.number(c.pitchDeg()), Format.number(rc.start().x()),
                Format.number(rc.start().y()), Format.number(rc.start().z())));
        l.add(String.format(Locale.ROOT, "eps = rho0/L = %s, rho0 = %s m, L = %s m, B0 = %s T, Tc = %s s",
                Format.number(rc.eps()), Format.number(rc.rho0()), Format.number(rc.length()),
                Format.number(rc.b0()), Format.number(rc.gyroPeriod())));
        String dur = Format.number(r.endTime() / rc.gyroPeriod()) + " Tc"
                + (Double.isNaN(r.bouncePeriod()) ? "" : " (" + Format.number(c.duration()) + " bounce periods of "
                + Format.number(r.bouncePeriod()) + " s)");
        l.add(String.format(Locale.ROOT, "duration %s; %d gyrophases; full orbit %d steps/Tc; guiding center step %s Tc",
                dur, c.phases(), c.stepsPerGyro(), Format.number(r.gcStep() / rc.gyroPeriod())));
        l.add(c.gcStart() == org.twinorbit.harness.cases.GuidingCenterStart.MATCHED
                ? "model row: each gyrophase against its own guiding center, started at its reference orbit's first "
                        + "gyration with that orbit's exact invariants (gc-start matched)"
                : "model row: every gyrophase against one shared zeroth-order guiding center, offsets O(eps) per phase "
                        + "(gc-start shared)");
        if (rc.field() instanceof org.twinorbit.fields.GriddedField g) {
            l.add("field on the " + g.gridSummary() + "; " + g.divergenceSummary());
        }
        for (ResultRow row : r.rows()) {
            if (row.errorKind().equals("model") && row.muJumpFrom() != null) {
                l.add("mu jump compares: " + row.muJumpFrom());
            }
        }
        for (ReferenceSummary s : r.references()) {
            l.add(String.format(Locale.ROOT, "%s reference: %s, rtol %s, self-estimated error %s rho0, status %s",
                    s.model(), s.method(), Format.number(s.rtol()), Format.number(s.selfErrorRho()), s.status()));
        }
        return l;
    }

    /** CSV header for result rows (one line per case and integrator). */
    public static String csvHeader() {
        List<String> h = new ArrayList<>(List.of("case", "field", "species", "energy_ev", "eps", "pitch_deg",
                "integrator", "model", "error_kind", "status", "status_time_s", "orbit_class", "class_agreement"));
        for (String m : org.twinorbit.harness.run.ResultRow.METRICS) {
            h.add(m + "_mean");
            h.add(m + "_rms");
            h.add(m + "_worst");
        }
        h.addAll(List.of("invariant_error_worst", "order", "steps", "field_evaluations"));
        return String.join(",", h) + "\n";
    }

    /** CSV lines of one case; empty cells for undefined values. */
    public static String csvRows(CaseResult r) {
        StringBuilder sb = new StringBuilder();
        ResolvedCase rc = r.resolved();
        for (ResultRow row : r.rows()) {
            List<String> c = new ArrayList<>(List.of(csv(rc.spec().name()), rc.spec().field(), rc.species().name(),
                    n(rc.energyEv()), n(rc.eps()), n(rc.spec().pitchDeg()), row.integrator(), row.model(),
                    row.errorKind(), row.status(), n(row.statusTime()), row.orbitClass(), n(row.classAgreement())));
            for (String m : ResultRow.METRICS) {
                c.add(n(row.metric(m).mean()));
                c.add(n(row.metric(m).rms()));
                c.add(n(row.metric(m).worst()));
            }
            c.addAll(List.of(n(worstInvariant(row)), n(row.order()), count(row.steps()), count(row.fieldEvaluations())));
            sb.append(String.join(",", c)).append('\n');
        }
        return sb.toString();
    }

    private static String n(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    /** A count as an integer (a mean over the ensemble rounded, as in the JSON); empty when not counted. */
    private static String count(double v) {
        Long c = ResultJson.count(v);
        return c == null ? "" : c.toString();
    }

    private static String csv(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }
}
