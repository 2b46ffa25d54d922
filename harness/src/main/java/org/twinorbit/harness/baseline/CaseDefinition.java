package org.twinorbit.harness.baseline;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.twinorbit.harness.cases.Case;
import org.twinorbit.harness.cases.DurationUnit;
import org.twinorbit.harness.cases.GuidingCenterStart;
import org.twinorbit.shared.Species;
import org.twinorbit.shared.Vec3;

/**
 * A fully resolved {@link Case} as stored in a baseline, every member explicit, so that a check
 * reruns exactly the baseline's case whatever today's defaults are. The species is stored with
 * its mass and charge, so a custom species reads back unchanged.
 */
final class CaseDefinition {

    private CaseDefinition() {}

    static Map<String, Object> write(Case c) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("name", c.name());
        m.put("field", c.field());
        m.put("field_parameters", new LinkedHashMap<>(c.fieldParameters()));
        Map<String, Object> s = new LinkedHashMap<>();
        s.put("name", c.species().name());
        s.put("mass_kg", c.species().mass());
        s.put("charge_c", c.species().charge());
        m.put("species", s);
        m.put("start_m", c.start() == null ? null : List.of(c.start().x(), c.start().y(), c.start().z()));
        m.put("energy_ev", c.energyEv());
        m.put("eps", c.eps());
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
        return m;
    }

    /** @throws org.twinorbit.harness.BadInputException naming the member that is wrong */
    static Case read(JsonNode n, JsonFields f, String path) {
        JsonNode s = f.object(n, "species", path);
        Species species;
        try {
            species = new Species(f.text(s, "name", path + "species."), f.number(s, "mass_kg", path + "species."),
                    f.number(s, "charge_c", path + "species."));
        } catch (IllegalArgumentException e) {
            throw f.bad(path + "species", e.getMessage());
        }
        JsonNode start = f.required(n, "start_m", path);
        Vec3 x0 = null;
        if (!start.isNull()) {
            List<Double> xyz = f.numbers(n, "start_m", path);
            if (xyz.size() != 3) {
                throw f.bad(path + "start_m", "must be null or [x, y, z], got " + start);
            }
            x0 = new Vec3(xyz.get(0), xyz.get(1), xyz.get(2));
        }
        try {
            return new Case(f.text(n, "name", path), f.text(n, "field", path),
                    f.numberMap(n, "field_parameters", path), species, x0, f.optionalNumber(n, "energy_ev", path),
                    f.optionalNumber(n, "eps", path), f.number(n, "pitch_deg", path), f.integer(n, "phases", path),
                    f.number(n, "duration", path), DurationUnit.parse(f.text(n, "duration_unit", path), "duration_unit"),
                    f.texts(n, "pushers", path), f.integer(n, "steps_per_gyro", path),
                    f.texts(n, "gc_integrators", path), f.number(n, "gc_step_gyro", path),
                    f.number(n, "reference_rtol", path),
                    GuidingCenterStart.parse(f.text(n, "gc_start", path), "gc_start"));
        } catch (IllegalArgumentException e) {
            throw f.bad(path.isEmpty() ? "case" : path.substring(0, path.length() - 1), e.getMessage());
        }
    }
}
