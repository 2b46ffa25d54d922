package org.twinorbit.harness.baseline;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.cases.GuidingCenterStart;
import org.twinorbit.harness.run.PhaseStatistic;
import org.twinorbit.harness.scan.BreakdownScan;
import org.twinorbit.harness.scan.ScanDuration;
import org.twinorbit.harness.scan.ScanMetric;
import org.twinorbit.harness.scan.ScanRequest;
import org.twinorbit.shared.Species;

/**
 * A breakdown scan as stored in a baseline: the request with every entry resolved (ε range,
 * start, duration, tolerances the field's recipe chose), so that a check scans the same points
 * whatever today's recipe says. Read from the scan's settings after it was built.
 */
final class ScanDefinition {

    private ScanDefinition() {}

    /** The resolved scan of {@code built}, for a particle of {@code species}. */
    static Map<String, Object> write(BreakdownScan scan, Species species) {
        Map<String, Object> s = scan.settings();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("field", s.get("field"));
        m.put("field_parameters", s.get("parameters"));
        Map<String, Object> sp = new LinkedHashMap<>();
        sp.put("name", species.name());
        sp.put("mass_kg", species.mass());
        sp.put("charge_c", species.charge());
        m.put("species", sp);
        m.put("start_m", s.get("start_m"));
        m.put("energy_ev", s.get("energy_ev")); // only a ramp or wave scan fixes the energy
        m.put("eps_min", s.get("eps_min"));
        m.put("eps_max", s.get("eps_max"));
        m.put("points", s.get("n_eps"));
        m.put("pitch_deg", scan.pitches());
        m.put("phases", s.get("phases"));
        m.put("duration", s.get("duration"));
        m.put("duration_unit", s.get("duration_unit"));
        m.put("reference_rtol", s.get("reference_rtol"));
        m.put("gc_start", s.get("gc_start"));
        m.put("integrators", s.get("integrators"));
        Map<String, Object> tol = new LinkedHashMap<>();
        scan.tolerances().forEach((k, v) -> tol.put(k.key(), v));
        m.put("tolerances", tol);
        m.put("statistic", scan.statistic().key());
        return m;
    }

    /** The case name of a scan's rows. */
    static String caseName(JsonNode def) {
        return "scan-" + def.path("field").asText() + "-" + def.path("species").path("name").asText();
    }

    /** The request that scans the stored points again, on {@code threads} threads. */
    static ScanRequest read(JsonNode n, JsonFields f, int threads) {
        String p = "scan.";
        ScanRequest q = new ScanRequest();
        try {
            q.field = f.text(n, "field", p);
            q.parameters = new LinkedHashMap<>(f.numberMap(n, "field_parameters", p));
            JsonNode s = f.object(n, "species", p);
            q.species = new Species(f.text(s, "name", p + "species."), f.number(s, "mass_kg", p + "species."),
                    f.number(s, "charge_c", p + "species."));
            q.start = f.numbers(n, "start_m", p);
            q.energyEv = n.path("energy_ev").isNumber() ? n.get("energy_ev").asDouble() : null;
            q.epsMin = f.number(n, "eps_min", p);
            q.epsMax = f.number(n, "eps_max", p);
            q.points = f.integer(n, "points", p);
            q.pitches = f.numbers(n, "pitch_deg", p);
            q.phases = f.integer(n, "phases", p);
            q.duration = f.number(n, "duration", p);
            q.durationUnit = ScanDuration.Unit.parse(f.text(n, "duration_unit", p));
            q.referenceRtol = f.number(n, "reference_rtol", p);
            q.gcStart = GuidingCenterStart.parse(f.text(n, "gc_start", p), "gc_start");
            q.integrators = f.texts(n, "integrators", p);
            Map<ScanMetric, List<Double>> tol = new LinkedHashMap<>();
            var it = f.object(n, "tolerances", p).fields();
            while (it.hasNext()) {
                var e = it.next();
                tol.put(ScanMetric.ofKey(e.getKey()), new ArrayList<>(f.numbers(n.get("tolerances"), e.getKey(),
                        p + "tolerances.")));
            }
            q.tolerances = tol;
            q.statistic = PhaseStatistic.ofKey(f.text(n, "statistic", p));
        } catch (IllegalArgumentException e) {
            throw f.bad("scan", e.getMessage());
        }
        q.threads = threads;
        return q;
    }
}
