import { createContext } from 'react';

export type ToastTone = 'pass' | 'blocked' | 'info';
export type ToastMessage = { id: number; tone: ToastTone; text: string };
export type ToastApi = { show: (text: string, tone?: ToastTone) => void };

export const ToastContext = createContext<ToastApi | null>(null);
