import type { TiltReading } from '@/components/survey/clinometer/tilt-angle';

export type TiltState = {
  /** 'unsupported': no tilt sensor here (typing the angle is the way); 'needs-permission': iOS asks on a tap. */
  status: 'unsupported' | 'needs-permission' | 'idle' | 'reading' | 'denied';
  readings: TiltReading[];
  start: () => Promise<void>;
  stop: () => void;
};
