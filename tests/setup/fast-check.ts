/**
 * Property tests explore new random inputs on every local run. CI runs them with one fixed
 * seed so that a result can be reproduced; a failure found locally prints its own seed and
 * counterexample, which then belongs in a test of its own.
 */
import fc from 'fast-check';

if (process.env['CI']) fc.configureGlobal({ seed: 20261201 });
