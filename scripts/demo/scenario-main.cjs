'use strict';
// The demo contractor: an invented company, invented people, invented streets. Numbers are demo data.

const checklist = [
  { id: 'clean', label: 'Line cleaned and the defect checked on camera', required: true },
  { id: 'measure', label: 'Distance to the defect measured from the access point', required: true },
  { id: 'flow', label: 'Flow stopped or bypassed; upstream users told', required: true },
  { id: 'packer', label: 'Packer, hoses and gauge inspected; gauge reads zero', required: true },
  { id: 'patch', label: 'Patch cut to length and centre marked', required: true },
  { id: 'ppe', label: 'Gloves, eye protection and resin spill kit at the mixing place', required: true },
  { id: 'photos', label: 'Before images recorded', required: false },
];

const site = (customer, name, address_line, extra = {}) => ({
  customer, name, address_line, city: 'Fennick Falls', region: 'Demo County (invented)', postal_code: '00000',
  access_points: [
    { label: 'MH-1', kind: 'manhole', depth_mm: 2400 },
    { label: 'MH-2', kind: 'manhole', depth_mm: 2700 },
  ],
  segments: [{ label: 'MH-1 → MH-2', from: 0, to: 1, material: 'vitrified_clay', nominal_size_mm: 203, inside_diameter_mm: 200, length_mm: 61000, depth_mm: 2500 }],
  ...extra,
});

const lateral = (customer, name, address_line) =>
  site(customer, name, address_line, {
    access_points: [
      { label: 'CO-1', kind: 'cleanout', depth_mm: 900 },
      { label: 'MH-7', kind: 'manhole', depth_mm: 3100 },
    ],
    segments: [{ label: 'CO-1 → main', from: 0, to: 1, material: 'cast_iron', nominal_size_mm: 152, inside_diameter_mm: 150, length_mm: 18500, depth_mm: 1500 }],
  });

