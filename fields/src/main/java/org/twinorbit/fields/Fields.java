package org.twinorbit.fields;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.ServiceLoader;
import java.util.stream.Collectors;
import org.twinorbit.shared.Species;

/** The field library: every {@link FieldProvider} on the class path, found by name. */
public final class Fields {

    /** The built-in fields in the order docs/design.md lists them; user fields follow by name. */
    private static final List<String> ORDER = List.of("uniform", "crossed", "gradient", "toroidal",
            "mirror", "dipole", "tokamak", "solovev", "current-sheet", "shear", "ramp", "wave");

    private Fields() {}

    /** Grid files read so far, by field name: a scan builds its field once per point. */
    private static final Map<String, Field> GRIDS = new java.util.concurrent.ConcurrentHashMap<>();

    /** Every provider on the class path, built-in ones first. */
    public static List<FieldProvider> all() {
        List<FieldProvider> list = new ArrayList<>();
        ServiceLoader.load(FieldProvider.class).forEach(list::add);
        list.sort(Comparator.comparingInt((FieldProvider p) -> {
            int i = ORDER.indexOf(p.name());
            return i < 0 ? ORDER.size() : i;
        }).thenComparing(FieldProvider::name));
        return list;
    }

    /** The provider of that name. @throws FieldParameterException listing the known names */
    public static FieldProvider provider(String name) {
        List<FieldProvider> all = all();
        for (FieldProvider p : all) {
            if (p.name().equals(name)) {
                return p;
            }
        }
        throw new FieldParameterException("unknown field '" + name + "'; allowed: "
                + all.stream().map(FieldProvider::name).collect(Collectors.joining(", ")));
    }

    /**
     * Whether a field name names a file (a grid file or a G-EQDSK file) rather than a field of the
     * library; such a name has no provider.
     */
    public static boolean isFile(String name) {
        return name.startsWith(GridFile.PREFIX) || name.startsWith(GeqdskFile.PREFIX);
    }

    /**
     * Builds a field by name with some parameters overridden.
     *
     * @param overrides parameter name -> value in the parameter's unit; unknown names and values
     *                  out of range are refused with a message listing what is allowed
     */
    public static Field create(String name, Map<String, Double> overrides, Species species) {
        if (name.startsWith(GridFile.PREFIX)) {
            if (!overrides.isEmpty()) {
                throw new FieldParameterException("a grid field '" + name + "' has no parameters; got "
                        + overrides.keySet());
            }
            return GRIDS.computeIfAbsent(name, k -> GridFile.read(java.nio.file.Path.of(k.substring(GridFile.PREFIX.length()))));
        }
        if (name.startsWith(GeqdskFile.PREFIX)) {
            int cocos = Cocos.DEFAULT;
            for (Map.Entry<String, Double> e : overrides.entrySet()) {
                double v = e.getValue();
                if (!e.getKey().equals("cocos") || v != Math.rint(v)) {
                    throw new FieldParameterException("a G-EQDSK field '" + name + "' has one parameter, cocos "
                            + "(its sign convention: 1-8 or 11-18, default " + Cocos.DEFAULT + "); got " + e.getKey() + " = " + v);
                }
                cocos = Cocos.of((int) v).index();
            }
            int c = cocos;
            return GRIDS.computeIfAbsent(name + "#cocos=" + c,
                    k -> GeqdskFile.read(java.nio.file.Path.of(name.substring(GeqdskFile.PREFIX.length())), c));
        }
        FieldProvider p = provider(name);
        return p.create(check(p, overrides), species);
    }

    /** Builds a field by name with its default parameters. */
    public static Field create(String name, Species species) {
        return create(name, Map.of(), species);
    }

    /** Checks overrides against the provider's parameters and fills in the defaults. */
    public static FieldParameters check(FieldProvider p, Map<String, Double> overrides) {
        Map<String, Double> values = new LinkedHashMap<>();
        for (ParameterSpec s : p.parameters()) {
            values.put(s.name(), s.defaultValue());
        }
        for (Map.Entry<String, Double> e : overrides.entrySet()) {
            ParameterSpec spec = p.parameters().stream().filter(s -> s.name().equals(e.getKey()))
                    .findFirst().orElseThrow(() -> new FieldParameterException(
                            "unknown parameter '" + e.getKey() + "' for field '" + p.name()
                                    + "'; valid parameters: " + describe(p)));
            double v = e.getValue();
            if (!spec.check().test(v)) {
                throw new FieldParameterException("parameter '" + spec.name() + "' of field '"
                        + p.name() + "' must be " + spec.allowed() + " (" + spec.unit()
                        + "), got " + v);
            }
            values.put(spec.name(), v);
        }
        return new FieldParameters(values);
    }

    private static String describe(FieldProvider p) {
        if (p.parameters().isEmpty()) {
            return "(none)";
        }
        return p.parameters().stream()
                .map(s -> s.name() + " (" + s.unit() + ", " + s.allowed() + ")")
                .collect(Collectors.joining(", "));
    }
}
