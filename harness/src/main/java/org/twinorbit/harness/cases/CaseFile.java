package org.twinorbit.harness.cases;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.twinorbit.harness.BadInputException;

/**
 * Reads a case from a YAML file (Jackson's YAML data format). The keys are those of
 * {@link CaseSpec#KEYS}; an unknown key, a value of the wrong type or a syntax error is refused
 * with the file, line and column.
 */
public final class CaseFile {

    /** The largest case file read (bytes): a case is a few hundred bytes; anything huge is not one. */
    static final long MAX_BYTES = 1 << 20;

    private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory()
            .enable(com.fasterxml.jackson.core.JsonParser.Feature.STRICT_DUPLICATE_DETECTION))
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT);

    private CaseFile() {}

    /** @throws BadInputException naming the file, line and column of the problem */
    public static CaseSpec read(Path file) {
        String text;
        try {
            if (Files.exists(file) && !Files.isRegularFile(file)) {
                throw new BadInputException("--case: " + file + " is not a regular file");
            }
            if (Files.exists(file) && Files.size(file) > MAX_BYTES) {
                throw new BadInputException("--case: " + file + " is " + Files.size(file) + " bytes; a case file is "
                        + "small YAML (at most " + MAX_BYTES + " bytes)");
            }
            text = Files.readString(file);
        } catch (NoSuchFileException e) {
            throw new BadInputException("--case: no such file " + file);
        } catch (java.nio.charset.MalformedInputException e) {
            throw new BadInputException("--case: " + file + " is not UTF-8 text");
        } catch (IOException e) {
            throw new BadInputException("--case: cannot read " + file + ": " + e.getMessage());
        }
        return parse(text, file.toString());
    }

    /** Parses YAML text; {@code source} names it in messages. */
    public static CaseSpec parse(String text, String source) {
        if (text.isBlank()) {
            throw new BadInputException(source + ": the case file is empty; allowed keys: "
                    + String.join(", ", CaseSpec.KEYS));
        }
        try {
            CaseSpec s = YAML.readValue(text, CaseSpec.class);
            if (s == null) {
                throw new BadInputException(source + ": the case file holds no mapping");
            }
            return s;
        } catch (UnrecognizedPropertyException e) {
            throw new BadInputException(keyWhere(source, text, e) + "unknown key '"
                    + e.getPropertyName() + "'; allowed keys: " + String.join(", ", CaseSpec.KEYS), e);
        } catch (JsonProcessingException e) {
            throw new BadInputException(where(source, e.getLocation()) + e.getOriginalMessage(), e);
        }
    }

    /** Line and column of the unknown key itself (the parser reports the end of its value). */
    private static String keyWhere(String source, String text, UnrecognizedPropertyException e) {
        JsonLocation loc = e.getLocation();
        if (loc == null) {
            return source + ": ";
        }
        String[] lines = text.split("\n", -1);
        int line = loc.getLineNr();
        int col = loc.getColumnNr();
        if (line >= 1 && line <= lines.length) {
            int i = lines[line - 1].indexOf(e.getPropertyName());
            if (i >= 0) {
                col = i + 1;
            }
        }
        return source + ": line " + line + ", column " + col + ": ";
    }

    private static String where(String source, JsonLocation loc) {
        if (loc == null) {
            return source + ": ";
        }
        return source + ": line " + loc.getLineNr() + ", column " + loc.getColumnNr() + ": ";
    }
}
