/** The audit log as readers see it: entries, filters, and the hash chain's verification (issue #8). */
export {};
