package org.wordclass.opensearch;

import org.opensearch.plugins.Plugin;
import org.opensearch.transport.Netty4ModulePlugin;

/**
 * For the tests, the one place where the OpenSearch 3.x test setup differs from the other
 * line: the netty4 transport plugin is {@code Netty4ModulePlugin} in 3.x.
 */
final class NettyTransport {
  /** The plugin that brings the real HTTP and transport layer, and the names it registers them under. */
  static final Class<? extends Plugin> PLUGIN = Netty4ModulePlugin.class;
  static final String HTTP = Netty4ModulePlugin.NETTY_HTTP_TRANSPORT_NAME;
  static final String TRANSPORT = Netty4ModulePlugin.NETTY_TRANSPORT_NAME;

  private NettyTransport() {}
}
