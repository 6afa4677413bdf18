import { act, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';

import { resetAlarmSoundForTests } from '../utils/alarm-sound';
import { aRun, CURE_STEP_ID } from '../testing/run-fixtures';
import { renderBench } from '../testing/render-bench';
import { TimerCard } from './timer-card';
import { TimerTray } from './timer-tray';

const DEVICE_NOW = new Date('2026-12-02T10:00:00.000Z');
const timerView = (overrides: Partial<ReturnType<typeof aRun>['timers'][number]> = {}) => ({
  id: 21,
  stepId: CURE_STEP_ID,
  label: 'Cure the silver heater trace',
  plannedSeconds: 600,
  startedAt: '2026-12-02T10:00:00.000Z',
  stoppedAt: null,
  startedOnDeviceClock: false,
  startedBy: { id: 1, name: 'Robin Vale' },
  ...overrides,
});

class FakeAudioContext {
  static beeps = 0;
  state = 'running';
  currentTime = 0;
  destination = {};
  resume = async () => undefined;
  createGain = () => ({ gain: { setValueAtTime: () => undefined, exponentialRampToValueAtTime: () => undefined }, connect: (node: unknown) => node });
  createOscillator = () => ({ type: 'sine', frequency: { value: 0 }, connect: (node: unknown) => node, start: () => (FakeAudioContext.beeps += 1), stop: () => undefined });
}

beforeEach(() => {
  vi.useFakeTimers({ now: DEVICE_NOW });
  localStorage.clear();
  resetAlarmSoundForTests();
  FakeAudioContext.beeps = 0;
  vi.stubGlobal('AudioContext', FakeAudioContext);
  Object.defineProperty(navigator, 'vibrate', { configurable: true, value: vi.fn(() => true) });
});

afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
  Reflect.deleteProperty(navigator, 'vibrate');
});

describe('timer card', () => {
  it('when the tablet clock runs 30 s behind the server, then the time left counts from the stored start on the server clock', () => {
    const run = aRun({ timers: [timerView()] });
    const step = run.content.steps[0]!;
    renderBench(<TimerCard timer={{ ...run.timers[0]!, localRef: null, alarmKey: 'srv:21', isPending: false }} step={step} />, { run, clockOffsetMs: 30_000 });

    // Server time is 10:00:30: 30 s of the 10 min have gone.
    expect(screen.getByText('9:30')).toBeInTheDocument();
    act(() => vi.advanceTimersByTime(60_000));
    expect(screen.getByText('8:30')).toBeInTheDocument();
    expect(screen.getByText('Running')).toBeInTheDocument();
  });

  it('when a timer was started offline on this tablet, then it is read on the tablet clock, not shifted by the offset', () => {
    const run = aRun({ timers: [timerView({ startedOnDeviceClock: true, startedAt: '2026-12-02T09:59:00.000Z' })] });
    renderBench(<TimerCard timer={{ ...run.timers[0]!, localRef: null, alarmKey: 'srv:21', isPending: false }} step={run.content.steps[0]!} />, { run, clockOffsetMs: 30_000 });

    expect(screen.getByText('9:00')).toBeInTheDocument();
  });
});

describe('timer alarm', () => {
  it('when a timer reaches zero, then it beeps, buzzes, turns amber and is announced, again each minute until acknowledged', () => {
    const run = aRun({ timers: [timerView({ startedAt: '2026-12-02T09:59:57.000Z', plannedSeconds: 5 })] });
    const { container } = renderBench(<TimerTray steps={run.content.steps} currentStepId={null} />, { run });
    const tray = screen.getByRole('region', { name: 'Running timers' });
    expect(within(tray).getByText('Running')).toBeInTheDocument();
    expect(navigator.vibrate).not.toHaveBeenCalled();

    act(() => vi.advanceTimersByTime(3_000));
    expect(within(tray).getByText('Time is up')).toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent('Time is up: Cure the silver heater trace. Acknowledge the alarm on the timer.');
    expect(navigator.vibrate).toHaveBeenCalledTimes(1);
    expect(FakeAudioContext.beeps).toBe(2);
    expect(container.querySelector('li')).toHaveClass('border-amber-700');

    act(() => vi.advanceTimersByTime(60_000));
    expect(navigator.vibrate).toHaveBeenCalledTimes(2);
    expect(screen.getByRole('alert')).toHaveTextContent('1 min over');

    fireEvent.click(within(tray).getByRole('button', { name: 'Acknowledge alarm: Cure the silver heater trace' }));
    act(() => vi.advanceTimersByTime(120_000));
    expect(navigator.vibrate).toHaveBeenCalledTimes(2);
    expect(within(tray).queryByRole('button', { name: /Acknowledge alarm/ })).not.toBeInTheDocument();
    expect(within(tray).getByText('Time is up')).toBeInTheDocument();
  });
});

describe('stopping a timer', () => {
  it('when the timer is stopped before the step’s shortest time, then a reason is asked and sent with the stop', () => {
    // Started 10 min ago on a 30–40 min cure: stopping now is early.
    const run = aRun({ timers: [timerView({ startedAt: '2026-12-02T09:50:00.000Z', plannedSeconds: 1800 })] });
    const { bench } = renderBench(<TimerCard timer={{ ...run.timers[0]!, localRef: null, alarmKey: 'srv:21', isPending: false }} step={run.content.steps[0]!} />, { run });

    fireEvent.click(screen.getByRole('button', { name: 'Stop timer' }));
    const dialog = screen.getByRole('dialog', { name: 'Why stop now?' });
    expect(dialog).toHaveTextContent('Stopping before the shortest time of 30 min raises a deviation.');
    fireEvent.change(within(dialog).getByLabelText('Reason'), { target: { value: 'Oven tripped its breaker' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Stop timer' }));

    expect(bench.record).toHaveBeenCalledWith(expect.objectContaining({ kind: 'stop-timer', path: '/api/runs/7/timers/21/stop', body: { reason: 'Oven tripped its breaker' } }));
  });
});
