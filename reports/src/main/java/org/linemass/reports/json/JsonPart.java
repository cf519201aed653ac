package org.linemass.reports.json;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;

/**
 * A job-level part of the JSON report written by another package (the cutting plan, the costs):
 * its key and a writer of its value. In a one-drawing document the parts follow the drawing's
 * sections; in a several-drawing document they follow the combined totals. Keys must be declared
 * in the schema.
 */
public interface JsonPart {

    /** The key of the part, in snake case. */
    String key();

    /** Writes the part's value (an object) at the generator's position. */
    void write(JsonGenerator g) throws IOException;
}
