package org.twinorbit.harness.scan;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A finished breakdown scan.
 *
 * @param settings   what was scanned (field, species, ε range, ...), snake_case keys, as written
 *                   to the {@code scan} object of scan.json
 * @param axis       what ε means and how it reads as an energy
 * @param points     one per ε and pitch angle, pitch-major then increasing ε
 * @param thresholds one per metric, tolerance and pitch angle
 */
public record ScanResult(Map<String, Object> settings, ScanAxis axis, List<ScanPoint> points,
                         List<Threshold> thresholds) {

    public ScanResult {
        settings = Collections.unmodifiableMap(new LinkedHashMap<>(settings));
        points = List.copyOf(points);
        thresholds = List.copyOf(thresholds);
    }
}
