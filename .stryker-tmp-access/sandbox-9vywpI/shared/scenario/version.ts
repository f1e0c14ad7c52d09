/** Version of the scenario engine, stored with every run so results can be traced to the rules that made them. Bump on any change of results. */
// @ts-nocheck

export const ENGINE_VERSION = 'scenario-engine 2.0.0';
