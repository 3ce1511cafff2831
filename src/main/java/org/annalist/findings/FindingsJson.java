package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;

/** Writes findings as JSON in the contract's form: snake_case names, numbers as numbers, absent as null. */
public final class FindingsJson {

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .propertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
            .enable(SerializationFeature.INDENT_OUTPUT)
            .serializationInclusion(JsonInclude.Include.ALWAYS)
            .build();

    private FindingsJson() {
    }

    public static String write(Object value) {
        try {
            return MAPPER.writeValueAsString(value) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("findings could not be written as JSON", e);
        }
    }
}
