// Report definitions: see ../README.md.
export {};
