/** Version of the engine; equal to the `ligament` package version (a test keeps them in step). */
export const ENGINE_VERSION = '0.1.0';
