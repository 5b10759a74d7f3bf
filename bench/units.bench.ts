import { parseQuantity, q, to } from '../src/units';
import { type BenchSuite, draw } from './harness';

const N = 1000;
const values = draw(N, 1, (u) => u() * 1000);
const texts = Array.from(values, (v) => `${v.toFixed(3)} gal/min`);

export const suites: readonly BenchSuite[] = [
  {
    title: 'units: conversion cost against a bare multiplication',
    baseline: 'bare multiply',
    callsPerRun: N,
    cases: [
      {
        name: 'bare multiply',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += (values[i] ?? 0) * 6.30901964e-5;
          return s;
        },
      },
      {
        name: "q(x, 'gal/min')",
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += q(values[i] ?? 0, 'gal/min');
          return s;
        },
      },
      {
        name: "to(x, 'gal/min')",
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += to(q(values[i] ?? 0, 'm3/s'), 'gal/min');
          return s;
        },
      },
      {
        name: 'parseQuantity(text)',
        run: () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += parseQuantity(texts[i] ?? '', 'flow');
          return s;
        },
      },
    ],
  },
];
