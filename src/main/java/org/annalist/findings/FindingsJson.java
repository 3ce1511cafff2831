package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.SerializerProvider;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.module.SimpleModule;
import com.fasterxml.jackson.databind.ser.std.StdSerializer;
import com.fasterxml.jackson.databind.ser.std.ToStringSerializer;
import java.io.IOException;
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
                    .addSerializer(CalendarNote.class, new Worded<>(CalendarNote.class, JsonWording::calendarNote)))
            .build();

    private FindingsJson() {
    }

    public static String write(Object value, JsonWording wording) {
        try {
            return MAPPER.writer().withAttribute(JsonWording.class, wording).writeValueAsString(value)
                    + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("findings could not be written as JSON", e);
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
