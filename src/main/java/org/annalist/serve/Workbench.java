package org.annalist.serve;

import java.io.IOException;
import java.net.Inet6Address;
import java.net.InetAddress;
import java.util.LinkedHashSet;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.HttpConfiguration;
import org.eclipse.jetty.server.HttpConnectionFactory;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.server.Server;
import org.eclipse.jetty.server.ServerConnector;
import org.eclipse.jetty.util.Callback;
import org.eclipse.jetty.util.thread.QueuedThreadPool;

/**
 * The browser workbench ({@code annalist serve}): a small web server on this machine whose pages
 * run the same pipeline as the commands.
 *
 * <p>Why Jetty 12's core server (jetty-server, EPL-2.0 or Apache-2.0), without servlets and without
 * a framework on top: it is small (four jars, about 2.5 MB) and starts in a fraction of a second,
 * and it brings what a server must not get wrong and the JDK's own {@code com.sun.net.httpserver}
 * does not have — a bounded multipart parser (the upload) and form parser, limits on headers and
 * bodies, and a maintained HTTP/1.1 implementation. A framework such as Javalin runs on the same
 * Jetty and adds the Kotlin runtime and a routing layer that five addresses do not need.
 *
 * <p>Every request passes the {@link Guard} first (the Host header, the token of a state-changing
 * request), then the {@link Routes}.
 */
public final class Workbench implements AutoCloseable {

    private final Settings settings;
    private final Server server;
    private final ServerConnector connector;
    private final Sessions sessions;
    private final ExecutorService routines = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "annalist-routine");
        t.setDaemon(true);
        return t;
    });
    private final ScheduledExecutorService sweeper = Executors.newSingleThreadScheduledExecutor(r -> {
        Thread t = new Thread(r, "annalist-sessions");
        t.setDaemon(true);
        return t;
    });

    private Workbench(Settings settings) throws IOException {
        this.settings = settings;
        this.sessions = new Sessions(settings.idle());
        QueuedThreadPool threads = new QueuedThreadPool(16, 2);
        threads.setName("annalist-serve");
        threads.setDaemon(true);
        server = new Server(threads);
        HttpConfiguration http = new HttpConfiguration();
        http.setSendServerVersion(false);
        http.setSendXPoweredBy(false);
        http.setRequestHeaderSize(16 * 1024);
        connector = new ServerConnector(server, 1, 1, new HttpConnectionFactory(http));
        connector.setHost(settings.bind().getHostAddress());
        connector.setPort(settings.port());
        server.addConnector(connector);
        Routes routes = new Routes(settings, sessions, routines);
        server.setHandler(new Handler.Abstract() {
            @Override
            public boolean handle(Request request, Response response, Callback callback) {
                Exchange exchange = new Exchange(request, response, callback);
                Guard guard = new Guard(allowedHosts());
                routes.handle(exchange, guard);
                return true;
            }
        });
        server.setStopAtShutdown(false);
    }

    /**
     * Starts a workbench; it serves until {@link #close}.
     *
     * @throws IOException when the port cannot be had (taken, or not allowed)
     */
    public static Workbench start(Settings settings) throws IOException {
        Workbench workbench = new Workbench(settings);
        try {
            workbench.server.start();
        } catch (IOException e) {
            workbench.close();
            throw e;
        } catch (Exception e) {
            workbench.close();
            throw new IOException(e.getMessage(), e);
        }
        long sweep = Math.max(1, Math.min(settings.idle().toSeconds(), 600));
        workbench.sweeper.scheduleAtFixedRate(workbench.sessions::sweep, sweep, sweep, TimeUnit.SECONDS);
        return workbench;
    }

    /** The port it listens on (the one chosen when 0 was asked for). */
    public int port() {
        return connector.getLocalPort();
    }

    /** The address to open in a browser. */
    public String address() {
        return "http://" + hostForUrl(settings.bind()) + ":" + port() + "/";
    }

    /** The sessions' temporary folder (deleted when the server stops). */
    public java.nio.file.Path temporaryFolder() {
        return sessions.root();
    }

    /** The Host header values this server answers to: its address and, on loopback, {@code localhost}. */
    Set<String> allowedHosts() {
        Set<String> hosts = new LinkedHashSet<>();
        int port = port();
        hosts.add(hostForUrl(settings.bind()) + ":" + port);
        if (settings.loopback()) {
            hosts.add("localhost:" + port);
            hosts.add("127.0.0.1:" + port);
            hosts.add("[::1]:" + port);
        } else if (settings.bind().isAnyLocalAddress()) {
            // every interface: the names this machine goes by
            try {
                for (InetAddress a : InetAddress.getAllByName(InetAddress.getLocalHost().getHostName())) {
                    hosts.add(hostForUrl(a) + ":" + port);
                }
                hosts.add(InetAddress.getLocalHost().getHostName().toLowerCase(Locale.ROOT) + ":" + port);
            } catch (IOException e) {
                // only the loopback names then
            }
            hosts.add("localhost:" + port);
            hosts.add("127.0.0.1:" + port);
        }
        return hosts;
    }

    private static String hostForUrl(InetAddress address) {
        return address instanceof Inet6Address ? "[" + address.getHostAddress().replaceAll("%.*$", "") + "]"
                : address.getHostAddress();
    }

    /** Stops serving, ends every session and deletes their files. */
    @Override
    public void close() {
        try {
            server.stop();
        } catch (Exception e) {
            // stopping: nothing more to do about a connector that would not close
        }
        routines.shutdownNow();
        sweeper.shutdownNow();
        sessions.endAll();
    }

    /** Blocks until the server stops. */
    public void join() {
        try {
            server.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

}
