/**
 * The checks made before breaking into a circuit, worked out from a point change as recorded, its circuit and its
 * site. The phone shows them as the Points form is filled in; the server adds them to what the office reads.
 */
import { InvalidInputError, roundTo, worstVerdict, type CheckResult, type Verdict } from '../check.js';
import { adiabaticCpc } from '../electrical/adiabatic-cpc.js';
import { sizeCable } from '../electrical/cable-sizing.js';
import { r1r2ForRun } from '../electrical/conductor-resistance.js';
import { predictZs, type PredictedZs } from '../electrical/predicted-zs.js';
import { POINT_LOCATIONS, RCD_CIRCUIT_KINDS, rcdRequired, type RcdRequirement } from '../electrical/rcd-required.js';
import { extendRing } from '../electrical/ring-final-circuit.js';
import { checkSpurs } from '../electrical/ring-spurs.js';
import type { ProtectiveDevice, RuleSet } from '../rules/rule-set.js';
import { BREAKER_INSTANT_TRIP, INSTALLATION_METHODS, RING_DESIGN_CURRENT_A, SOCKET_OUTLET_RATING_A } from '../rules/uk-bs7671-before-work.js';
import { DEFAULT_RULE_SET } from '../rules/uk-bs7671-2018-a2-2022.js';
import { PROTECTIVE_DEVICES } from '../sync/entities.js';
import type { LooseRowOf } from './circuit-records.js';

export type BeforeWorkKey = 'predicted-zs' | 'rcd' | 'spurs' | 'cable' | 'cpc';

export interface BeforeWorkLine {
  readonly key: BeforeWorkKey;
  readonly label: string;
  /** The headline figure, such as "Predicted Zs 0.82 Ω"; null while the inputs are incomplete. */
  readonly figure: string | null;
  readonly result: CheckResult;
}

export interface ChecksBeforeWork {
  readonly verdict: Verdict;
  readonly lines: readonly BeforeWorkLine[];
}

export interface BeforeWorkRecords {
  readonly point: LooseRowOf<'pointChange'>;
  readonly circuit?: LooseRowOf<'circuit'> | null;
  readonly site?: LooseRowOf<'site'> | null;
}

const num = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
const oneOf = <T extends string>(values: readonly T[], v: unknown): T | null => values.find((x) => x === v) ?? null;
const ohms = (v: number) => `${roundTo(v, 2).toFixed(2)} Ω`;

function waiting(note: string, source: string, unit: string): CheckResult {
  return { verdict: 'check', value: null, limit: null, unit, source, note };
}

function guarded(run: () => BeforeWorkLine, key: BeforeWorkKey, label: string, source: string, unit: string): BeforeWorkLine {
  try {
    return run();
  } catch (err) {
    if (err instanceof InvalidInputError) return { key, label, figure: null, result: waiting(`Cannot work this out: ${err.message}.`, source, unit) };
    throw err;
  }
}

interface ConcealedRouteFacts {
  readonly depthMm: number | null;
  readonly hasMetallicParts: boolean;
}

function routeFacts(value: unknown): ConcealedRouteFacts | null {
  if (typeof value !== 'object' || value === null) return null;
  const route = value as { depthMm?: unknown; wall?: { hasMetallicParts?: unknown } };
  return { depthMm: num(route.depthMm), hasMetallicParts: route.wall?.hasMetallicParts === true };
}

/** R1+R2 at the new point, taken cold, or why it cannot be worked out yet. */
function r1r2AtPoint(point: LooseRowOf<'pointChange'>, live: number | null, cpc: number | null, rules: RuleSet): { ohm: number; how: string } | string {
  const added = num(point.addedRouteM);
  if (point.connection === 'ring-extension') {
    const [r1, rn, r2] = [num(point.beforeR1Ohm), num(point.beforeRnOhm), num(point.beforeR2Ohm)];
    if (r1 === null || rn === null || r2 === null) return 'Enter the ring’s end-to-end r1, rn and r2 from before it was broken into.';
    if (live === null || cpc === null || added === null) return 'Enter the cable sizes and the length added to the ring.';
    const ext = extendRing({ r1, rn, r2, liveCsaMm2: live, cpcCsaMm2: cpc, addedRouteM: added }, rules);
    return { ohm: ext.expectedR1R2, how: `(r1 + r2) / 4 after the extension, ${ohms(ext.expectedR1R2)}` };
  }
  if (point.connection === 'unfused-spur' || point.connection === 'fused-spur' || point.connection === 'radial') {
    const join = num(point.joinR1R2Ohm);
    if (join === null) return 'Enter the R1+R2 measured where the new cable joins (0 at the board for a new circuit).';
    if (live === null || cpc === null || added === null) return 'Enter the cable sizes and the length of the new cable.';
    const run = r1r2ForRun({ liveCsaMm2: live, cpcCsaMm2: cpc, lengthM: added }, rules);
    return { ohm: join + run, how: `${ohms(join)} where it joins plus ${ohms(run)} for ${added} m of ${live}/${cpc} mm²` };
  }
  return 'Say how the point joins the circuit to predict its Zs.';
}

