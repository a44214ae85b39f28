package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.IntNode;
import org.junit.jupiter.api.Test;

class KeyPathTest {
    final JsonNode doc = read("{\"a\": {\"b\": 1, \"list\": [{\"name\": \"x\", \"v\": 2}, {\"name\": \"y\", \"v\": 3}]}}");

    static JsonNode read(String s) {
        try {
            return CanonicalJson.MAPPER.readTree(s);
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    @Test
    void dottedPathsIndexesAndSelectorsAddressValues() {
        assertEquals(1, KeyPath.parse("a.b").get(doc).asInt());
        assertEquals(3, KeyPath.parse("a.list[1].v").get(doc).asInt());
        assertEquals(2, KeyPath.parse("a.list[name=x].v").get(doc).asInt());
    }

    @Test
    void settingReplacesOnlyThatValue() {
        JsonNode d = doc.deepCopy();
        KeyPath.parse("a.list[name=y].v").set(d, IntNode.valueOf(9));
        assertEquals(9, d.get("a").get("list").get(1).get("v").asInt());
        assertEquals(2, d.get("a").get("list").get(0).get("v").asInt());
    }

    @Test
    void malformedPathsSayWhatIsWrong() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> KeyPath.parse("a..b")).getMessage().contains("empty key"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> KeyPath.parse("a.list[x")).getMessage().contains("without ']'"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> KeyPath.parse("a.")).getMessage().contains("ends with"));
    }

    @Test
    void aMissingKeyOrIndexIsReportedWithWhatIsThere() {
        String e = assertThrows(IllegalArgumentException.class, () -> KeyPath.parse("a.c").get(doc)).getMessage();
        assertTrue(e.contains("no key 'c' under 'a'") && e.contains("b, list"), e);
        String i = assertThrows(IllegalArgumentException.class, () -> KeyPath.parse("a.list[5].v").get(doc)).getMessage();
        assertTrue(i.contains("2 elements"), i);
        String s = assertThrows(IllegalArgumentException.class, () -> KeyPath.parse("a.b.c").get(doc)).getMessage();
        assertTrue(s.contains("the value 1"), s);
    }
}
