package dev.changeling.results;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.DeserializationContext;
import com.fasterxml.jackson.databind.JsonDeserializer;
import com.fasterxml.jackson.databind.JsonSerializer;
import com.fasterxml.jackson.databind.SerializerProvider;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A mutant's lists of tests as they are stored: each test as its index in the results' {@code tests},
 * since the same few hundred long unique ids would otherwise be written out again for every mutant (a
 * 163 MB file for 11,700 mutants of commons-cli). An id the suite does not list is stored as itself.
 * The suite reaches the writer and the reader as the attribute {@link #SUITE}.
 */
final class TestRefs {

    /** The attribute holding the suite: a {@code Map<String, Integer>} of index by id when writing, a {@code List<String>} of ids when reading. */
    static final String SUITE = "changeling.tests";

    private TestRefs() {
    }

    static final class Writer extends JsonSerializer<List<String>> {
        @Override
        public void serialize(List<String> ids, JsonGenerator out, SerializerProvider provider) throws IOException {
            @SuppressWarnings("unchecked")
            Map<String, Integer> index = (Map<String, Integer>) provider.getAttribute(SUITE);
            out.writeStartArray();
            for (String id : ids) {
                Integer at = index == null ? null : index.get(id);
                if (at == null) {
                    out.writeString(id);
                } else {
                    out.writeNumber(at);
                }
            }
            out.writeEndArray();
        }
    }

    static final class Reader extends JsonDeserializer<List<String>> {
        @Override
        public List<String> deserialize(JsonParser in, DeserializationContext context) throws IOException {
            @SuppressWarnings("unchecked")
            List<String> suite = (List<String>) context.getAttribute(SUITE);
            if (in.currentToken() != JsonToken.START_ARRAY) {
                return context.reportInputMismatch(List.class, "a list of tests must be an array");
            }
            List<String> ids = new ArrayList<>();
            for (JsonToken token = in.nextToken(); token != JsonToken.END_ARRAY; token = in.nextToken()) {
                if (token == JsonToken.VALUE_NUMBER_INT) {
                    int at = in.getIntValue();
                    if (suite == null || at < 0 || at >= suite.size()) {
                        return context.reportInputMismatch(List.class, "test number " + at + " is not in the file's tests");
                    }
                    ids.add(suite.get(at));
                } else {
                    ids.add(in.getValueAsString());
                }
            }
            return ids;
        }
    }
}
