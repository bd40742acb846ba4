// The seven steps of the profile wizard, in order, with the words the screen shows.
import { WIZARD_STEPS, type WizardStep } from '@/db/requests/stations';

export const STEP_TITLES: Record<WizardStep, string> = {
  identity: 'Identity',
  dos: 'DOS version',
  ports: 'Ports',
  network: 'Network',
  files: 'Startup files',
  final: 'Final program',
  preview: 'Preview',
};

export const STEP_HINTS: Record<WizardStep, string> = {
  identity: 'The station’s name and number on the network, where it stands, and the kit it gets.',
  dos: 'Which DOS the PC runs decides the commands the plan may write.',
  ports: 'Which serial and parallel ports the PC has, and what is plugged into each.',
  network: 'Where the network adapter sits and how its port is set up.',
  files: 'The PC’s AUTOEXEC.BAT and CONFIG.SYS as they are now.',
  final: 'The program the PC stays in after boot; the network lines must go above it.',
  preview: 'The plan as it stands: checks, boot order and the exact changes. Nothing is sent yet.',
};

export const stepIndex = (s: WizardStep) => WIZARD_STEPS.indexOf(s);
export const nextStep = (s: WizardStep): WizardStep => WIZARD_STEPS[Math.min(stepIndex(s) + 1, WIZARD_STEPS.length - 1)];
export const prevStep = (s: WizardStep): WizardStep => WIZARD_STEPS[Math.max(stepIndex(s) - 1, 0)];
export { WIZARD_STEPS };
