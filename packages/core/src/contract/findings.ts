/** Audit findings and the responses to them (issue #8). */
export {};
