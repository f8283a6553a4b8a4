'use strict';
// A second, smaller invented company: its rows exist so that tenant isolation can be shown.

module.exports = {
  company: {
    name: 'Tallowmere Sewer Services',
    time_zone: 'Europe/Berlin',
    unit_system: 'metric',
    min_overlap_per_end_mm: 300,
    working_window_safety_margin: 0.25,
  },
  users: [
    { email: 'office@second.test', name: 'Ines Vollrath', role: 'office' },
    { email: 'foreman@second.test', name: 'Bram Oosterhuis', role: 'foreman' },
  ],
  crews: [{ name: 'Crew one', daily_capacity: 3, members: ['foreman@second.test'] }],
  customers: [
    {
      name: 'Hafenviertel Housing Cooperative',
      kind: 'property_manager',
      contact_name: 'Lotte Brink',
      email: 'technik@hafenviertel.example',
      phone: '555-0199',
    },
  ],
  sites: [
    {
      customer: 0,
      name: 'Courtyard drain',
      address_line: 'Speicherweg 3',
      city: 'Tallowmere',
      region: 'Demo Land (invented)',
      postal_code: '00000',
      access_points: [
        { label: 'S1', kind: 'manhole', depth_mm: 1800 },
        { label: 'S2', kind: 'manhole', depth_mm: 2000 },
      ],
      segments: [
        {
          label: 'S1 → S2',
          from: 0,
          to: 1,
          material: 'concrete',
          nominal_size_mm: 200,
          inside_diameter_mm: 200,
          length_mm: 35000,
          depth_mm: 1900,
        },
      ],
    },
  ],
  resin_systems: [
    {
      name: 'Two-part epoxy',
      chemistry: 'epoxy',
      ref_temp_c: 20,
      pot_life_min: 35,
      hold_min: 100,
      full_cure_min: 260,
      min_temp_c: 5,
      max_temp_c: 30,
      sensitivity_kind: 'doubling',
      doubling_c: 10,
      activation_energy_kj: null,
    },
  ],
  resin_kits: [{ resin: 0, lot: 'TM-2611-001', expires_in_days: 200, quantity_l: 10 }],
  packers: [
    {
      name: '200 mm packer',
      serial: 'TM-200',
      min_diameter_mm: 185,
      max_diameter_mm: 215,
      bladder_length_mm: 1600,
      end_margin_mm: 100,
      min_pressure_kpa: 70,
      max_pressure_kpa: 180,
    },
  ],
  checklists: [
    {
      name: 'Checks',
      items: [
        { id: 'clean', label: 'Line cleaned', required: true },
        { id: 'flow', label: 'Flow stopped', required: true },
      ],
    },
  ],
  jobs: [
    {
      site: 0,
      crew: 0,
      day: 0,
      status: 'scheduled',
      title: 'Crack in courtyard drain',
      repairs: [
        {
          distance_mm: 12000,
          defect_type: 'lengthwise_crack',
          condition_grade: 3,
          defect_length_mm: 300,
          clock_position: '12',
        },
      ],
    },
    {
      site: 0,
      crew: 0,
      day: -3,
      status: 'approved',
      title: 'Joint at S2',
      install: { status: 'approved', mix_temp_c: 18, pipe_temp_c: 14 },
      repairs: [
        {
          distance_mm: 33000,
          defect_type: 'joint_gap',
          condition_grade: 3,
          defect_length_mm: 120,
          clock_position: '6',
        },
      ],
    },
  ],
};
