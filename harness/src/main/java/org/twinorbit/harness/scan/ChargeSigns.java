package org.twinorbit.harness.scan;

import java.util.List;
import org.twinorbit.harness.Format;
import org.twinorbit.shared.Species;

/**
 * Which charge signs a scan runs ({@code --charge-signs}): the species as given, or both it and
 * its twin of the same mass and charge -q. The two differ wherever the orbit's side of a flux
 * surface matters: the grad-B and curvature drifts reverse with q, so in a tokamak the twin's
 * banana or passing orbit lies on the other side of its flux surface (co- against counter-going);
 * in a field symmetric under that reversal (the mirror, a uniform field) they agree.
 */
public final class ChargeSigns {

    /** The sign of a point or threshold of a scan that does not scan signs. */
    public static final int GIVEN = 0;
    /** The signs of a scan of both: the species as given, then its twin. */
    public static final List<Integer> BOTH = List.of(1, -1);

    private ChargeSigns() {}

    /**
     * Parses {@code --charge-signs}.
     *
     * @return the signs to scan: [{@link #GIVEN}] or {@link #BOTH}
     * @throws IllegalArgumentException naming the option and the allowed values
     */
    public static List<Integer> parse(String text) {
        return switch (text == null ? "given" : text.trim()) {
            case "given" -> List.of(GIVEN);
            case "both" -> BOTH;
            default -> throw new IllegalArgumentException("--charge-signs must be given or both, got '" + text + "'");
        };
    }

    /** The species of a sign: itself for GIVEN and +1, its twin of charge -q for -1. */
    public static Species species(Species given, int sign) {
        return sign < 0 ? new Species(given.name() + " (-q)", given.mass(), -given.charge()) : given;
    }

    /**
     * How a line of a scan is named in its answers and tables: "pitch 60 deg", or with both signs
     * "deuteron, pitch 60 deg" and "deuteron (-q), pitch 60 deg".
     */
    public static String label(String species, int sign, double pitchDeg) {
        String pitch = "pitch " + Format.number(pitchDeg) + " deg";
        return sign == GIVEN ? pitch : (sign < 0 ? species + " (-q)" : species) + ", " + pitch;
    }
}
