package org.wordclass.nodetesting;

import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Map;

/** A node's REST interface as the tests use it: a method, a path and a JSON body in, a status and JSON out. */
@FunctionalInterface
public interface Rest {
  /** Sends the request; {@code json} may be null. Statuses of 400 and above are returned, not thrown. */
  Response call(String method, String path, String json) throws IOException;

  /** A REST answer. */
  final class Response {
    private static final ObjectMapper JSON = new ObjectMapper();

    public final int status;
    public final String text;

    public Response(int status, String text) {
      this.status = status;
      this.text = text;
    }

    public Map<String, Object> json() {
      try {
        return JSON.readValue(text, new TypeReference<Map<String, Object>>() {});
      } catch (IOException e) {
        throw new UncheckedIOException("not a JSON object: " + text, e);
      }
    }

    /** The value at a path of keys and list indexes, such as {@code "hits", "hits", 0, "_id"}. */
    public Object at(Object... path) {
      Object node = json();
      for (Object step : path) {
        node = step instanceof Integer ? ((List<?>) node).get((Integer) step) : ((Map<?, ?>) node).get(step);
      }
      return node;
    }

    @Override
    public String toString() {
      return status + " " + text;
    }
  }
}
