package org.wordclass.opensearch;

import org.opensearch.common.network.NetworkModule;
import org.opensearch.common.settings.Settings;
import org.opensearch.plugins.Plugin;
import org.opensearch.transport.Netty4ModulePlugin;

/**
 * For the tests, the one place where the OpenSearch 3.x test setup differs from the other
 * line: the netty4 transport plugin is {@code Netty4ModulePlugin} in 3.x.
 */
final class NettyTransport {
  /** The plugin that brings the real HTTP and transport layer. */
  static final Class<? extends Plugin> PLUGIN = Netty4ModulePlugin.class;

  private NettyTransport() {}

  /** Node settings that choose netty4 for HTTP and for the transport between nodes. */
  static Settings settings() {
    return Settings.builder()
        .put(NetworkModule.HTTP_TYPE_KEY, Netty4ModulePlugin.NETTY_HTTP_TRANSPORT_NAME)
        .put(NetworkModule.TRANSPORT_TYPE_KEY, Netty4ModulePlugin.NETTY_TRANSPORT_NAME)
        .build();
  }
}
