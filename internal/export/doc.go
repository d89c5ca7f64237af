// Package export writes a finished plan ([planner.Plan]) as JSON, CSV and
// GeoJSON, and writes files atomically. It only formats what is in the plan:
// it predicts, checks and decides nothing.
//
// Every value is SI and every key or column that holds a quantity names its
// unit (x_m, ground_null_hz, velocity_m_s, static_temperature_k). Angles are
// in degrees in the layout's polar-angle convention, which each output names
// ("from_jet_axis" or "from_inlet").
//
// # Numbers
//
// Lengths are rounded to 0.1 mm (4 decimals in metres) and angles to
// 0.01°; other quantities (Mach and Reynolds numbers, velocities,
// temperatures, frequencies, decibels, ratios) keep 6 significant digits.
// The rounding makes the output byte-stable: the same plan gives the same
// bytes, and the last bits of a floating-point result do not show.
//
// A NaN or ±Inf value is written as JSON null and as an empty CSV cell; it
// means "does not apply" (the floor null of a flush microphone) or "not
// known". GeoJSON coordinates cannot be null: [GeoJSON] returns an error
// wrapping [ErrNotFinite] that names the feature instead.
//
// # JSON
//
// [JSON] writes one indented object: the format name and version, the
// source file, the title and title block, the polar-angle convention, the
// governing operating point (null without points), the counts of stations
// by verdict and the plan's warnings, then "stations", "arrays", "points",
// "absorption" and "crew" lists, in plan order. Keys are written in a fixed order
// (structs, not maps); an empty list is [], never null.
//
// A station gives its microphone (x_m, y_m, z_m), the foot of its stand
// (base_x_m, base_y_m), height, its radius and polar angle nominal and as
// placed, the same quantity each (radius_m equals nominal_radius_m for a
// station placed where the layout asks: an arc's radius in its plane, a
// ring's radius about the axis, a line's offset, a near-field line's
// clearance; see CSV), the true distance and angle in space the checks use
// (acoustic_distance_m, acoustic_polar_deg), its jet-frame
// position ("jet": x_m, r_m, azimuth_deg), its kind (arc, line, near_field,
// ring, points or probes), stand (null for a microphone flush on the floor),
// aim ("normal" or "grazing") and aim point, status and governing point.
// Its "checks" object holds the value of each named check, null where the
// station has no such check or the value is NaN (the floor null of a flush
// microphone or a treated floor); line_of_sight is true when the whole
// source region is in view (the check's value is 1) and buoyant_plume when
// the check's value is 1. "check_details" lists every check with its
// value, unit, verdict, governing point and reason, and "reasons" the
// reasons of the checks that are not ok. "levels" gives the predicted
// levels at the microphone, one {point, oaspl_db, a_weighted_db, peak_db}
// per operating point (empty for probe stands; the levels null where they
// could not be predicted, within a jet diameter of the source position);
// checks.oaspl_db is the loudest.
//
// A crew entry, one per crew position and operating point, gives name,
// point, a_weighted_db, peak_db (the C-weighted peak estimate),
// allowed_hours (NIOSH REL, capped at 24: a day or more; 0 where the level
// could not be predicted) and status (ok, warn, blocked; warn also where
// the level plus its stated uncertainty reaches an action value, blocked
// whatever the noise where a person standing there is inside a velocity or
// hot zone or its margin).
//
// An array gives its kind, radius, centre, whether the planner chose the
// radius, the largest radius (arcs only, else null), the clearest polar
// angle (null if none), the far-field interval of radii [lo, hi] (null when
// empty) with its note, and its blocked list and notes.
//
// A point's potential_core_length_m is the nominal core (tables show
// nominal values; the conservative one is beside it); its envelope lengths
// and largest radii are the conservative zones that clearances use. It also
// gives the fully expanded exit state ("exit"), the regime flags in words,
// and the collector capture verdict with its reason and the predicted plume
// diameter at the inlet (null when the cell has no collector).
//
// # CSV
//
// [CSV] writes the station table for the data system and the technicians:
// a header row, then one row per station in plan order, metres to 4
// decimals and degrees to 2.
//
// # GeoJSON
//
// [GeoJSON] writes a FeatureCollection whose coordinates are the cell frame
// in metres (planar X and Y from the cell datum, not longitude and
// latitude), which the foreign member "coordinate_frame" states. Each feature
// has a "layer" property: boundary, obstacle, keep_out, collector, mark,
// nozzle, jet_axis, zone, arc, station and stand_base, and with levels
// crew and noise_contour. A crew point carries the position's worst
// exposure over the operating points: the worst status, and of equal
// statuses the loudest dB(A), with that point's name and levels. Polygon
// rings are closed and counter-clockwise (RFC 7946 §3.1.6).
//
// # Files
//
// [WriteFiles] writes the outputs of one run all or none: [CheckOutputs]
// first refuses a destination that is an input or another output (paths
// compared after following links), a directory or a device, and one whose
// directory cannot be written; then every file goes to a temporary file
// next to its target, and the temporaries replace their targets only when
// all were written. A replaced file keeps its permissions, a symbolic link
// is kept and its target written, "-" is standard output, the null device
// discards, a named pipe is written through, and SIGINT, SIGTERM or SIGHUP
// during the writing removes the temporaries. [WriteFile] does the same
// for one file.
package export
