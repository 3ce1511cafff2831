package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import com.fasterxml.jackson.databind.ser.std.ToStringSerializer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BiFunction;
import org.annalist.series.Period;

/**
 * Writes findings as JSON in the contract's form: snake_case names, numbers as numbers, absent as
 * null, periods by their labels ({@code 1949-01}), and typed facts in the words a
 * {@link JsonWording} gives them.
 */
public final class FindingsJson {

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .propertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
            .enable(SerializationFeature.INDENT_OUTPUT)
            .serializationInclusion(JsonInclude.Include.ALWAYS)
            .addModule(new SimpleModule("annalist-findings")
                    .addSerializer(Period.class, ToStringSerializer.instance)
                    .addSerializer(TestName.class, new Worded<>(TestName.class, JsonWording::test))
                    .addSerializer(TrendFinding.Test.class, new Worded<>(TrendFinding.Test.class, JsonWording::trendTest))
                    .addSerializer(Smoothing.CentredAverage.class,
                            new Worded<>(Smoothing.CentredAverage.class, JsonWording::movingAverage))
                    .addSerializer(OutlookFinding.Model.class,
                            new Worded<>(OutlookFinding.Model.class, JsonWording::forecastModel))
                    .addSerializer(OutlookFinding.Choice.class, new Worded<>(OutlookFinding.Choice.class, JsonWording::choice))
                    .addSerializer(CalendarNote.class, new Worded<>(CalendarNote.class, JsonWording::calendarNote))
                    .addSerializer(Double.class, new FiniteOrNull())
                    .addSerializer(Double.TYPE, new FiniteOrNull())
                    .addSerializer(double[].class, new FiniteOrNullArray()))
            .build();

    /** The field the JSON Pointers of values that could not be computed are listed in (written only when there are any). */
    static final String NOT_COMPUTED = "not_computed";

    private FindingsJson() {
    }

    /**
     * A number that could not be computed (NaN or infinite) is written as null, never as the string
     * "NaN", and its JSON Pointer is listed in {@value #NOT_COMPUTED} of the findings it belongs to.
     */
    public static String write(Object value, JsonWording wording) {
        try {
            List<String> notComputed = new ArrayList<>();
            String json = MAPPER.writer().withAttribute(JsonWording.class, wording)
                    .withAttribute(NOT_COMPUTED, notComputed).writeValueAsString(value);
            if (!notComputed.isEmpty()) {
                json = MAPPER.writeValueAsString(noted(MAPPER.readTree(json), notComputed));
            }
            return json + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("findings could not be written as JSON", e);
        }
    }

    /** The tree with each findings object listing its values that could not be computed. */
    private static JsonNode noted(JsonNode tree, List<String> pointers) {
        if (tree instanceof ObjectNode object) {
            pointers.forEach(object.withArray(NOT_COMPUTED)::add);
        } else if (tree instanceof ArrayNode array) {
            for (String pointer : pointers) {
                int slash = pointer.indexOf('/', 1);
                int index = Integer.parseInt(pointer.substring(1, slash < 0 ? pointer.length() : slash));
                if (array.get(index) instanceof ObjectNode object) {
                    object.withArray(NOT_COMPUTED).add(slash < 0 ? "" : pointer.substring(slash));
                }
            }
        }
        return tree;
    }

    @SuppressWarnings("unchecked")
    private static void notComputed(JsonGenerator generator, SerializerProvider provider) {
        Object list = provider.getAttribute(NOT_COMPUTED);
        if (list instanceof List<?>) {
            ((List<String>) list).add(pointer(generator.getOutputContext()));
        }
    }

    /** The pointer of the value about to be written (in an array, the context still points at the last one written). */
    private static String pointer(JsonStreamContext context) {
        String pointer = context.pathAsPointer().toString();
        if (!context.inArray()) {
            return pointer;
        }
        String array = context.getEntryCount() == 0 ? pointer : pointer.substring(0, pointer.lastIndexOf('/'));
        return array + "/" + context.getEntryCount();
    }

    /** A double as a number, or null when it could not be computed. */
    private static final class FiniteOrNull extends StdSerializer<Double> {
        private static final long serialVersionUID = 1L;

        FiniteOrNull() {
            super(Double.class);
        }

        @Override
        public void serialize(Double value, JsonGenerator generator, SerializerProvider provider) throws IOException {
            if (Double.isFinite(value)) {
                generator.writeNumber(value);
            } else {
                notComputed(generator, provider);
                generator.writeNull();
            }
        }
    }

    /** An array of doubles, each as {@link FiniteOrNull} writes it. */
    private static final class FiniteOrNullArray extends StdSerializer<double[]> {
        private static final long serialVersionUID = 1L;

        FiniteOrNullArray() {
            super(double[].class);
        }

        @Override
        public void serialize(double[] values, JsonGenerator generator, SerializerProvider provider) throws IOException {
            generator.writeStartArray(values, values.length);
            for (int i = 0; i < values.length; i++) {
                if (Double.isFinite(values[i])) {
                    generator.writeNumber(values[i]);
                } else {
                    notComputed(generator, provider);
                    generator.writeNull();
                }
            }
            generator.writeEndArray();
        }
    }

    /** A typed fact written as the words the call's {@link JsonWording} gives it. */
    private static final class Worded<T> extends StdSerializer<T> {
        private static final long serialVersionUID = 1L;
        private final transient BiFunction<JsonWording, T, String> words;

        Worded(Class<T> type, BiFunction<JsonWording, T, String> words) {
            super(type);
            this.words = words;
        }

        @Override
        public void serialize(T value, JsonGenerator generator, SerializerProvider provider) throws IOException {
            generator.writeString(words.apply((JsonWording) provider.getAttribute(JsonWording.class), value));
        }
    }
}
