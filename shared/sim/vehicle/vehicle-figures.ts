import type { AxleFigures, SeatFigures, VehicleFigures } from '../../schemas/vehicle-run.ts';
import type { SeatPosition } from '../../schemas/vehicle-setup.ts';
import { computeMetrics, firstSample } from '../metrics/compute-metrics.ts';
import { pointVibrationTotal, weFilter } from '../metrics/iso2631-rotational.ts';
import { comfortGrading, rmsAndVdv, wkFilter } from '../metrics/iso2631.ts';
import { summary } from '../metrics/stats.ts';
import type { TraceColumns } from '../trace.ts';
import type { VehicleTrace } from './integrate-vehicle.ts';
import type { VehicleStatics } from './vehicle-model.ts';

/**
 * Time-domain figures of one vehicle run: body heave and pitch acceleration, the vertical
 * acceleration at each seat (heave + x·pitch, x ahead of the CG) weighted by Wk, pitch weighted
 * by We, their point vibration total value with the seated axis factors (ISO 2631-1), and per
 * axle the corner figures of tyre load, lift-off and travel (metrics/compute-metrics.ts on the
 * axle's columns: one corner of the axle).
 */
export function vehicleFigures(trace: VehicleTrace, statics: VehicleStatics, seats: readonly SeatPosition[], settleTime: number): VehicleFigures {
  const { dt } = trace;
  const from = firstSample(trace.front, settleTime);
  const n = trace.heaveAccel.length;
  const heave = summary(trace.heaveAccel, from);
  const pitch = summary(trace.pitchAccel, from);
  const pitchWe = rmsAndVdv(weFilter(trace.pitchAccel, dt), dt, from).rms;
  const seatAccel = new Float64Array(n);
  const weighted = new Float64Array(n);
  const seatFigures: SeatFigures[] = seats.map((seat) => {
    const ahead = statics.geometry.a - seat.behindFrontAxle;
    for (let i = 0; i < n; i++) seatAccel[i] = trace.heaveAccel[i] + ahead * trace.pitchAccel[i];
    const raw = summary(seatAccel, from);
    const w = rmsAndVdv(wkFilter(seatAccel, dt, weighted), dt, from);
    const total = pointVibrationTotal(w.rms, pitchWe);
    return {
      name: seat.name,
      behindFrontAxle: seat.behindFrontAxle,
      accelRms: raw.rms,
      accelPeak: raw.peak,
      verticalWkRms: w.rms,
      verticalVdv: w.vdv,
      pointTotal: total,
      comfort: comfortGrading(total),
    };
  });
  return {
    analysedTime: (n - from) * dt,
    heaveAccelRms: heave.rms,
    heaveAccelPeak: heave.peak,
    pitchAccelRms: pitch.rms,
    pitchAccelPeak: pitch.peak,
    pitchWeRms: pitchWe,
    seats: seatFigures,
    front: axleFigures(trace.front, statics.front.tyreLoad, statics.frontSetup.stroke, settleTime),
    rear: axleFigures(trace.rear, statics.rear.tyreLoad, statics.rearSetup.stroke, settleTime),
  };
}

function axleFigures(trace: TraceColumns, staticTyreLoad: number, stroke: { compression: number; extension: number } | undefined, settleTime: number): AxleFigures {
  const m = computeMetrics(trace, { settleTime, staticTyreLoad, stroke });
  return {
    tyreLoadStatic: m.tyreLoadStatic,
    tyreLoadRms: m.tyreLoadRms,
    tyreLoadRatio: m.tyreLoadRatio,
    tyreLoadMin: m.tyreLoadMin,
    liftOffFraction: m.liftOffFraction,
    travelRms: m.travelRms,
    travelMaxCompression: m.travelMaxCompression,
    travelMaxExtension: m.travelMaxExtension,
    bumpStopTime: m.bumpStopTime,
    reboundStopTime: m.reboundStopTime,
    ...(m.strokeUsedCompression !== undefined ? { strokeUsedCompression: m.strokeUsedCompression, strokeUsedExtension: m.strokeUsedExtension } : {}),
  };
}
