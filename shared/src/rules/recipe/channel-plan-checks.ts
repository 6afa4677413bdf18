import { checkMaker, stepLabel } from './check-helpers';
import type { ProcessCheck } from './process-check';
import type { RecipeContext } from './recipe-context';

const make = checkMaker('channel-plan');

// Channel names compare without case: a printer's channel names are unique that way.
const keyOf = (channel: string) => channel.trim().toLowerCase();

/**
 * The version's channel plan against the printer and the print passes: each plan channel exists
 * on the printer and carries one ink; each print pass prints the ink its channel carries.
 *
 * @example
 * // plan: C1 → silver; a pass prints silver on C1, another prints the dielectric on C2 (not planned)
 * channelPlanChecks(ctx)
 * // → [{ id: 'channel-plan:print-1', status: 'pass', … }, { id: 'channel-plan:print-2', status: 'blocked', title: 'Channel C2 not in the plan', … }]
 */
export function channelPlanChecks(ctx: RecipeContext): ProcessCheck[] {
  const out: ProcessCheck[] = [];
  const inkName = (id: number) => ctx.inkById.get(id)?.name ?? `ink #${id}`;
  const printerChannels = ctx.printer ? new Set(ctx.printer.channels.map((c) => keyOf(c.name))) : null;
  const channelList = ctx.printer ? ctx.printer.channels.map((c) => c.name).join(', ') : '';
  const lacks = (channel: string) => printerChannels !== null && !printerChannels.has(keyOf(channel));

  const planned = new Map<string, { channel: string; inkIds: Set<number> }>();
  for (const entry of ctx.setup.channelPlan) {
    const slot = planned.get(keyOf(entry.channel)) ?? { channel: entry.channel, inkIds: new Set<number>() };
    slot.inkIds.add(entry.inkId);
    planned.set(keyOf(entry.channel), slot);
  }
  for (const [key, { channel, inkIds }] of planned) {
    if (inkIds.size > 1) {
      const names = [...inkIds].map(inkName).join(' and ');
      out.push(make({ id: `channel-plan:${key}:two-inks`, stepId: null, status: 'blocked', title: `Channel ${channel} carries two inks`, numbers: `${channel}: ${names}`, why: `A channel holds one cartridge, so one ink: give ${names} a channel each.` }));
    }
    if (lacks(channel)) {
      out.push(make({ id: `channel-plan:${key}:unknown`, stepId: null, status: 'blocked', title: `Printer has no channel ${channel}`, numbers: `${ctx.printer?.name} channels: ${channelList}`, why: `The plan loads channel ${channel}, which ${ctx.printer?.name} does not have; use one of ${channelList}.` }));
    }
  }

  ctx.steps.forEach((step, i) => {
    if (step.kind !== 'print-pass') return;
    const { channel, inkId } = step.params;
    const base = { id: `channel-plan:${step.id}`, stepId: step.id };
    const numbers = `${channel}: ${inkName(inkId)}`;
    const slot = planned.get(keyOf(channel));
    if (lacks(channel)) {
      out.push(make({ ...base, status: 'blocked', title: `Printer has no channel ${channel}`, numbers: `${ctx.printer?.name} channels: ${channelList}`, why: `${stepLabel(i, step)} prints on channel ${channel}, which ${ctx.printer?.name} does not have; use one of ${channelList}.` }));
    } else if (!slot) {
      out.push(make({ ...base, status: 'blocked', title: `Channel ${channel} not in the plan`, numbers, why: `Add channel ${channel} with ${inkName(inkId)} to the channel plan, so the operator loads the right cartridge.` }));
    } else if (!slot.inkIds.has(inkId)) {
      const loaded = [...slot.inkIds].map(inkName).join(' and ');
      out.push(make({ ...base, status: 'blocked', title: `Wrong ink on channel ${channel}`, numbers: `${channel} carries ${loaded}; this pass prints ${inkName(inkId)}`, why: `The plan loads ${loaded} on channel ${channel}, so this pass would print the wrong ink; change the channel or the plan.` }));
    } else {
      out.push(make({ ...base, status: 'pass', title: `Channel ${channel} carries ${inkName(inkId)}`, numbers, why: `The channel plan loads ${inkName(inkId)} on channel ${channel}, as this pass needs.` }));
    }
  });
  return out;
}
