// The invented demo scenario: one installer company's accounts, one client office (an architecture
// practice) with ten PCs on DOS 3.30 to 6.22, two printers and a shared modem, and the invented kit.
// Passwords are for the demo only.
import type { NumberRanges } from '@/db/sites';

export const DEMO_PASSWORD = 'bootwright-demo-2026';

export const DEMO_ACCOUNTS = [
  { email: 'admin@bootwright.test', name: 'Rosa Quintero', role: 'admin' },
  { email: 'lead@bootwright.test', name: 'Malik Osei', role: 'lead' },
  { email: 'lead2@bootwright.test', name: 'Ines Halloran', role: 'lead' },
  { email: 'tech@bootwright.test', name: 'Tess Varga', role: 'technician' },
  { email: 'tech2@bootwright.test', name: 'Dario Kell', role: 'technician' },
  { email: 'user@bootwright.test', name: 'Priya Nair', role: 'user' },
] as const;

export const DEMO_RANGES: NumberRanges = { pc: [1, 99], printer: [100, 149], modem: [150, 199], other: [200, 254] };

export const DEMO_SITE = {
  name: 'Halvorsen & Pike Architects',
  address: '14 Quarry Lane, Second Floor, Millbrook',
  contact: 'June Halvorsen, office manager, 555-0142',
  notes: 'Old two-pair telephone wiring; pair 2 (black/yellow) is spare in every room. Punch-down block in the copy room.',
};

export const DEMO_KIT = {
  name: 'Threadline 2.1',
  programPath: 'C:\\THREAD\\TLRES.COM',
  programArgs: '/Q',
  baud: 9600,
  parity: 'N' as const,
  dataBits: 8,
  stopBits: 1,
  minDos: '3.30',
  residentKB: 38,
  configFiles: 20,
  configBuffers: 15,
  configLines: [] as string[],
};

type Attached = 'adapter' | 'mouse' | 'modem' | 'printer' | 'other' | 'none';
type DemoPc = {
  name: string;
  number: number;
  location: string;
  dos: string;
  dosDir: string;
  network: 'COM1' | 'COM2';
  ports: Array<[string, Attached]>;
  freeKB?: number;
  mainProgramKB?: number;
};

export const DEMO_PCS: DemoPc[] = [
  { name: 'RECEPT', number: 1, location: 'Reception desk, jack J-01', dos: '6.22', dosDir: 'C:\\DOS', network: 'COM1', ports: [['COM1', 'adapter'], ['COM2', 'none'], ['LPT1', 'none']], freeKB: 590, mainProgramKB: 420 },
  { name: 'DRAFT1', number: 2, location: 'Drafting room, jack J-04', dos: '5.0', dosDir: 'C:\\DOS', network: 'COM1', ports: [['COM1', 'adapter'], ['COM2', 'mouse'], ['LPT1', 'none']], freeKB: 560, mainProgramKB: 480 },
  { name: 'DRAFT2', number: 3, location: 'Drafting room, jack J-05', dos: '6.22', dosDir: 'C:\\DOS', network: 'COM1', ports: [['COM1', 'adapter'], ['COM2', 'none'], ['LPT1', 'none']], freeKB: 600, mainProgramKB: 500 },
  { name: 'ACCOUNTS', number: 4, location: 'Back office, jack J-07', dos: '4.01', dosDir: 'C:\\DOS', network: 'COM2', ports: [['COM1', 'mouse'], ['COM2', 'adapter'], ['LPT1', 'none']], freeKB: 540, mainProgramKB: 380 },
  { name: 'STUDIO', number: 5, location: 'Studio, jack J-08', dos: '6.22', dosDir: 'C:\\DOS', network: 'COM1', ports: [['COM1', 'adapter'], ['COM2', 'none'], ['LPT1', 'none']], freeKB: 610 },
  { name: 'ARCHIVE', number: 6, location: 'Plan archive, jack J-10', dos: '3.30', dosDir: 'C:\\DOS33', network: 'COM1', ports: [['COM1', 'adapter'], ['LPT1', 'none']], freeKB: 520, mainProgramKB: 300 },
  { name: 'PRINCIPL', number: 7, location: "Principal's office, jack J-02", dos: '6.20', dosDir: 'C:\\DOS', network: 'COM2', ports: [['COM1', 'mouse'], ['COM2', 'adapter'], ['LPT1', 'none']], freeKB: 615 },
  { name: 'INTERN', number: 8, location: 'Intern desk, jack J-06', dos: '5.0', dosDir: 'C:\\DOS', network: 'COM1', ports: [['COM1', 'adapter'], ['LPT1', 'none']] },
  { name: 'MODELS', number: 9, location: 'Model shop, jack J-09', dos: '6.0', dosDir: 'C:\\DOS', network: 'COM1', ports: [['COM1', 'adapter'], ['COM2', 'none'], ['LPT1', 'none']], freeKB: 580, mainProgramKB: 550 },
  { name: 'LIBRARY', number: 10, location: 'Library corner, jack J-11', dos: '3.30', dosDir: 'C:\\DOS', network: 'COM1', ports: [['COM1', 'adapter'], ['LPT1', 'none']], freeKB: 530 },
];

export const DEMO_OTHER_STATIONS = [
  { kind: 'printer' as const, name: 'HALLPRN', number: 100, location: 'Hallway laser printer, jack J-03' },
  { kind: 'printer' as const, name: 'PLOTPRN', number: 101, location: 'Pen plotter in the drafting room, jack J-05' },
  { kind: 'modem' as const, name: 'MODEM1', number: 150, location: 'Shared modem in the copy room, jack J-12' },
];

/** The engine profile (generators/engine/profile.ts form, files kept apart) for a demo PC. */
export function demoProfile(pc: DemoPc) {
  return {
    dos: pc.dos,
    bootDrive: 'C',
    dosDir: pc.dosDir,
    ports: pc.ports.map(([name, attached]) => ({ name, present: true, attached })),
    network: { port: pc.network, baud: DEMO_KIT.baud, parity: DEMO_KIT.parity, dataBits: DEMO_KIT.dataBits, stopBits: DEMO_KIT.stopBits },
    redirect: { from: 'LPT1', to: pc.network },
    loader: { path: DEMO_KIT.programPath, args: `/S:${pc.number} ${DEMO_KIT.programArgs}`.trim() },
    finalProgram: 'auto',
    loadHigh: 'auto',
    ...(pc.freeKB ? { memory: { freeKB: pc.freeKB, mainProgramKB: pc.mainProgramKB } } : {}),
  };
}
