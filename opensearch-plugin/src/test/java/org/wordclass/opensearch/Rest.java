package org.wordclass.opensearch;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import org.opensearch.common.xcontent.XContentHelper;
import org.opensearch.common.xcontent.json.JsonXContent;

/** A node's REST interface as the tests use it: a method, a path and a JSON body in, a status and JSON out. */
@FunctionalInterface
interface Rest {
  /** Sends the request; {@code json} may be null. Statuses of 400 and above are returned, not thrown. */
  Response call(String method, String path, String json) throws IOException;

  /** A REST answer. */
  final class Response {
    final int status;
    final String text;

    Response(int status, String text) {
      this.status = status;
      this.text = text;
    }

    Map<String, Object> json() {
      return XContentHelper.convertToMap(JsonXContent.jsonXContent, text, false);
    }

    /** The value at a path of keys and list indexes, such as {@code "hits", "hits", 0, "_id"}. */
    Object at(Object... path) {
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
