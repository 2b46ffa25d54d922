package org.twinorbit.integrators.fullorbit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.ServiceLoader;
import java.util.stream.Collectors;

/**
 * The full-orbit pushers on the class path, found through {@link ServiceLoader}: the built-in
 * ones first in a fixed order, then any others (a user's jar) by name.
 */
public final class Pushers {

    /** The built-in pushers in the order tables list them. */
    private static final List<String> ORDER = List.of(BorisPusher.NAME, BorisNonRelativisticPusher.NAME,
            VayPusher.NAME, HigueraCaryPusher.NAME, LorentzRk4Pusher.NAME);

    private Pushers() {}

    /** Every pusher on the class path, in a stable order. */
    public static List<FullOrbitPusher> all() {
        List<FullOrbitPusher> list = new ArrayList<>();
        ServiceLoader.load(FullOrbitPusher.class).forEach(list::add);
        list.sort(Comparator.comparingInt((FullOrbitPusher p) -> {
            int i = ORDER.indexOf(p.name());
            return i < 0 ? ORDER.size() : i;
        }).thenComparing(FullOrbitPusher::name));
        return list;
    }

    /** The stable names of {@link #all()}, in the same order. */
    public static List<String> names() {
        return all().stream().map(FullOrbitPusher::name).collect(Collectors.toList());
    }

    /**
     * The pusher of that name.
     *
     * @throws IllegalArgumentException naming the valid pushers
     */
    /** Old names still accepted, each with its current one; they go in the next release. */
    public static final java.util.Map<String, String> DEPRECATED = java.util.Map.of(
            BorisNonRelativisticPusher.OLD_NAME, BorisNonRelativisticPusher.NAME);

    public static FullOrbitPusher byName(String name) {
        name = DEPRECATED.getOrDefault(name, name);
        List<FullOrbitPusher> all = all();
        for (FullOrbitPusher p : all) {
            if (p.name().equals(name)) {
                return p;
            }
        }
        throw new IllegalArgumentException("unknown pusher '" + name + "'; allowed: "
                + all.stream().map(FullOrbitPusher::name).collect(Collectors.joining(", ")));
    }
}
