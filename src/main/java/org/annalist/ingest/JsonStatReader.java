package org.annalist.ingest;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.annalist.series.Period;

/**
 * Reads a JSON-stat 2.0 dataset (JSON-stat 2.0 format, "dataset" response class): the cube of
 * {@code value} over the dimensions of {@code id} and {@code size}, each dimension's categories in
 * the order of {@code category.index}, one of them the time dimension ({@code role.time}, or a
 * dimension called {@code time} or {@code TIME_PERIOD}); each combination of the other dimensions'
 * categories is a series, labelled by {@code category.label}. Values in a dense array or a sparse
 * object, status as one string, an array or an object, as the specification allows.
 *
 * <p>The document is read as a stream: the metadata (small) as trees, the values straight into a
 * primitive array, bounded by {@link #MAX_VALUES}; every problem names the key path.
 */
final class JsonStatReader {

    /** The most values read from one dataset: 20 million doubles are 160 MB, about the most a laptop reads comfortably. */
    static final int MAX_VALUES = 20_000_000;
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final List<String> TIME_NAMES = List.of("time", "time_period", "period");

    private final String baseName;
    private final ProblemLog log;
    private JsonParser parser;
    private String version = "";
    private String kind = "";
    private String label = "";
    private JsonNode ids;
    private JsonNode sizes;
    private JsonNode roles;
    private JsonNode dimensions;
    private int valueLine;
    private double[] values = new double[0];
    private int[] valueAt;            // sparse values: the flat index of each, or null when dense
    private int valueCount;
    private final Map<Integer, String> statusAt = new HashMap<>();
    private String statusForAll = "";
    private int rows;

    JsonStatReader(String baseName, ProblemLog log) {
        this.baseName = baseName;
        this.log = log;
    }

