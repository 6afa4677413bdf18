import { PointerSensor, type PointerSensorOptions } from '@dnd-kit/core';
import type { PointerEvent } from 'react';

/**
 * The pointer sensor for mouse and pen only. Fingers go to the touch sensor, whose short press
 * delay lets a person scroll the sequence on a tablet without picking a step up by accident.
 */
export class MouseAndPenSensor extends PointerSensor {
  static override activators = [
    {
      eventName: 'onPointerDown' as const,
      handler: ({ nativeEvent: event }: PointerEvent, { onActivation }: PointerSensorOptions) => {
        if (event.pointerType === 'touch' || !event.isPrimary || event.button !== 0) return false;
        onActivation?.({ event });
        return true;
      },
    },
  ];
}
