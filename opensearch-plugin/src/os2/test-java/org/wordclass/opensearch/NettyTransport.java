package org.wordclass.opensearch;

import org.opensearch.plugins.Plugin;
import org.opensearch.transport.Netty4Plugin;

/**
 * For the tests, the one place where the OpenSearch 2.x test setup differs from the other
 * line: the netty4 transport plugin is {@code Netty4Plugin} in 2.x.
 */
final class NettyTransport {
  /** The plugin that brings the real HTTP and transport layer, and the names it registers them under. */
  static final Class<? extends Plugin> PLUGIN = Netty4Plugin.class;
  static final String HTTP = Netty4Plugin.NETTY_HTTP_TRANSPORT_NAME;
  static final String TRANSPORT = Netty4Plugin.NETTY_TRANSPORT_NAME;

  private NettyTransport() {}
}
