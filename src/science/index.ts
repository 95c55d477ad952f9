// The science core's public face: re-exports grow as modules land.
export {};