/** Every check before the work that the records allow; a line waits (verdict `check`) for what is still missing. */
export function checksBeforeWork({ point, circuit, site }: BeforeWorkRecords, rules: RuleSet = DEFAULT_RULE_SET): ChecksBeforeWork {
  const lines: BeforeWorkLine[] = [];
  const live = num(point.liveCsaMm2) ?? num(circuit?.liveCsaMm2);
  const cpc = num(point.cpcCsaMm2) ?? num(circuit?.cpcCsaMm2);
  const device = oneOf<ProtectiveDevice>(PROTECTIVE_DEVICES, circuit?.deviceType);
  const ratingA = num(circuit?.deviceRatingA);
  const rcdMa = num(circuit?.rcdRatingMa);
  const tt = site?.earthing === 'TT';
  const ze = num(site?.zeOhm);
  const zsSource = `${rules.earthFaultLoop.circuitBreakers.B.source}; ${rules.conductors.temperatureCoefficient.source}`;

  let predicted: PredictedZs | null = null;
  lines.push(
    guarded(
      () => {
        const at = r1r2AtPoint(point, live, cpc, rules);
        if (typeof at === 'string') return { key: 'predicted-zs', label: 'Predicted Zs at the new point', figure: null, result: waiting(at, zsSource, 'Ω') };
        if (ze === null) return { key: 'predicted-zs', label: 'Predicted Zs at the new point', figure: null, result: waiting('Record the site’s Ze to predict Zs at the new point.', zsSource, 'Ω') };
        if (device === null || ratingA === null) {
          return { key: 'predicted-zs', label: 'Predicted Zs at the new point', figure: null, result: waiting('Record the circuit’s protective device and rating to judge the predicted Zs.', zsSource, 'Ω') };
        }
        predicted = predictZs({ zeOhm: ze, r1r2Ohm: at.ohm, device, ratingA, rcdRatedMa: tt ? rcdMa : null }, rules);
        const result = { ...predicted, note: `${predicted.note} R1+R2 at the point: ${at.how}.` };
        return { key: 'predicted-zs', label: 'Predicted Zs at the new point', figure: `Predicted Zs ${ohms(predicted.zsOhm)}`, result };
      },
      'predicted-zs',
      'Predicted Zs at the new point',
      zsSource,
      'Ω',
    ),
  );

  const rcdSource = rules.beforeWork.rcdRequirements;
  lines.push(
    guarded(
      () => {
        const supplies = oneOf(RCD_CIRCUIT_KINDS, point.supplies);
        const label = 'RCD protection';
        if (supplies === null) return { key: 'rcd', label, figure: null, result: waiting('Say what the point supplies to see whether it needs RCD protection.', rcdSource.sockets.source, 'mA') };
        const route = routeFacts(point.concealedRoute);
        const r: RcdRequirement = rcdRequired(
          {
            circuitKind: supplies,
            socketRatingA: supplies === 'sockets' ? SOCKET_OUTLET_RATING_A.value : null,
            location: oneOf(POINT_LOCATIONS, point.location) ?? 'indoors',
            concealedDepthMm: route?.depthMm ?? null,
            wallHasMetalParts: route?.hasMetallicParts ?? false,
            // Unsaid counts as a dwelling, the stricter reading: luminaires there need 30 mA.
            dwelling: point.dwelling !== false,
            hasRcdMa: circuit ? (rcdMa ?? 0) : null,
          },
          rules,
        );
        const figure = r.required ? (r.verdict === 'fail' ? '30 mA RCD required: the circuit has none' : r.verdict === 'pass' ? '30 mA RCD required: the circuit has one' : '30 mA RCD required') : 'No 30 mA RCD called for';
        const extra = [r.afdd.level !== 'not-applicable' ? r.afdd.note : '', r.spd.note].filter(Boolean).join(' ');
        return { key: 'rcd', label, figure, result: { ...r, note: `${r.note} ${extra}`, source: `${r.source}; ${r.afdd.source}; ${r.spd.source}` } };
      },
      'rcd',
      'RCD protection',
      rcdSource.sockets.source,
      'mA',
    ),
  );

  if (point.connection === 'unfused-spur') {
    const spurSource = rules.beforeWork.spurs.spursNotMoreThanPoints;
    lines.push(
      guarded(
        () => {
          const label = 'Unfused spur';
          const points = num(point.ringPoints);
          const spurs = num(point.ringUnfusedSpurs);
          if (points === null || spurs === null) return { key: 'spurs', label, figure: null, result: waiting('Count the points on the ring and its unfused spurs, this one included.', spurSource, 'spurs') };
          const r = checkSpurs({ socketsAndFcusOnRing: points, unfusedSpurs: spurs, spurFeeds: [num(point.spurFeeds) ?? 1], spurFromSpur: point.spurFromSpur === true }, rules);
          return { key: 'spurs', label, figure: `${spurs} unfused spur${spurs === 1 ? '' : 's'} on ${points} point${points === 1 ? '' : 's'}`, result: r };
        },
        'spurs',
        'Unfused spur',
        spurSource,
        'spurs',
      ),
    );
  }

  const method = oneOf(INSTALLATION_METHODS, point.installationMethod);
  const added = num(point.addedRouteM);
  const capacitySource = rules.beforeWork.cableCapacity.source;
  if (method !== null || point.designCurrentA != null) {
    lines.push(
      guarded(
        () => {
          const label = 'New cable';
          if (method === null) return { key: 'cable', label, figure: null, result: waiting('Pick how the new cable is installed.', capacitySource, 'A') };
          if (live === null || added === null) return { key: 'cable', label, figure: null, result: waiting('Enter the live size and the length of the new cable.', capacitySource, 'A') };
          const ringLike = point.connection === 'ring-extension' || point.connection === 'unfused-spur';
          const fused = point.connection === 'fused-spur';
          const cableDevice: ProtectiveDevice | null = fused ? 'BS 1362' : device;
          const cableRating = fused ? (num(point.fuseRatingA) ?? 13) : ratingA;
          if (cableDevice === null || cableRating === null) return { key: 'cable', label, figure: null, result: waiting('Record the circuit’s protective device and rating.', capacitySource, 'A') };
          const load = num(point.loadW);
          const ib = num(point.designCurrentA) ?? (load !== null ? load / rules.nominalVoltageV.value : ringLike ? RING_DESIGN_CURRENT_A.value : null);
          if (ib === null) return { key: 'cable', label, figure: null, result: waiting('Enter the design current of the new cable.', capacitySource, 'A') };
          // A ring extension's length is out and back: each leg carries half.
          const lengthM = point.connection === 'ring-extension' ? added / 2 : point.connection === 'radial' ? (num(circuit?.lengthM) ?? 0) + added : added;
          const r = sizeCable(
            {
              designCurrentA: ib,
              device: cableDevice,
              ratingA: cableRating,
              csaMm2: live,
              installationMethod: method,
              ca: num(point.ambientFactor) ?? 1,
              cg: num(point.groupingFactor) ?? 1,
              ci: num(point.insulationFactor) ?? 1,
              lengthM,
              use: point.supplies === 'lighting' ? 'lighting' : 'other',
              ring: ringLike,
            },
            rules,
          );
          return { key: 'cable', label, figure: `Iz ${roundTo(r.izA, 1)} A, voltage drop ${roundTo(r.voltageDrop.percent, 2).toFixed(2)} %`, result: r };
        },
        'cable',
        'New cable',
        capacitySource,
        'A',
      ),
    );
  }

  const pz = predicted as PredictedZs | null;
  if (method !== null && cpc !== null) {
    const cpcSource = rules.beforeWork.adiabaticSource;
    lines.push(
      guarded(
        () => {
          const label = 'Cpc for the fault';
          if (pz === null || device === null || ratingA === null) return { key: 'cpc', label, figure: null, result: waiting('The cpc is checked once the predicted Zs can be worked out.', cpcSource, 'mm²') };
          const faultA = rules.nominalVoltageV.value / pz.zsOhm;
          if (device !== 'B' && device !== 'C' && device !== 'D') {
            return { key: 'cpc', label, figure: `Fault current ${Math.round(faultA)} A`, result: waiting(`Read the ${device} fuse’s disconnection time at ${Math.round(faultA)} A from its curve to check the cpc.`, cpcSource, 'mm²') };
          }
          const instant = BREAKER_INSTANT_TRIP.multiples[device] * ratingA;
          if (faultA < instant) {
            return {
              key: 'cpc',
              label,
              figure: `Fault current ${Math.round(faultA)} A`,
              result: waiting(`${Math.round(faultA)} A is below the ${instant} A at which a type ${device} ${ratingA} A breaker trips at once: read its time from the curve.`, `${cpcSource}; ${BREAKER_INSTANT_TRIP.source}`, 'mm²'),
            };
          }
          const r = adiabaticCpc({ faultCurrentA: faultA, disconnectionS: BREAKER_INSTANT_TRIP.timeS, k: { arrangement: 'in-cable', insulation: '70C-thermoplastic' }, cpcCsaMm2: cpc }, rules);
          return {
            key: 'cpc',
            label,
            figure: `Minimum cpc ${roundTo(r.minimumMm2, 2)} mm² at ${Math.round(faultA)} A`,
            result: { ...r, source: `${r.source}; ${BREAKER_INSTANT_TRIP.source}` },
          };
        },
        'cpc',
        'Cpc for the fault',
        cpcSource,
        'mm²',
      ),
    );
  }

  return { verdict: worstVerdict(lines.map((l) => l.result.verdict)), lines };
}
