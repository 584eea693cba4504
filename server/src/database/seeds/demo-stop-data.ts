/**
 * The stops of the invented demo scenario: small Larkhaven businesses made up for the demo (any likeness to a real
 * shop is chance), their kinds of opening hours and the access notes a sharpener would jot down.
 */
import type { OpeningHours, OpeningWindow, StopKind, Weekday } from '@keenroute/shared';

export interface DemoStopSpec {
  name: string;
  kind: StopKind;
  /** Hair or grooming: decides the shears' use, lengths and mix at this stop. */
  family: 'hair' | 'grooming';
  /** Customers at this stop, from and to (both included). */
  customers: readonly [number, number];
  role?: 'never-visited' | 'inactive' | 'managed';
}

const salon = (name: string, role?: DemoStopSpec['role']): DemoStopSpec => ({
  name,
  kind: 'salon',
  family: 'hair',
  customers: [5, 11],
  role,
});
const barbershop = (name: string, role?: DemoStopSpec['role']): DemoStopSpec => ({
  name,
  kind: 'barbershop',
  family: 'hair',
  customers: [4, 7],
  role,
});
const groomingShop = (name: string, role?: DemoStopSpec['role']): DemoStopSpec => ({
  name,
  kind: 'grooming-shop',
  family: 'grooming',
  customers: [4, 9],
  role,
});

export const DEMO_STOP_SPECS: readonly DemoStopSpec[] = [
  salon('Juniper & Ash Hair Studio'),
  salon('The Copper Comb'),
  salon('Maple Row Salon'),
  salon('Bramble Hair Co.'),
  salon('Studio Nine Hair'),
  salon('Heronwood Hair Loft'),
  salon('Silverleaf Salon'),
  salon('The Tidy Fringe'),
  salon('Willow & Wren Salon'),
  salon('Lakeshore Hair Collective'),
  salon('Marigold Beauty Bar'),
  salon('Fernwood Stylists'),
  salon('Curl & Clover'),
  salon('Birchlight Salon', 'inactive'),
  salon('The Gilded Shear Salon'),
  salon('Harbor Light Hair'),
  salon('Plume Hair Atelier'),
  salon('Sable & Stone Salon'),
  salon('Kindred Hair House'),
  salon('Lark & Lantern Salon', 'never-visited'),
  barbershop('Old Anvil Barbers'),
  barbershop('Foxglove Barber Co.'),
  barbershop('Sharp Corner Barbershop'),
  barbershop('Ironwood Barbers'),
  barbershop('Tenpenny Barbershop', 'inactive'),
  barbershop('Northgate Fade Shop'),
  groomingShop('Thistle & Tail Grooming', 'managed'),
  groomingShop('Barkwood Grooming Parlor'),
  groomingShop('The Shaggy Otter Pet Spa'),
  groomingShop('Lakeshore Dog Wash & Trim'),
  groomingShop('Two Brushes Grooming'),
  groomingShop('Pine Hollow Pet Grooming'),
  groomingShop('Clover Paw Grooming'),
  groomingShop('Quill & Whisker Grooming'),
  groomingShop("Biscuit's Grooming Room"),
  groomingShop('Mudlark Mobile Grooming Base'),
  { name: 'Larkhaven Academy of Pet Grooming', kind: 'school', family: 'grooming', customers: [14, 18] },
  { name: 'Lakeshore School of Hair Design', kind: 'school', family: 'hair', customers: [10, 14] },
  // A vet clinic with a grooming room: its groomers bring grooming shears.
  { name: 'Larkhaven Veterinary Clinic', kind: 'clinic', family: 'grooming', customers: [4, 5] },
  // A community theatre's wig and costume room: hair shears, open on Sunday for matinees.
  { name: 'Willowbend Playhouse Wardrobe', kind: 'other', family: 'hair', customers: [4, 6] },
];

