package org.twinorbit.harness.scan;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.Format;
import org.twinorbit.harness.cases.GuidingCenterStart;
import org.twinorbit.harness.run.PhaseStatistic;

/** The Markdown (scan.md) and CSV (scan.csv) forms of a scan. */
public final class ScanTables {

    private ScanTables() {}

    /** Column names of the points table: ε, energy, pitch, then every value of the points. */
    static List<String> columns(ScanResult r) {
        List<String> cols = new ArrayList<>(List.of("eps", "energy_ev", "pitch_deg"));
        if (signed(r)) {
            cols.add(ScanJson.CHARGE_SIGN);
        }
        for (ScanPoint p : r.points()) {
            for (String k : p.values().keySet()) {
                if (!cols.contains(k)) {
                    cols.add(k);
                }
            }
        }
        return cols;
    }

    private static double cell(ScanPoint p, String col) {
        return switch (col) {
            case "eps" -> p.eps();
            case "energy_ev" -> p.energyEv();
            case "pitch_deg" -> p.pitchDeg();
            case ScanJson.CHARGE_SIGN -> p.chargeSign();
            default -> p.value(col);
        };
    }

    /**
     * One row per point; full precision, counts as integers ({@link ScanJson#COUNTS}), empty where
     * not measured, {@code inf} for a failed orbit.
     */
    public static String csv(ScanResult r) {
        List<String> cols = columns(r);
        StringBuilder sb = new StringBuilder(String.join(",", cols)).append('\n');
        for (ScanPoint p : r.points()) {
            List<String> cells = new ArrayList<>();
            for (String c : cols) {
                double v = cell(p, c);
                cells.add(Double.isNaN(v) ? "" : Double.isInfinite(v) ? (v > 0 ? "inf" : "-inf")
                        : ScanJson.COUNTS.contains(c) ? Long.toString(Math.round(v)) : Double.toString(v));
            }
            sb.append(String.join(",", cells)).append('\n');
        }
        return sb.toString();
    }

    /** Settings, the thresholds, then every point, for people. */
    public static String markdown(ScanResult r) {
        StringBuilder sb = new StringBuilder("# Breakdown scan\n\n");
        for (Map.Entry<String, Object> e : r.settings().entrySet()) {
            sb.append("- ").append(e.getKey()).append(": ").append(show(e.getValue())).append('\n');
        }
        String statistic = r.thresholds().isEmpty() ? PhaseStatistic.WORST.key()
                : r.thresholds().get(0).statistic().key();
        boolean shared = GuidingCenterStart.SHARED.label().equals(r.settings().get("gc_start"));
        sb.append("\nModel error: the guiding-center reference against the gyro-averaged full-orbit ")
                .append("reference, both at tight tolerance, over a gyrophase ensemble. ")
                .append("eps* is the first eps (").append(r.axis().meaning())
                .append(") whose ").append(statistic).append(" error over the ensemble exceeds the tolerance, ")
                .append("refined by log-log interpolation.\n\n")
                .append("Reading the numbers: each metric is signed per phase; `_mean` is the phase mean of the signed ")
                .append("error, `_rms` the rms over the phases, `_worst` the largest magnitude. ")
                .append(shared
                        ? "Start: shared (zeroth order): the whole ring around one guiding center, so each phase "
                                + "starts with an O(eps) gyrophase-dependent offset that dominates `_worst` and `_rms` of "
                                + "the drift, bounce and position errors; in their `_mean` it cancels at first order over a symmetric ring. "
                        : "Start: matched: each phase is compared with its own guiding center (started at its first "
                                + "gyration on the orbit's exact invariants), so every statistic measures the model, to "
                                + "second order. ")
                .append("`inf` marks a point where the guiding ")
                .append("center failed or the particles could not be placed (`point_failed` = 1); `lost` = 1 marks a point where ")
                .append("both models lost the particle (a loss cone): it gives no threshold, and a pitch lost at every ")
                .append("point has the outcome `lost`. `no_bounce` = 1 marks a point of a bounce-counted scan whose ")
                .append("guiding center did not bounce: it ran until it had crossed the current sheet once and come back to ")
                .append("its starting distance, where there is a sheet and the start is off it, else for 50 gyroperiods. ")
                .append("`*_reference_error_rho` is each reference's self-estimated error (a run at 100 times tighter ")
                .append("tolerance), `*_evaluations` its field evaluations per orbit.\n\n");
        sb.append("## Answer\n\n");
        for (String line : ScanAnswer.lines(r)) {
            sb.append("- ").append(line).append('\n');
        }
        sb.append('\n');
        sb.append("## Thresholds\n\n");
        String derived = r.axis().derivedName();
        boolean signed = signed(r);
        sb.append("| metric | tolerance | statistic | pitch (deg) |").append(signed ? " charge |" : "")
                .append(" outcome | eps* | energy at eps* (eV) |")
                .append(derived == null ? "" : " " + derived + "* |").append('\n');
        sb.append("|---|---|---|---|---|---|---|").append(signed ? "---|" : "").append(derived == null ? "" : "---|")
                .append('\n');
        for (Threshold t : r.thresholds()) {
            boolean crossed = t.outcome().hasEpsStar();
            sb.append("| ").append(t.metric().key()).append(" | ").append(Format.number(t.tolerance()))
                    .append(" | ").append(t.statistic().key())
                    .append(" | ").append(Format.number(t.pitchDeg()))
                    .append(signed ? " | " + (t.chargeSign() < 0 ? "-q" : "+q") : "")
                    .append(" | ").append(t.outcome().label())
                    .append(" | ").append(crossed ? Format.number(t.epsStar()) : "—")
                    .append(" | ").append(crossed && r.axis().variesEnergy() ? Format.number(t.energyEvStar()) : "—")
                    .append(" |");
            if (derived != null) {
                sb.append(' ').append(crossed ? Format.number(r.axis().derived().applyAsDouble(t.epsStar())) : "—")
                        .append(" |");
            }
            sb.append('\n');
        }
        sb.append("\n## Points\n\n");
        List<String> cols = columns(r);
        sb.append("| ").append(String.join(" | ", cols)).append(" |\n|");
        sb.append("---|".repeat(cols.size())).append('\n');
        for (ScanPoint p : r.points()) {
            sb.append('|');
            for (String c : cols) {
                double v = cell(p, c);
                // counts rounded as in scan.json, so that a resumed scan reads the same
                sb.append(' ').append(Format.number(ScanJson.COUNTS.contains(c) && Double.isFinite(v) ? Math.rint(v) : v))
                        .append(" |");
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /** True for a scan of both charge signs ({@code --charge-signs both}). */
    static boolean signed(ScanResult r) {
        return r.points().stream().anyMatch(p -> p.chargeSign() != ChargeSigns.GIVEN);
    }

    private static String show(Object v) {
        if (v instanceof Double d) {
            return Format.number(d);
        }
        if (v instanceof List<?> l) {
            return String.join(", ", l.stream().map(ScanTables::show).toList());
        }
        if (v instanceof Map<?, ?> m) {
            List<String> parts = new ArrayList<>();
            m.forEach((k, x) -> parts.add(k + " = " + show(x)));
            return parts.isEmpty() ? "(defaults)" : String.join(", ", parts);
        }
        return String.valueOf(v);
    }
}
