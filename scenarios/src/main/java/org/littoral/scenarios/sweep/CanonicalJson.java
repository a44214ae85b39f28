package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectWriter;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Iterator;
import java.util.List;

/** JSON written the same way on every run and machine: for hashes and byte-identical member files. */
final class CanonicalJson {
    static final ObjectMapper MAPPER = new ObjectMapper();
    /** Pretty printer with "\n" line ends whatever the platform. */
    static final ObjectWriter PRETTY = MAPPER.writer(new DefaultPrettyPrinter()
            .withObjectIndenter(new DefaultIndenter("  ", "\n"))
            .withArrayIndenter(new DefaultIndenter("  ", "\n")));

    private CanonicalJson() {
    }

    /** A copy with the keys of every object sorted. */
    static JsonNode sorted(JsonNode n) {
        if (n.isObject()) {
            List<String> keys = new ArrayList<>();
            for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
                keys.add(it.next());
            }
            Collections.sort(keys);
            ObjectNode o = JsonNodeFactory.instance.objectNode();
            for (String k : keys) {
                o.set(k, sorted(n.get(k)));
            }
            return o;
        }
        if (n.isArray()) {
            ArrayNode a = JsonNodeFactory.instance.arrayNode();
            for (JsonNode c : n) {
                a.add(sorted(c));
            }
            return a;
        }
        return n;
    }

    static String sha256(JsonNode n) {
        try {
            byte[] bytes = MAPPER.writeValueAsBytes(sorted(n));
            byte[] d = MessageDigest.getInstance("SHA-256").digest(bytes);
            StringBuilder sb = new StringBuilder(64);
            for (byte b : d) {
                sb.append(Character.forDigit((b >> 4) & 0xF, 16)).append(Character.forDigit(b & 0xF, 16));
            }
            return sb.toString();
        } catch (JsonProcessingException | NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    static byte[] prettyBytes(JsonNode n) {
        try {
            String s = PRETTY.writeValueAsString(n) + "\n";
            return s.getBytes(StandardCharsets.UTF_8);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
