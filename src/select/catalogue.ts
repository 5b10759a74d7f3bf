/**
 * Checks a pump catalogue given in code, and builds each pump's family of curves.
 *
 * @module
 */
import { HeadflowError } from '../errors';
import {
  guardArray,
  guardField,
  guardNumber,
  guardOneOf,
  guardRange,
  guardRecord,
  guardString,
} from '../guards';
import type { PumpCurve } from '../pumps/index';
import { type ImpellerFamily, impellerFamily } from './impeller';
import type { CatalogueDrive, CataloguePump } from './types';

/** A catalogue pump, checked, with its curves built. */
export interface CheckedPump {
  readonly input: CataloguePump;
  readonly name: string;
  readonly family: ImpellerFamily;
  /** The full impeller at the catalogue speed. */
  readonly reference: PumpCurve;
  /** Smallest impeller the catalogue allows (before the trim law's limit). */
  readonly minDiameter: number;
  readonly motorSpeeds: readonly number[];
  readonly drive: CatalogueDrive | undefined;
  readonly motorEfficiency: number;
  readonly price: number | undefined;
}

/** Most pumps a catalogue may hold. */
export const MAX_CATALOGUE_PUMPS = 100_000;

function positive(parameter: string, value: unknown, unit: string): number {
  return guardRange(parameter, value, { min: 0, minOpen: true, unit });
}

function fraction(parameter: string, value: unknown): number {
  return guardRange(parameter, value, { min: 0, minOpen: true, max: 1 });
}

/** Catalogue points: 3 to 1000 objects (their values are checked by `pumpCurve`). */
function checkPoints(parameter: string, value: unknown): void {
  guardArray(parameter, value, { min: 3, max: 1000 }).forEach((p, i) => {
    guardRecord(`${parameter}[${i}]`, p);
  });
}

/**
 * Checks a catalogue and builds every pump's curves.
 * @throws HeadflowError `INVALID_ARGUMENT` naming the field (`catalogue.pumps[3].drive.maxSpeed`)
 *   for a wrong shape or value, a duplicate name, or a pump without a motor efficiency; what
 *   `pumpCurve` throws for bad points, with the pump's path in front.
 */
export function checkCatalogue(catalogue: unknown, at = 'catalogue'): readonly CheckedPump[] {
  const c = guardRecord(at, catalogue);
  const pumps = guardArray(`${at}.pumps`, guardField(at, c, 'pumps'), {
    min: 1,
    max: MAX_CATALOGUE_PUMPS,
  });
  if (c['name'] !== undefined) guardString(`${at}.name`, c['name']);
  if (c['currency'] !== undefined) guardString(`${at}.currency`, c['currency']);
  const defaultMotor =
    c['motorEfficiency'] === undefined
      ? undefined
      : fraction(`${at}.motorEfficiency`, c['motorEfficiency']);
  const names = new Set<string>();
  return pumps.map((raw, i) => {
    const where = `${at}.pumps[${i}]`;
    const p = guardRecord(where, raw);
    const name = guardString(`${where}.name`, guardField(where, p, 'name'));
    if (name.trim() === '' || names.has(name)) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `${where}.name = ${JSON.stringify(name)} is not allowed (allowed: a non-empty name no other pump has).`,
        { parameter: `${where}.name`, value: name, allowed: 'a non-empty name no other pump has' },
      );
    }
    names.add(name);
    const speed = positive(`${where}.speed`, guardField(where, p, 'speed'), 'rad/s');
    const full = positive(
      `${where}.impellerDiameter`,
      guardField(where, p, 'impellerDiameter'),
      'm',
    );
    checkPoints(`${where}.points`, guardField(where, p, 'points'));
    const curves =
      p['curves'] === undefined ? [] : guardArray(`${where}.curves`, p['curves'], { max: 100 });
    curves.forEach((k, j) => {
      const r = guardRecord(`${where}.curves[${j}]`, k);
      positive(
        `${where}.curves[${j}].impellerDiameter`,
        guardField(`${where}.curves[${j}]`, r, 'impellerDiameter'),
        'm',
      );
      checkPoints(`${where}.curves[${j}].points`, guardField(`${where}.curves[${j}]`, r, 'points'));
    });
    const family = impellerFamily(p as unknown as CataloguePump, where);
    const smallestCurve = family.members[0]?.diameter ?? full;
    const minDiameter =
      p['minImpellerDiameter'] === undefined
        ? smallestCurve
        : guardRange(`${where}.minImpellerDiameter`, p['minImpellerDiameter'], {
            min: 0,
            minOpen: true,
            max: full,
            unit: 'm',
          });
    const motorSpeeds =
      p['motorSpeeds'] === undefined
        ? [speed]
        : guardArray(`${where}.motorSpeeds`, p['motorSpeeds'], { min: 1, max: 20 }).map((s, j) =>
            positive(`${where}.motorSpeeds[${j}]`, s, 'rad/s'),
          );
    let drive: CatalogueDrive | undefined;
    if (p['drive'] !== undefined) {
      const d = guardRecord(`${where}.drive`, p['drive']);
      const minSpeed = positive(
        `${where}.drive.minSpeed`,
        guardField(`${where}.drive`, d, 'minSpeed'),
        'rad/s',
      );
      const maxSpeed = guardRange(
        `${where}.drive.maxSpeed`,
        guardField(`${where}.drive`, d, 'maxSpeed'),
        { min: minSpeed, minOpen: true, unit: 'rad/s' },
      );
      if (d['efficiency'] !== undefined) fraction(`${where}.drive.efficiency`, d['efficiency']);
      if (d['price'] !== undefined) {
        guardRange(`${where}.drive.price`, d['price'], { min: 0 });
      }
      drive = { ...(d as unknown as CatalogueDrive), minSpeed, maxSpeed } as CatalogueDrive;
    }
    const ownMotor =
      p['motorEfficiency'] === undefined
        ? undefined
        : fraction(`${where}.motorEfficiency`, p['motorEfficiency']);
    const motorEfficiency = ownMotor ?? defaultMotor;
    if (motorEfficiency === undefined) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `${where}.motorEfficiency is missing, and the catalogue gives no motorEfficiency for all its pumps.`,
        { parameter: `${where}.motorEfficiency`, allowed: 'a fraction in (0, 1]' },
      );
    }
    if (p['motorSeries'] !== undefined) {
      guardOneOf(`${where}.motorSeries`, p['motorSeries'], ['iec', 'nema'] as const);
    }
    const price =
      p['price'] === undefined
        ? undefined
        : guardRange(`${where}.price`, guardNumber(`${where}.price`, p['price']), { min: 0 });
    const reference = family.members[family.members.length - 1]?.curve as PumpCurve;
    if (!reference.hasEfficiency) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `${where}.points have no efficiency: a selection needs efficiency at the catalogue points.`,
        { parameter: `${where}.points`, allowed: 'points with efficiency' },
      );
    }
    return {
      input: p as unknown as CataloguePump,
      name,
      family,
      reference,
      minDiameter,
      motorSpeeds,
      drive,
      motorEfficiency,
      price,
    };
  });
}
