// Package layout reads the layout file of one acoustic test — the cell, the
// nozzle, the test matrix, the limits, the stands and the microphone arrays
// — and turns it into a validated [planner.Request] in SI units. It computes
// no physics: it decodes, converts units, applies defaults and checks.
//
// # The file
//
// A layout is one YAML document with these top-level keys:
//
//	arcwright         format version, required, 1
//	title             title block: title (required), facility, test, revision,
//	                  prepared_by, checked_by, approved_by, date
//	units             length (unit of bare lengths: m, mm, cm, in, ft),
//	                  sheet (metric or imperial)
//	polar_angle       required, no default: from_jet_axis or from_inlet
//	ambient           pressure, temperature, humidity (defaults 101.325 kPa, 15 C, 60 %)
//	cell              kind, boundary or site_limit, ceiling, floor, cutoff,
//	                  treatment_depth, obstacles, keep_out, collector, marks
//	nozzle            exit, axis_height, heading, kind and its dimensions
//	operating_points  the test matrix: name, npr, total_temperature or
//	                  temperature_ratio, gamma, gas_constant, secondary
//	limits            optional thresholds and margins of the checks
//	band              low and high, the frequency band of interest (required)
//	stands            stand types: name, base_radius, base_height,
//	                  pole_diameter, boom_length, microphone
//	arrays            each a name, an optional stand, first_channel, aim,
//	                  microphone and one pattern: arc, line, near_field, ring,
//	                  points, probes
//	sheet             scale and paper of the printed sheet
//	noise             room_absorption (0.01 to 0.99) or reverberation_time
//	                  (hard-walled cells; turned into an absorption
//	                  coefficient by Eyring's formula, which must give 0.01
//	                  to 0.99 in the room), contours (extra dB(A) levels for
//	                  the sheet)
//	crew              where people stay during runs: name, at, height, hours
//
// A microphone is a nominal size ("1/4 in", whose typical limits apply) or
// a map of size, max_level (dB) and upper_frequency. A microphone's
// max_level is unweighted ("165 dB", dB re 20 µPa) and noise.contours are
// A-weighted ("95 dB(A)"); a bare number is read in the key's own
// weighting and a level in another weighting is an error. A contour given
// twice, or at the 85 dB(A) always drawn, is an error. Hours
// are a number of hours, "2 h" or "30 min".
//
// [Starter] returns a complete, commented layout that explains every key; it
// is the reference of the format.
//
// # Quantities
//
// Every quantity is a YAML scalar read with [units.Parse]: "50.8 mm",
// "12 ft 6 in", "15 C", "101.3 kPa", "60 %", "30 deg", "200 Hz". A bare
// number is in the file's length unit for lengths and coordinates, degrees
// for angles, hertz for frequencies, m/s for speeds and percent for
// humidity. Temperatures and pressures must carry a unit. NPR, gamma, the
// gas constant (J/(kg K)), ratios and Mach numbers are bare numbers.
//
// # Plausible values and limits of the file
//
// A value that parses but that no test uses is refused with its plausible
// range, as a slip of a unit or an exponent: NPR above 1 up to [MaxNPR],
// total temperatures [MinTotalTemperature] to [MaxTotalTemperature],
// temperature ratios, gas constants, nozzle sizes, design Mach numbers,
// aspect ratios, ambient pressure and temperature, the limits and the band
// (see plausible.go); every length and coordinate is at most [MaxLength].
// Names are at most [MaxNameLength] characters and the texts of the title
// block at most [MaxTextLength], without control characters; a date written
// with numbers must be a date. A file is at most [MaxInputSize] bytes of
// UTF-8 text (a byte-order mark is allowed), a regular file, nested at most
// [MaxDepth] levels, without custom YAML tags. More than [MaxProblems]
// problems are counted in one last line. [Locate] places an error of the
// planner, the sheet or an export at the line and key of the layout.
//
// In the [planner.Request] every length is in metres, every temperature in
// kelvin, pressure in pascals, frequency in hertz and angle in radians;
// polar angle ranges stay in the layout's convention.
//
// # Errors
//
// [Load] and [Decode] return either a Request or an [Errors] value, never
// both. Decoding goes on after a problem and reports every problem it can
// find in one pass, skipping only the checks that need a broken value. Each
// [*Error] names the file, the line, the field path (list indices from 0)
// and what was expected:
//
//	layouts/cell.yaml:12: nozzle.diameter: want a length, got "5 kg" (kg is a mass unit)
//	layouts/cell.yaml:9: cell.ceilng: unknown key "ceilng"; did you mean "ceiling"?
//
// Each Error wraps one of the sentinel errors (ErrSyntax, ErrUnknownKey,
// ErrWrongType, ErrMissing, ErrInvalid, ErrDuplicateName, ErrUnresolved,
// ErrRead) and, where another package found the problem, that package's
// error ([*units.Error], a geometry or jet error). Remarks that do not stop
// the layout being used, such as an exhaust collector off the jet axis, are
// returned as [Warning] values.
//
// The format has no anchors or aliases, and one document per file.
//
// # As-built positions
//
// [LoadAsBuilt] and [DecodeAsBuilt] read the station positions measured
// after set-up, a CSV file with the columns id, x, y, z and optionally
// base_x, base_y, into the map of planner.Request.AsBuilt, with the same
// errors and units as the layout. Files saved by spreadsheets are read: a
// byte-order mark, semicolons or tabs between the columns and decimal
// commas. [UnknownAsBuilt] names, at its line, each station ID of the file
// that the plan does not have.
package layout
