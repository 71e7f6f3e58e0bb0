package org.ventcase.common;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class InvalidInputMessageTest {

    @Test
    void aRefusedValueIsQuotedAndAMissingOneSaysSoPlainly() {
        // the wording of the project's own case checker (CaseValidator): "FIELD: missing; expected ..."
        assertEquals("storage.temperature: missing; expected a temperature, e.g. '20 C'",
                InvalidInputException.missing("storage.temperature", "expected a temperature, e.g. '20 C'")
                        .getMessage());
        assertEquals("storage.temperature: '20 furlongs' is not accepted; expected a temperature",
                InvalidInputException.invalid("storage.temperature", "20 furlongs", "expected a temperature")
                        .getMessage());
    }
}
