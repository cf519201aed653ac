package org.linemass.reports.json;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;

/** Number fields for {@link JsonPart} writers: null for a missing or non-finite value, as in the rest of the report. */
public final class JsonNumbers {

    private JsonNumbers() {
    }

    /** Writes {@code name: v}, or {@code name: null} when {@code v} is null, NaN or infinite. */
    public static void field(JsonGenerator g, String name, Double v) throws IOException {
        g.writeFieldName(name);
        if (v == null || !Double.isFinite(v)) {
            g.writeNull();
        } else {
            g.writeNumber(v);
        }
    }
}
