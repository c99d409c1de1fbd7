package org.meritbook.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.publishing.PublishingSequence;

/** {@code --bind}: the server listens where it is told, and names itself by that address. */
class LiveBindTest {
    @TempDir
    Path dir;

    @Test
    void anExplicitAddressIsBoundAndAcceptedAsHostBesidesTheLoopbackNames() throws Exception {
        Path notebook = dir.resolve("tiny.md");
        Files.writeString(notebook, "---\ntitle: Tiny\n---\n\nNo cells.\n");
        // Linux routes all of 127.0.0.0/8 to the loopback interface: 127.0.0.2 is a second address to bind.
        InetAddress other = InetAddress.getByAddress(new byte[] {127, 0, 0, 2});
        LiveSession.Options options = new LiveSession.Options(other, 0, dir.resolve("out"));
        try (LiveSession session = LiveSession.start(notebook, options, PublishingSequence.standard(Optional.empty()), s -> { })) {
            InetSocketAddress address = session.server().address();
            assertEquals(other, address.getAddress());
            assertEquals("http://127.0.0.2:" + address.getPort() + "/", session.server().base().toString());
            assertEquals("127.0.0.2", session.uri().getHost());
            assertEquals(200, status(session, "127.0.0.2:" + address.getPort()));
            assertEquals(403, status(session, "192.0.2.7:" + address.getPort()));
        }
    }

    @Test
    void withoutBindTheLoopbackAddressIsUsed() throws Exception {
        Path notebook = dir.resolve("tiny.md");
        Files.writeString(notebook, "---\ntitle: Tiny\n---\n");
        LiveSession.Options options = new LiveSession.Options(null, 0, dir.resolve("out"));
        try (LiveSession session = LiveSession.start(notebook, options, PublishingSequence.standard(Optional.empty()), s -> { })) {
            assertEquals("127.0.0.1", session.server().address().getAddress().getHostAddress());
            assertTrue(session.uri().toString().startsWith("http://127.0.0.1:"));
        }
    }

    private static int status(LiveSession session, String host) throws Exception {
        InetSocketAddress address = session.server().address();
        try (Socket socket = new Socket(address.getAddress(), address.getPort())) {
            socket.setSoTimeout(30_000);
            String head = "GET /status?" + session.uri().getRawQuery() + " HTTP/1.1\r\nHost: " + host
                    + "\r\nConnection: close\r\n\r\n";
            socket.getOutputStream().write(head.getBytes(StandardCharsets.US_ASCII));
            String line = new String(socket.getInputStream().readNBytes(12), StandardCharsets.US_ASCII);
            return Integer.parseInt(line.substring(9, 12));
        }
    }
}
