/**
 * The channels of each cockpit control, in the pilot's sense: positive pitch control gives a
 * nose-up pitch rate, positive roll control a right roll, positive yaw control a nose-right
 * yaw rate (common practice). The model's sense is read from the first nonzero Markov
 * parameter of the control's rate response (q, p or r: the initial angular acceleration, the
 * first thing the pilot feels); where it is negative the input is reversed, and the notes say so.
 */
import type { CockpitControl, ControlAxis, FlightCondition } from '../types.js';
import { linearChannel, type LinearChannel } from './linear-channel.js';
import { outputRow, type OutputRow } from './output-rows.js';
import { channelTransfer, type BlockSpectra, type ChannelTransfer } from './transfer-function.js';
import type { Complex } from '../types.js';

/** The outputs of each control, its primary rate first. */
export const CONTROL_OUTPUTS: Readonly<Record<ControlAxis, readonly string[]>> = {
  pitch: ['q', 'theta', 'alpha', 'nz'],
  roll: ['p', 'phi', 'beta'],
  yaw: ['r', 'beta', 'p'],
};

const SENSE: Readonly<Record<ControlAxis, string>> = {
  pitch: 'nose-up pitch acceleration',
  roll: 'right roll acceleration',
  yaw: 'nose-right yaw acceleration',
};

export interface ControlChannel {
  output: OutputRow;
  channel: LinearChannel;
  transfer: ChannelTransfer;
}

export interface ControlChannels {
  axis: ControlAxis;
  control: CockpitControl;
  /** +1 or -1: the model's input times this is the pilot's input */
  sign: 1 | -1;
  /** input column in the pilot's sense */
  b: number[];
  channels: ControlChannel[];
  notes: string[];
}

export function controlChannels(condition: FlightCondition, axis: ControlAxis, control: CockpitControl, poles: readonly Complex[], spectra: BlockSpectra = new Map()): ControlChannels {
  const { system, airspeed } = condition;
  const j = system.inputs.indexOf(control.input);
  const column = system.B.map((row) => row[j]!);
  const notes: string[] = [];
  const rows: OutputRow[] = [];
  for (const name of CONTROL_OUTPUTS[axis]) {
    const row = outputRow(system, name, airspeed);
    if ('reason' in row) notes.push(`${axis} control: no ${name} response (${row.reason})`);
    else {
      rows.push(row);
      if (row.how) notes.push(`${axis} control: ${row.how}`);
    }
  }
  const channels = rows.map((row): ControlChannel => {
    const channel = linearChannel(system.A, column, row.c, row.d[j]!);
    return { output: row, channel, transfer: channelTransfer(channel, poles, spectra) };
  });
  let sign: 1 | -1 = 1;
  const primary = channels.find((c) => c.output.name === CONTROL_OUTPUTS[axis][0]);
  if (primary && primary.transfer.full.gain < 0) {
    sign = -1;
    // reversing the input changes the sign of b, d and the gain; zeros and poles stay
    for (const { channel, transfer } of channels) {
      for (let i = 0; i < channel.n; i += 1) channel.b[i] = -channel.b[i]!;
      channel.d = -channel.d;
      transfer.full.gain = -transfer.full.gain;
      if (transfer.reduced !== transfer.full) transfer.reduced.gain = -transfer.reduced.gain;
    }
    notes.push(`${axis} control ${control.input}: a positive input of the model gives a negative first Markov parameter of ${primary.output.name} (not a ${SENSE[axis]}); the responses are given for the reversed input, the pilot's sense`);
  } else if (!primary) {
    notes.push(`${axis} control ${control.input}: no ${CONTROL_OUTPUTS[axis][0]} response to read the pilot's sense from; the model's sign is kept`);
  }
  return { axis, control, sign, b: column.map((b) => sign * b), channels, notes };
}