module.exports = {
  company: {
    name: 'Bramblewick Drainworks', time_zone: 'America/Denver', unit_system: 'imperial',
    min_overlap_per_end_mm: 305, working_window_safety_margin: 0.2,
  },
  users: [
    { email: 'admin@demo.test', name: 'Avery Lindqvist', role: 'admin' },
    { email: 'office@demo.test', name: 'Priya Okafor-Hale', role: 'office' },
    { email: 'foreman@demo.test', name: 'Mateo Varga', role: 'foreman' },
    { email: 'tech@demo.test', name: 'Jun Castellanos', role: 'technician' },
    // Reads the field screens in Spanish (users.locale), whatever the tablet's browser says.
    { email: 'tecnico@demo.test', name: 'Inés Barragán Soto', role: 'technician', locale: 'es' },
    { email: 'foreman2@demo.test', name: 'Rosa Delacroix-Finn', role: 'foreman' },
    { email: 'tech2@demo.test', name: 'Elliot Marsh', role: 'technician' },
  ],
  crews: [
    { name: 'North crew', daily_capacity: 4, members: ['foreman@demo.test', 'tech@demo.test', 'tecnico@demo.test'] },
    { name: 'South crew', daily_capacity: 3, members: ['foreman2@demo.test', 'tech2@demo.test'] },
  ],
  customers: [
    { name: 'Larkspur Court Homeowners Association', kind: 'property_manager', contact_name: 'Dana Whitlock', email: 'board@larkspur-court.example', phone: '555-0141' },
    { name: 'Town of Fennick Falls, Public Works', kind: 'municipality', contact_name: 'Hector Ibarra', email: 'publicworks@fennickfalls.example', phone: '555-0102' },
    { name: 'Odalys Brennan', kind: 'homeowner', email: 'odalys.brennan@mail.example', phone: '555-0177' },
    { name: 'Quarry Row Apartments', kind: 'property_manager', contact_name: 'Simone Achterberg', email: 'maintenance@quarryrow.example', phone: '555-0123', language: 'es' },
    { name: 'Pikeworth Plumbing', kind: 'contractor', contact_name: 'Gus Pikeworth', email: 'office@pikeworth.example', phone: '555-0164' },
    { name: 'Mill Street Bakery', kind: 'business', contact_name: 'Noor Haddad', email: 'noor@millstreetbakery.example', phone: '555-0188' },
  ],
  sites: [
    site(0, 'Larkspur Court east run', '12 Larkspur Court'),
    site(0, 'Larkspur Court west run', '40 Larkspur Court', {
      segments: [{ label: 'MH-1 → MH-2', from: 0, to: 1, material: 'concrete', nominal_size_mm: 254, inside_diameter_mm: 250, length_mm: 75000, depth_mm: 2800 }],
    }),
    site(1, 'Elm Avenue trunk', '300 block Elm Avenue', {
      segments: [
        { label: 'MH-1 → MH-2', from: 0, to: 1, material: 'vitrified_clay', nominal_size_mm: 305, inside_diameter_mm: 300, length_mm: 92000, depth_mm: 3200 },
        { label: 'MH-2 → MH-1 (overflow)', from: 1, to: 0, material: 'vitrified_clay', nominal_size_mm: 254, inside_diameter_mm: 250, length_mm: 92000, depth_mm: 3200 },
      ],
    }),
    site(1, 'Ridgeback Road crossing', 'Ridgeback Road at Cole Street'),
    lateral(2, 'Brennan house lateral', '7 Thistle Lane'),
    site(3, 'Quarry Row building A', '1 Quarry Row'),
    site(3, 'Quarry Row building C', '5 Quarry Row'),
    lateral(4, 'Pikeworth job: Osgood residence', '88 Wren Hollow'),
    lateral(5, 'Mill Street Bakery service line', '214 Mill Street'),
    site(1, 'Canal Street storm-sanitary tie', 'Canal Street at 2nd Avenue'),
  ],
  resin_systems: [
    { name: 'Standard ambient epoxy', chemistry: 'epoxy', ref_temp_c: 20, pot_life_min: 40, hold_min: 90, full_cure_min: 240, min_temp_c: 5, max_temp_c: 35, sensitivity_kind: 'doubling', doubling_c: 10, activation_energy_kj: null },
    { name: 'Cold-weather epoxy', chemistry: 'epoxy', ref_temp_c: 10, pot_life_min: 35, hold_min: 120, full_cure_min: 300, min_temp_c: -5, max_temp_c: 20, sensitivity_kind: 'arrhenius', doubling_c: null, activation_energy_kj: 52 },
  ],
  resin_kits: [
    { resin: 0, lot: 'SAE-2610-014', expires_in_days: 150, quantity_l: 18 },
    { resin: 0, lot: 'SAE-2607-003', expires_in_days: -12, quantity_l: 4 },
    { resin: 1, lot: 'CWE-2609-021', expires_in_days: 220, quantity_l: 12 },
  ],
  packers: [
    { name: '6 in short packer', serial: 'PK-0601', min_diameter_mm: 140, max_diameter_mm: 165, bladder_length_mm: 1200, end_margin_mm: 100, min_pressure_kpa: 70, max_pressure_kpa: 200 },
    { name: '6 in long packer', serial: 'PK-0602', min_diameter_mm: 140, max_diameter_mm: 165, bladder_length_mm: 2000, end_margin_mm: 100, min_pressure_kpa: 70, max_pressure_kpa: 200 },
    { name: '8 in packer', serial: 'PK-0801', min_diameter_mm: 185, max_diameter_mm: 215, bladder_length_mm: 1600, end_margin_mm: 100, min_pressure_kpa: 70, max_pressure_kpa: 180 },
    { name: '10–12 in packer', serial: 'PK-1201', min_diameter_mm: 240, max_diameter_mm: 310, bladder_length_mm: 1800, end_margin_mm: 125, min_pressure_kpa: 50, max_pressure_kpa: 150 },
  ],
  checklists: [{ name: 'Standard point-repair checks', items: checklist }],
  // day: days from today (company time zone); crew and site are indexes above.
  jobs: [
    { site: 9, crew: null, day: null, status: 'draft', title: 'Survey follow-up, two cracks', repairs: [{ distance_mm: 21300, defect_type: 'lengthwise_crack', condition_grade: 3, defect_length_mm: 450, clock_position: '12' }] },
    { site: 0, crew: 0, day: 0, status: 'scheduled', title: 'Two fractures near MH-2', notes: 'Gate code 4410. Park on the east side; HOA asks for cones at the bend.',
      repairs: [{ distance_mm: 38100, defect_type: 'open_fracture', condition_grade: 4, defect_length_mm: 300, clock_position: '2-5' }, { distance_mm: 44800, defect_type: 'joint_gap', condition_grade: 3, defect_length_mm: 150, clock_position: '6' }] },
    { site: 4, crew: 0, day: 1, status: 'scheduled', title: 'Root intrusion at joint', notes: 'Homeowner works from home; ring before running water is cut.',
      repairs: [{ distance_mm: 9100, defect_type: 'roots', condition_grade: 3, defect_length_mm: 200, clock_position: '10-2' }] },
    { site: 5, crew: 1, day: 0, status: 'in_progress', title: 'Broken pipe at building A', repairs: [{ distance_mm: 15200, defect_type: 'broken_wall', condition_grade: 5, defect_length_mm: 350, clock_position: '4-8' }] },
    { site: 6, crew: 1, day: 3, status: 'scheduled', title: 'Infiltration at two joints', repairs: [{ distance_mm: 7600, defect_type: 'water_getting_in', condition_grade: 3, defect_length_mm: 150 }, { distance_mm: 22900, defect_type: 'joint_out_of_line', condition_grade: 2, defect_length_mm: 100 }] },
    { site: 7, crew: 0, day: 9, status: 'scheduled', title: 'Crack under driveway', repairs: [{ distance_mm: 6100, defect_type: 'ring_crack', condition_grade: 3, defect_length_mm: 120, clock_position: '3' }] },
    { site: 2, crew: 0, day: -2, status: 'awaiting_review', title: 'Trunk fracture at 140 ft',
      install: { shape: 'late-inflate', status: 'awaiting_review', mix_temp_c: 26, pipe_temp_c: 14 },
      repairs: [{ distance_mm: 42700, defect_type: 'open_fracture', condition_grade: 4, defect_length_mm: 400, clock_position: '1-4' }] },
    { site: 8, crew: 1, day: -1, status: 'awaiting_review', title: 'Service line hole under floor drain',
      install: { shape: 'early-deflate', status: 'awaiting_review', mix_temp_c: 19, pipe_temp_c: 16 },
      repairs: [{ distance_mm: 4300, defect_type: 'hole', condition_grade: 4, defect_length_mm: 100, clock_position: '6' }] },
    { site: 1, crew: 1, day: -4, status: 'sent_back', title: 'Longitudinal crack, west run', review_comment: 'Please add the after-inspection images and the second pressure reading.',
      install: { status: 'sent_back', mix_temp_c: 18, pipe_temp_c: 15 },
      repairs: [{ distance_mm: 30500, defect_type: 'lengthwise_crack', condition_grade: 3, defect_length_mm: 500, clock_position: '12' }] },
    { site: 3, crew: 0, day: -6, status: 'approved', title: 'Joint separation at the crossing',
      install: { status: 'approved', mix_temp_c: 17, pipe_temp_c: 13 },
      repairs: [{ distance_mm: 12200, defect_type: 'joint_gap', condition_grade: 3, defect_length_mm: 150, clock_position: '5-7' }] },
    { site: 0, crew: 0, day: -9, status: 'approved', title: 'Crack at MH-1 end',
      install: { status: 'approved', mix_temp_c: 15, pipe_temp_c: 12 },
      repairs: [{ distance_mm: 3000, defect_type: 'crazed_cracks', condition_grade: 3, defect_length_mm: 250, clock_position: '9-12' }] },
    { site: 4, crew: 1, day: -12, status: 'reported', title: 'Offset joint, first visit', invoice: { status: 'issued', price_cents: 162_500, tax_rate_bp: 825, due_in_days: 18 },
      install: { status: 'approved', mix_temp_c: 21, pipe_temp_c: 17 },
      repairs: [{ distance_mm: 3700, defect_type: 'joint_out_of_line', condition_grade: 2, defect_length_mm: 100, clock_position: '6' }] },
    { site: 2, crew: 0, day: -16, status: 'closed', title: 'Overflow line cracks', invoice: { status: 'paid', price_cents: 148_000, tax_rate_bp: 825 },
      install: { status: 'approved', mix_temp_c: 12, pipe_temp_c: 10, resin: 1 },
      repairs: [{ segment: 1, distance_mm: 18300, defect_type: 'ring_crack', condition_grade: 3, defect_length_mm: 200, clock_position: '3' }, { segment: 1, distance_mm: 27400, defect_type: 'lengthwise_crack', condition_grade: 2, defect_length_mm: 300, clock_position: '11-1' }] },
    { site: 5, crew: 1, day: -20, status: 'closed', title: 'Corroded section', invoice: { status: 'paid', price_cents: 171_000, tax_rate_bp: 825 }, install: { status: 'approved', mix_temp_c: 20, pipe_temp_c: 15 },
      repairs: [{ distance_mm: 9800, defect_type: 'wall_loss', condition_grade: 4, defect_length_mm: 450, clock_position: '4-8' }] },
    { site: 6, crew: 1, day: 5, status: 'cancelled', title: 'Cancelled by customer: line to be replaced', repairs: [{ distance_mm: 11000, defect_type: 'out_of_round', condition_grade: 5, defect_length_mm: 600 }] },
  ],
};