    KeyedSeries.Assembled read(Reader text) throws IOException {
        try (JsonParser p = new JsonFactory().createParser(text)) {
            parser = p;
            if (p.nextToken() != JsonToken.START_OBJECT) {
                throw problem("", "the file is not a JSON object; expected a JSON-stat 2.0 dataset");
            }
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String field = p.currentName();
                p.nextToken();
                switch (field) {
                    case "version" -> version = scalar(p);
                    case "class" -> kind = scalar(p);
                    case "label" -> label = scalar(p);
                    case "id" -> ids = MAPPER.readTree(p);
                    case "size" -> sizes = MAPPER.readTree(p);
                    case "role" -> roles = MAPPER.readTree(p);
                    case "dimension" -> dimensions = MAPPER.readTree(p);
                    case "value" -> values(p);
                    case "status" -> status(p);
                    default -> p.skipChildren();
                }
            }
        } catch (JsonProcessingException broken) {
            int line = broken.getLocation() == null ? 0 : broken.getLocation().getLineNr();
            throw log.fatal(line, 0, "not valid JSON (" + broken.getOriginalMessage() + "); expected a JSON-stat 2.0 dataset");
        }
        parser = null;   // problems from here on are of the whole document: named by key path alone
        return cube();
    }

    int rowsRead() {
        return rows;
    }

    /** A string (or number) member; an object or array where one was expected reads as empty and is passed over. */
    private static String scalar(JsonParser p) throws IOException {
        String text = p.currentToken().isScalarValue() ? p.getValueAsString("") : "";
        p.skipChildren();
        return text;
    }

    private KeyedSeries.Assembled cube() {
        if (!kind.equals("dataset")) {
            throw problem("class", kind.isEmpty() ? "no \"class\"; expected \"class\": \"dataset\" (JSON-stat 2.0, section \"class\")"
                    : "\"class\" is \"" + kind + "\"; expected \"dataset\" (a bundle or collection holds several; download one dataset)");
        }
        if (!version.startsWith("2.")) {
            throw problem("version", "\"version\" is " + (version.isEmpty() ? "missing" : "\"" + version + "\"")
                    + "; expected \"2.0\" (JSON-stat 2.0, section \"version\")");
        }
        if (ids == null || !ids.isArray() || sizes == null || !sizes.isArray() || ids.size() != sizes.size()) {
            throw problem("id", "\"id\" and \"size\" must be arrays of the same length (JSON-stat 2.0, sections \"id\" and \"size\")");
        }
        if (dimensions == null || !dimensions.isObject()) {
            throw problem("dimension", "no \"dimension\" object; expected one with each dimension of \"id\"");
        }
        int n = ids.size();
        List<String> dimensionIds = new ArrayList<>();
        int[] size = new int[n];
        long cells = 1;
        for (int d = 0; d < n; d++) {
            dimensionIds.add(ids.get(d).asText());
            if (!sizes.get(d).canConvertToInt() || sizes.get(d).asInt() < 1) {
                throw problem("size[" + d + "]", "'" + sizes.get(d) + "' is not a positive whole number");
            }
            size[d] = sizes.get(d).asInt();
            cells *= size[d];
            if (cells > Integer.MAX_VALUE) {
                cells = Integer.MAX_VALUE;
            }
        }
        int time = timeDimension(dimensionIds);
        List<List<String>> codes = new ArrayList<>();
        List<Map<String, String>> labels = new ArrayList<>();
        List<Map<String, String>> units = new ArrayList<>();
        for (int d = 0; d < n; d++) {
            categories(dimensionIds.get(d), size[d], codes, labels, units);
        }
        Period[] periods = periods(dimensionIds.get(time), codes.get(time));
        if (valueAt == null && valueCount != cells) {
            throw problem("value", "\"value\" has " + valueCount + " values but the sizes make " + cells
                    + "; expected one value for each combination of categories (JSON-stat 2.0, section \"value\")");
        }
        List<KeyedSeries.Dimension> described = new ArrayList<>();
        List<Integer> others = new ArrayList<>();
        for (int d = 0; d < n; d++) {
            if (d != time) {
                others.add(d);
                JsonNode l = dimensions.get(dimensionIds.get(d)).get("label");
                described.add(new KeyedSeries.Dimension(dimensionIds.get(d), l == null ? "" : l.asText("")));
            }
        }
        KeyedSeries collected = new KeyedSeries(baseName, label, described, 0, log);
        codes.get(time).forEach(collected::shape);
        for (int k = 0; k < others.size(); k++) {
            int d = others.get(k);
            for (String code : codes.get(d)) {
                collected.label(k, code, labels.get(d).getOrDefault(code, ""));
                collected.unit(k, code, units.get(d).getOrDefault(code, ""));
            }
        }
        int[] position = new int[n];
        String[] key = new String[others.size()];
        for (int i = 0; i < valueCount; i++) {
            double v = values[i];
            if (Double.isNaN(v)) {
                continue;   // null: no observation in this cell
            }
            int flat = valueAt == null ? i : valueAt[i];
            if (flat >= cells) {
                throw problem("value." + flat, "is a position beyond the " + cells + " combinations of categories");
            }
            int rest = flat;
            for (int d = n - 1; d >= 0; d--) {   // row-major: the last dimension varies fastest (section "value")
                position[d] = rest % size[d];
                rest /= size[d];
            }
            for (int k = 0; k < key.length; k++) {
                key[k] = codes.get(others.get(k)).get(position[others.get(k)]);
            }
            String status = statusAt.getOrDefault(flat, statusForAll);
            SdmxFlags.Read flags = SdmxFlags.letters(status);
            collected.add(key, periods[position[time]], v, flags.flags(), valueLine, 0);
            rows++;
        }
        values = null;
        if (rows == 0) {
            throw problem("value", "\"value\" holds no number; expected the dataset's values");
        }
        return collected.assemble();
    }

    /** The time dimension: named by {@code role.time}, or by its id. */
    private int timeDimension(List<String> dimensionIds) {
        JsonNode timeRole = roles == null ? null : roles.get("time");
        if (timeRole != null && timeRole.isArray() && timeRole.size() > 0) {
            int at = dimensionIds.indexOf(timeRole.get(0).asText());
            if (at < 0) {
                throw problem("role.time", "names '" + timeRole.get(0).asText() + "', which is not in \"id\" " + dimensionIds);
            }
            return at;
        }
        for (int d = 0; d < dimensionIds.size(); d++) {
            if (TIME_NAMES.contains(dimensionIds.get(d).toLowerCase(Locale.ROOT))) {
                return d;
            }
        }
        throw problem("role.time", "no time dimension: no \"role.time\" and no dimension called time or TIME_PERIOD among "
                + dimensionIds + "; expected a dataset with a time dimension (JSON-stat 2.0, section \"role\")");
    }

    /** A dimension's category codes in index order, and their labels (JSON-stat 2.0, section "category"). */
    private void categories(String id, int size, List<List<String>> codes, List<Map<String, String>> labels,
                            List<Map<String, String>> units) {
        String path = "dimension." + id;
        JsonNode dimension = dimensions.get(id);
        if (dimension == null || !dimension.isObject()) {
            throw problem(path, "missing; expected an object for each dimension of \"id\"");
        }
        JsonNode category = dimension.get("category");
        if (category == null || !category.isObject()) {
            throw problem(path + ".category", "missing; expected the dimension's categories");
        }
        JsonNode index = category.get("index");
        JsonNode label = category.get("label");
        String[] ordered = new String[size];
        if (index == null) {
            if (label == null || !label.isObject() || label.size() != 1 || size != 1) {
                throw problem(path + ".category.index", "missing; expected it unless the dimension has a single category with a label");
            }
            ordered[0] = label.fieldNames().next();
        } else if (index.isArray()) {
            if (index.size() != size) {
                throw problem(path + ".category.index", "has " + index.size() + " categories but \"size\" says " + size);
            }
            for (int i = 0; i < size; i++) {
                ordered[i] = index.get(i).asText();
            }
        } else if (index.isObject()) {
            if (index.size() != size) {
                throw problem(path + ".category.index", "has " + index.size() + " categories but \"size\" says " + size);
            }
            for (Map.Entry<String, JsonNode> e : (Iterable<Map.Entry<String, JsonNode>>) index::fields) {
                int at = e.getValue().asInt(-1);
                if (!e.getValue().canConvertToInt() || at < 0 || at >= size || ordered[at] != null) {
                    throw problem(path + ".category.index." + e.getKey(), "'" + e.getValue()
                            + "' is not a free position from 0 to " + (size - 1));
                }
                ordered[at] = e.getKey();
            }
        } else {
            throw problem(path + ".category.index", "expected an array or an object");
        }
        Map<String, String> names = new LinkedHashMap<>();
        if (label != null && label.isObject()) {
            label.fields().forEachRemaining(e -> names.put(e.getKey(), e.getValue().asText("")));
        }
        codes.add(List.of(ordered));
        labels.add(names);
        units.add(units(category.get("unit")));
    }

    /**
     * The unit of each category that has one (JSON-stat 2.0 full specification, json-stat.org/full, "unit", with
     * "decimals", "label", "symbol", "position": the properties checked; "unit" a child of "category", meant for
     * the categories of a dimension whose role is metric, from memory): its {@code label}, else its {@code symbol}
     * ({@code position} says on which side of a number the symbol goes; {@code decimals} how many decimals
     * the producer shows, which a brief does not follow: it rounds by its own rules).
     */
    private static Map<String, String> units(JsonNode unit) {
        Map<String, String> units = new LinkedHashMap<>();
        if (unit != null && unit.isObject()) {
            unit.fields().forEachRemaining(e -> {
                JsonNode label = e.getValue().get("label");
                JsonNode symbol = e.getValue().get("symbol");
                String text = label != null && label.isTextual() && !label.asText().isBlank() ? label.asText()
                        : symbol != null && symbol.isTextual() ? symbol.asText() : "";
                if (!text.isBlank()) {
                    units.put(e.getKey(), text.strip());
                }
            });
        }
        return units;
    }

    private Period[] periods(String id, List<String> codes) {
        Period[] periods = new Period[codes.size()];
        Map<Period, String> seen = new HashMap<>();
        for (int i = 0; i < periods.length; i++) {
            String path = "dimension." + id + ".category.index." + codes.get(i);
            SdmxPeriods.Reading read = SdmxPeriods.read(codes.get(i));
            if (read.period().isEmpty()) {
                throw problem(path, read.problem());
            }
            String before = seen.putIfAbsent(read.period().get(), codes.get(i));
            if (before != null) {
                throw problem(path, "is the same period as '" + before + "'; expected each period once");
            }
            periods[i] = read.period().get();
        }
        return periods;
    }

    /** {@code value}: a dense array (null for no value) or a sparse object of position → value. */
    private void values(JsonParser p) throws IOException {
        valueLine = p.currentLocation().getLineNr();
        values = new double[1024];
        if (p.currentToken() == JsonToken.START_ARRAY) {
            while (p.nextToken() != JsonToken.END_ARRAY) {
                store(p, -1, "value[" + valueCount + "]");
            }
        } else if (p.currentToken() == JsonToken.START_OBJECT) {
            valueAt = new int[values.length];
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String key = p.currentName();
                p.nextToken();
                store(p, position(key, "value." + key), "value." + key);
            }
        } else {
            throw problem("value", "expected an array or an object of values");
        }
    }

    private void store(JsonParser p, int flat, String path) throws IOException {
        if (valueCount == MAX_VALUES) {
            throw problem("value", "more than " + MAX_VALUES + " values; expected a smaller dataset (filter it on the portal)");
        }
        if (valueCount == values.length) {
            values = java.util.Arrays.copyOf(values, values.length * 2);
            valueAt = valueAt == null ? null : java.util.Arrays.copyOf(valueAt, values.length);
        }
        double v;
        if (p.currentToken() == JsonToken.VALUE_NULL) {
            v = Double.NaN;
        } else if (p.currentToken().isNumeric()) {
            v = p.getDoubleValue();
            if (!(Math.abs(v) <= NumberCells.MAX_MAGNITUDE)) {
                throw problem(path, "'" + p.getText() + "' is beyond ±1e100; expected a smaller value");
            }
        } else {
            throw problem(path, "'" + p.getText() + "' is not a number; expected a number or null");
        }
        if (valueAt != null) {
            valueAt[valueCount] = flat;
        }
        values[valueCount++] = v;
    }

    /** {@code status}: one string for every value, an array, or a sparse object (section "status"). */
    private void status(JsonParser p) throws IOException {
        if (p.currentToken() == JsonToken.VALUE_STRING) {
            statusForAll = p.getText();
        } else if (p.currentToken() == JsonToken.START_ARRAY) {
            int i = 0;
            while (p.nextToken() != JsonToken.END_ARRAY) {
                if (p.currentToken() == JsonToken.VALUE_STRING && !p.getText().isEmpty()) {
                    statusAt.put(i, p.getText().intern());
                }
                p.skipChildren();
                i++;
            }
        } else if (p.currentToken() == JsonToken.START_OBJECT) {
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String key = p.currentName();
                p.nextToken();
                if (p.currentToken() == JsonToken.VALUE_STRING) {
                    statusAt.put(position(key, "status." + key), p.getText().intern());
                }
                p.skipChildren();
            }
        } else if (p.currentToken() != JsonToken.VALUE_NULL) {
            throw problem("status", "expected a string, an array or an object of status codes");
        }
    }

    private int position(String key, String path) {
        try {
            int at = Integer.parseInt(key);
            if (at >= 0) {
                return at;
            }
        } catch (NumberFormatException notANumber) {
            // said below
        }
        throw problem(path, "'" + key + "' is not a position; expected a whole number from 0");
    }

    /** A problem at a key path, located at the parser's line. */
    private DataProblemException problem(String path, String message) {
        int line = parser == null || parser.currentLocation() == null ? 0 : parser.currentLocation().getLineNr();
        return log.fatal(Math.max(line, 0), 0, (path.isEmpty() ? "" : "at key " + path + ": ") + message);
    }
}
