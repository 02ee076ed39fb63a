// Package root: the engine, the calc-file loader and the drawing model, for the API, the web app and
// anyone who wants the net-section rules without the command line.
export * from './engine/index.js';
export * from './calc/index.js';
export * from './draw/index.js';
