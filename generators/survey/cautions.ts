/**
 * The cautions every survey screen and report shows. Each names its published source in the comment:
 * the report itself speaks plainly to the technician.
 */
export const SURVEY_CAUTIONS: readonly string[] = [
  // REFERENCES 6.5 [MACASSEY] [TIPRING]: nominal 48 V DC on hook; 6.7 [TIPRING]: ringing about 90 V AC at 20 Hz.
  'Telephone pairs can carry about 48 V DC, and ringing near 90 V AC on top of it. Test every pair with a ' +
    'meter before touching it, and treat a pair as live until it reads dead.',
  // REFERENCES 6.12 [NATHANDY]: ringing can arrive with every phone unplugged.
  'Ringing can arrive even with every telephone unplugged.',
  // REFERENCES 6.10 [AVAYA]: no work during lightning; no bare wires unless disconnected at the network interface.
  'Do not work on telephone wiring during a lightning storm. Do not touch bare wires or terminals unless the ' +
    'line is disconnected at the network interface.',
  // REFERENCES 6.11 [LEVITON]: pacemakers; NEC Article 800 and local rules.
  'People with heart pacemakers should not work on telephone wiring.',
  'Follow local codes (NEC Article 800 in the US) and licensed practice; where they differ from this report, ' +
    'they win.',
];

/** The survey's limits are the trade's common practice: the report says so once. */
export const RULES_NOTE =
  'Limits used (common practice of the trade, no published source): a pair over 0.3 V DC or 1 V AC is ' +
  'probably in use; star spokes up to 500 ft; a bus up to 4,000 ft in total, 2,500 ft with only 24 AWG; ' +
  '22 AWG for new runs; one 150 ohm terminator from 100 ft of wire; an even number of pair reversals ' +
  'between any two adapters; splitters only in wall jacks.';