const open = (opens: string, closes: string): OpeningWindow => ({ opens, closes });
function days(list: readonly Weekday[], windows: readonly OpeningWindow[]): OpeningHours {
  return Object.fromEntries(list.map((day) => [day, [...windows]]));
}
const TUE_FRI: readonly Weekday[] = ['tue', 'wed', 'thu', 'fri'];
const MON_FRI: readonly Weekday[] = ['mon', ...TUE_FRI];

/** Opening-hour patterns by kind; two windows on a day is a lunch close. */
export const DEMO_HOURS: Readonly<Record<StopKind, readonly (readonly [OpeningHours, number])[]>> = {
  salon: [
    [{ ...days(TUE_FRI, [open('09:00', '19:00')]), sat: [open('08:00', '16:00')] }, 45],
    [days([...TUE_FRI, 'sat'], [open('09:00', '12:30'), open('13:30', '18:00')]), 30],
    [
      {
        ...days(['mon', 'tue', 'wed', 'thu'], [open('10:00', '20:00')]),
        ...days(['fri', 'sat'], [open('09:00', '16:00')]),
      },
      25,
    ],
  ],
  barbershop: [
    [{ ...days(MON_FRI, [open('07:30', '18:00')]), sat: [open('07:00', '14:00')] }, 50],
    [{ ...days(TUE_FRI, [open('08:00', '12:00'), open('13:00', '18:00')]), sat: [open('08:00', '13:00')] }, 50],
  ],
  // Groomers start early: dogs are dropped off before the owners' working day.
  'grooming-shop': [
    [days([...TUE_FRI, 'sat'], [open('07:00', '15:30')]), 40],
    [{ ...days(MON_FRI, [open('07:30', '16:30')]), sat: [open('08:00', '12:00')] }, 35],
    [{ ...days(TUE_FRI, [open('07:00', '11:30'), open('12:30', '16:00')]), sat: [open('07:00', '12:00')] }, 25],
  ],
  school: [[days(MON_FRI, [open('08:00', '11:45'), open('12:30', '16:00')]), 1]],
  clinic: [[{ ...days(MON_FRI, [open('08:00', '17:30')]), sat: [open('09:00', '12:00')] }, 1]],
  other: [[{ ...days(['wed', 'thu', 'fri', 'sat'], [open('12:00', '18:00')]), sun: [open('12:00', '16:00')] }, 1]],
};

export const DEMO_ACCESS_PARKING: readonly string[] = [
  'Free lot behind the building; leave the two spots by the door for clients.',
  'Street parking on the north side; meters are free after 6 pm.',
  'Loading zone out front for 15 minutes; ask the front desk for a dash card if longer.',
  'Shared lot by the laundromat; the van fits in the end row.',
  'Client parking only in front; use the alley spaces marked Staff.',
  'Two-hour street parking. The curb is high: bring the hand truck.',
  'Side lot off the alley; watch the low awning.',
];

export const DEMO_ACCESS_DOOR: Readonly<Record<'hair' | 'grooming', readonly string[]>> = {
  hair: [
    'Front door; set up at the spare station by the window.',
    'Back door off the alley; knock, the bell does not work.',
    'Staff entrance at the side; buzz twice.',
    'Through the front and past the shampoo bowls to the break room.',
  ],
  grooming: [
    'Use the back door: dogs are loose in the front room.',
    'Ring the grooming bell at the side gate and wait; they need to crate the dogs first.',
    'Front door; close the inner gate behind you.',
    'Back entrance by the drying room; mind the wet floor.',
  ],
};

export const DEMO_ACCESS_BEST_TIME: Readonly<Record<'hair' | 'grooming', readonly string[]>> = {
  hair: [
    'Right after opening, before the first clients.',
    'Mid-afternoon lull, around 2 pm.',
    'During the lunch close, when there is one.',
    'Call ahead: the owner likes to be there.',
    'Weekday mornings; Saturdays are fully booked.',
  ],
  grooming: [
    'Early: the groomers want their shears back before the first dogs are done.',
    'Late morning, once the drop-offs are settled.',
    'Call the day before; they plan around the bath schedule.',
    'First thing after opening.',
  ],
};
