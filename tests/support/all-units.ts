/**
 * Registers every unit table before each unit test file: calc/ tests parse and format any kind
 * directly. A calculator page registers only the kinds its code names; tests/build checks that.
 */
import "../../calc/core/all-units.ts";
