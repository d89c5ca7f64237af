// Package sheet lays out and writes the PDF floor layout sheet of a finished
// plan: the sheet a technician marks a floor from and a safety engineer reads
// at a glance.
//
// It computes nothing the planner should. Clearances, verdicts, zones and
// absorption come from the [planner.Plan]; this package only computes drawing
// geometry (page positions, label placement, hatching, the margin band drawn
// around each zone), the chord lengths between neighbouring stations that the
// set-up steps print, and unit conversions for printing (package units).
//
// # Two steps
//
// [Build] lays the sheet out into a [Model]: the pages, the chosen scale,
// every drawn item's position in millimetres on the page, the placed labels
// and the tables split across pages. [Model.Render] writes the model as PDF
// with the core fonts of gofpdf. [Write] does both. The model is plain data,
// so tests check the layout without reading PDF, and [Model.Dump] gives a
// deterministic JSON text for golden tests.
//
// # What the sheet holds
//
// Sheet 1 carries the plan view at a standard scale (ISO 5455 1:1 … 1:5000
// with 1:25 and 1:75; on a feet-and-inches sheet the architect's and the
// engineer's scales; the largest that fits, or the one asked for), the
// cell, the plume zones, the arrays and stations with their labels, orange
// warning triangles where the planner reports a zone reaching a surface or
// an obstacle, buoyancy bending the jet or a crew position inside a zone
// (hazards.go), the scale bar, the safety panel (the WARNING signal word of
// ANSI Z535.4 and ISO 3864-2), every safety warning of the plan (one line
// per kind, naming the operating points; warnings.go), the legend, the
// notes and the title block. The safety content is set in 6.5 pt and
// shrinks to no less than 6 pt when room is short; the legend, the notes
// and the other warnings then move after the set-up steps, with a pointer
// to their sheet, and a paper whose sheet 1 cannot hold every safety
// warning is refused, naming the papers that can (ErrPaperRoom). An open
// site much larger than its stations is drawn cropped to them, with break
// marks where its boundary leaves the frame. Sheet 2 opens with the set-out
// table; the set-up steps, the elevation (the vertical section through the
// axis, zones cut at the floor, ceiling and walls), the clearance view (each
// station at its true distance from the axis), detail views of arrays too
// dense to label at the plan's scale, the station table (nominal and
// as-placed radius and angle, the point of each clearance), the
// operating-points table and the absorption table follow; every warning in
// full comes after the set-up steps. A station that a bent or carried
// zone blocks is ringed in the clearance view, where those zones are not
// drawn. Every sheet has the title block in its bottom-right corner.
//
// # Page flow
//
// The sheets after the first are filled in that order, each before the next
// is started (flow.go): a table runs on row by row into the space left,
// repeating its heading with its title marked continued on a new sheet; a
// table narrow enough to stand twice across runs on in lanes side by side
// under one title, balanced where it ends; text runs in columns, balanced
// where it ends, a warning never split; a drawing (figure) that does not fit
// where it comes waits for the top of the next sheet while the tables and
// text after it fill the space. When the last sheet is less than 40 % full
// the flow is run again with the foot of the sheet before raised, and the
// layout whose emptier sheet of the two is fullest is kept.
//
// # Dates
//
// Nothing reads the clock: the issue date is the layout's title date, and
// the PDF's creation date that date at 00:00 UTC, or [Undated] when the
// layout has none, so the same layout gives the same bytes.
//
// # Zones drawn
//
// The plan and the elevation draw the conservative velocity zone and the
// nominal potential core of the governing operating point
// (Plan.Points[Plan.Governing], the one with the largest velocity zone),
// each zone with its margin band. The hot zone drawn is that of
// Plan.GoverningHot, the point with the longest conservative hot zone; when
// it is not the governing point the sheet names it. Zones
// are clipped to the view frames, with a note saying how far they reach.
//
// # Labels
//
// Station labels never overlap one another or a mark. Each station gets its
// ID beside its mark where there is room, or on a leader line a little
// further out; failing that a key number listed in the label key; failing
// that a range label such as "N-20…N-35" for a run of neighbouring stations
// of one array; and the few left are listed in the notes as unlabelled
// (their positions are in the station table).
//
// Every label of the plan and the details keeps off the hatched regions
// (the zones, keep-outs and treatment) where a spot within about 10 mm of
// its mark is clear: the placer scores the free spots by distance, turn
// from the preferred side, hatch and nearness to another station's symbol,
// and a label away from its mark gets a leader. A label that may not move
// (an arc's angle) is left out rather than laid on the hatch.
//
// The cost per station stays the same however many crowd together: the
// placed labels and the symbols are found through a grid, and the symbols
// that crowd a cell of it beyond a few dozen through a tree that answers
// for a whole pile at once; a label whose anchor lies within 0.1 mm of
// one that found no spot on a leader does not search again (from the same
// anchor it would find none either).
//
// # Page coordinates
//
// Page coordinates are millimetres from the top-left corner of the sheet,
// x to the right and y down; font sizes are points. Plan and elevation
// views map cell-frame metres to the page in one place, [View]'s transform,
// with the view's scale denominator: 1 m is 1000/Scale mm on the page.
//
// # Text
//
// The core fonts print the cp1252 character set only. Every text is passed
// through a replacement table first (θ → "theta", ≥ → ">=", − → "-", …), so
// the model holds exactly what the PDF prints.
package sheet
