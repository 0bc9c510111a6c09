package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class StrictJsonTest {
    @Test
    void parseObject_validObject_keepsExactNumbers() {
        var o = StrictJson.parseObject("{\"players\": 4, \"big\": 123456789012345678901234567890, \"x\": [1.5, null]}");
        assertEquals(4, o.get("players").getAsInt());
        assertEquals("123456789012345678901234567890", o.get("big").getAsBigDecimal().toPlainString());
    }

    // RFC 8259 grammar: each of these is not a single JSON object text.
    @ParameterizedTest
    @ValueSource(strings = {"", "  ", "[]", "4", "\"text\"", "{", "{\"a\":1", "{\"a\":1}}", "{\"a\":1} {}",
        "{'a':1}", "{a:1}", "{\"a\":1,}", "{\"a\":01}", "{\"a\":1 /* c */}", "{\"a\":NaN}", "null"})
    void parseObject_notOneStrictObject_isMalformed(String text) {
        ApiException e = assertThrows(ApiException.class, () -> StrictJson.parseObject(text));
        assertEquals(400, e.status());
        assertEquals("malformed_json", e.error());
    }

    @Test
    void parseObject_duplicateMember_isRefused() {
        ApiException e = assertThrows(ApiException.class, () -> StrictJson.parseObject("{\"a\":1,\"a\":2}"));
        assertEquals("malformed_json", e.error());
    }

    @Test
    void parseObject_tooDeep_isRefused() {
        String deep = "{\"a\":" + "[".repeat(40) + "]".repeat(40) + "}";
        ApiException e = assertThrows(ApiException.class, () -> StrictJson.parseObject(deep));
        assertEquals("malformed_json", e.error());
    }
}
