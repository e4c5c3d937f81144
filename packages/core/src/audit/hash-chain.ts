/** The audit log's hash chain: pure functions, no framework (issue #8). */
export {};
