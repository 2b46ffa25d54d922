package org.twinorbit.harness.baseline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.twinorbit.harness.run.CaseResult;
import org.twinorbit.harness.run.ResultRow;
import org.twinorbit.harness.run.Stat;
import org.twinorbit.harness.scan.ScanPoint;
import org.twinorbit.harness.scan.ScanResult;
import org.twinorbit.harness.scan.Threshold;
import org.twinorbit.harness.verdict.RowVerdict;

/**
 * The numbers of a finished run, suite or scan as rows to compare. Wall-clock times are left
 * out: they depend on the machine, and a check never compares them.
 */
public final class Measurements {

    private Measurements() {}

    /** Every row of the cases; {@code verdicts} are those the command would report (suite expectations applied). */
    public static List<MeasuredRow> of(List<CaseResult> results, List<RowVerdict> verdicts) {
        List<MeasuredRow> out = new ArrayList<>();
        for (CaseResult r : results) {
            String name = r.resolved().spec().name();
            for (ResultRow row : r.rows()) {
                Map<String, String> labels = new LinkedHashMap<>();
                labels.put("status", row.status());
                labels.put("orbit_class", row.orbitClass());
                if (row.muJumpFrom() != null && !row.muJumpFrom().isEmpty()) {
                    labels.put("mu_jump_from", row.muJumpFrom());
                }
                if (row.errorKind().equals("discretisation")) {
                    verdicts.stream().filter(v -> v.caseName().equals(name) && v.integrator().equals(row.integrator()))
                            .findFirst().ifPresent(v -> labels.put("verdict", v.label()));
                }
                Map<String, Double> values = new LinkedHashMap<>();
                for (String m : ResultRow.METRICS) {
                    put(values, m, row.metric(m));
                }
                row.invariants().forEach((k, s) -> put(values, "invariant_error." + k.toLowerCase(Locale.ROOT), s));
                values.put("order", row.order());
                values.put("class_agreement", row.classAgreement());
                values.put("field_evaluations", (double) Math.round(row.fieldEvaluations()));
                out.add(new MeasuredRow(name, row.integrator(), labels, values));
            }
        }
        return out;
    }

    /** The points and thresholds of a scan, under the case name {@code caseName}. */
    public static List<MeasuredRow> of(ScanResult r, String caseName) {
        List<MeasuredRow> out = new ArrayList<>();
        for (ScanPoint p : r.points()) {
            Map<String, Double> values = new LinkedHashMap<>();
            p.values().forEach((k, v) -> values.put(dotted(k), v));
            out.add(new MeasuredRow(caseName, pointName(p.eps(), p.pitchDeg()), Map.of(), values));
        }
        for (Threshold t : r.thresholds()) {
            String row = String.format(Locale.ROOT, "threshold %s %s tol %s pitch %s", t.metric().key(),
                    t.statistic().key(), t.tolerance(), t.pitchDeg());
            Map<String, Double> values = new LinkedHashMap<>();
            values.put("eps_star", t.epsStar());
            values.put("energy_ev_star", t.energyEvStar());
            out.add(new MeasuredRow(caseName, row, Map.of("outcome", t.outcome().label()), values));
        }
        return out;
    }

    /** A point's row name; 12 significant digits tell the points of one grid apart. */
    static String pointName(double eps, double pitchDeg) {
        return String.format(Locale.ROOT, "point eps %.12g pitch %s", eps, pitchDeg);
    }

    /** {@code drift_error_worst} -> {@code drift_error.worst}: one metric name for every summary. */
    static String dotted(String key) {
        for (String s : new String[] {"mean", "rms", "worst"}) {
            if (key.endsWith("_" + s)) {
                return key.substring(0, key.length() - s.length() - 1) + "." + s;
            }
        }
        return key;
    }

    private static void put(Map<String, Double> values, String name, Stat s) {
        values.put(name + ".mean", s.mean());
        values.put(name + ".rms", s.rms());
        values.put(name + ".worst", s.worst());
    }
}
