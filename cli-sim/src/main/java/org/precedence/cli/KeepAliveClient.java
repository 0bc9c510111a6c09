package org.precedence.cli;

import java.io.BufferedInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.nio.charset.StandardCharsets;

/**
 * A minimal blocking HTTP/1.1 client over one keep-alive connection, for the load benchmark:
 * GET requests only, responses framed by {@code Content-Length}. It costs the machine far less
 * than a general client, so on a small machine the benchmark measures the server.
 */
final class KeepAliveClient implements AutoCloseable {
    /** A response: status and body. */
    record Response(int status, byte[] body) {
    }

    private static final int MAX_HEADER_BYTES = 16 * 1024;
    private final Socket socket;
    private final InputStream in;
    private final OutputStream out;
    private final String host;

    KeepAliveClient(InetSocketAddress address, int timeoutMillis) throws IOException {
        socket = new Socket();
        socket.setTcpNoDelay(true);
        socket.connect(address, timeoutMillis);
        socket.setSoTimeout(timeoutMillis);
        in = new BufferedInputStream(socket.getInputStream(), 16 * 1024);
        out = socket.getOutputStream();
        host = address.getAddress().getHostAddress() + ":" + address.getPort();
    }

    Response get(String path) throws IOException {
        out.write(("GET " + path + " HTTP/1.1\r\nHost: " + host + "\r\nAccept: application/json\r\n\r\n")
                .getBytes(StandardCharsets.US_ASCII));
        out.flush();
        String head = readHead();
        int lineEnd = head.indexOf("\r\n");
        String statusLine = head.substring(0, lineEnd);
        if (!statusLine.startsWith("HTTP/1.") || statusLine.length() < 12) {
            throw new IOException("not an HTTP/1.x status line: " + statusLine);
        }
        int status = Integer.parseInt(statusLine.substring(9, 12));
        int length = -1;
        int pos = lineEnd + 2;
        while (pos < head.length() - 2) {
            int end = head.indexOf("\r\n", pos);
            int colon = head.indexOf(':', pos);
            if (colon > 0 && colon < end && head.regionMatches(true, pos, "Content-Length", 0, colon - pos)
                    && colon - pos == "Content-Length".length()) {
                length = Integer.parseInt(head.substring(colon + 1, end).trim());
            }
            pos = end + 2;
        }
        if (length < 0) {
            throw new IOException("response without Content-Length");
        }
        byte[] body = in.readNBytes(length);
        if (body.length != length) {
            throw new IOException("connection closed inside a response body");
        }
        return new Response(status, body);
    }

    private String readHead() throws IOException {
        ByteArrayOutputStream head = new ByteArrayOutputStream(256);
        int matched = 0;
        while (matched < 4) {
            int b = in.read();
            if (b < 0) {
                throw new IOException("connection closed before a response");
            }
            head.write(b);
            matched = (b == (matched % 2 == 0 ? '\r' : '\n')) ? matched + 1 : (b == '\r' ? 1 : 0);
            if (head.size() > MAX_HEADER_BYTES) {
                throw new IOException("response headers longer than " + MAX_HEADER_BYTES + " bytes");
            }
        }
        return head.toString(StandardCharsets.US_ASCII);
    }

    @Override
    public void close() throws IOException {
        socket.close();
    }
}
