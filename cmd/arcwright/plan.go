package main

import (
	"errors"
	"fmt"
	"io"
	"math"
	"strings"

	"github.com/spf13/cobra"
	"github.com/spf13/pflag"

	"arcwright/internal/export"
	"arcwright/internal/jet"
	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
	"arcwright/internal/units"
)

// PlanOptions are the plan command's inputs.
type PlanOptions struct {
	Layout                      string
	JSON, CSV, GeoJSON, PDF     string
	AsBuiltTemplate             string
	Format, Paper, Scale, Units string
}

// AddFlags binds the options to fs.
func (o *PlanOptions) AddFlags(fs *pflag.FlagSet) {
	fs.StringVar(&o.PDF, "pdf", "", "write the floor layout sheet (PDF) to this file")
	fs.StringVar(&o.CSV, "csv", "", "write the station table (CSV) to this file")
	fs.StringVar(&o.JSON, "json", "", "write the whole plan (JSON) to this file")
	fs.StringVar(&o.GeoJSON, "geojson", "", "write stations, arcs, zones and obstacles (GeoJSON: WGS 84 with the layout's anchor, else the cell frame in metres) to this file")
	fs.StringVar(&o.AsBuiltTemplate, "as-built-template", "", "write the form for the positions measured after set-up (CSV: station IDs and the measured columns, empty) to this file")
	formatFlag(fs, &o.Format, "text", "json")
	fs.StringVar(&o.Paper, "paper", "", "sheet paper: A4 to A0, Letter, Tabloid, ANSI C to E or Arch A to E1 (default: the layout's, else A3)")
	fs.StringVar(&o.Scale, "scale", "", `plan scale: 1:50, or 1" = 20' on a feet-and-inches sheet (default: the layout's, else the largest standard scale that fits)`)
	unitsFlag(fs, &o.Units)
}

func newPlanCommand(stdout io.Writer) *cobra.Command {
	o := &PlanOptions{}
	c := &cobra.Command{
		Use:   "plan LAYOUT",
		Short: "Place every station, check it for every operating point, write the sheet and exports",
		Long: `Place every station of the layout's arrays, check each against every operating
point of the test matrix (clearance from the velocity and hot zones with the
margin, walls and wedges, obstacles, keep-out zones and other stands, line of
sight to the source region, far field, floor reflection, air absorption,
entrained inflow, buoyant plumes), and print a summary: stations ok, warned and
blocked, the governing operating point, automatic radii, and what blocks what.

--pdf writes the floor layout sheet; --paper and --scale choose its paper and
the plan's scale (ISO 5455 scales 1:1 to 1:5000 with 1:25 and 1:75; on a
feet-and-inches sheet also the architect's 1/4" = 1'-0" and the engineer's
1" = 20' kinds). A site too large for the paper is drawn cropped to its
stations, zones and nozzle. The sheet's date is the layout's title date;
without one the sheet says "not dated" and the PDF carries the fixed date
2000-01-01, so the same layout always gives the same bytes.

--csv, --json and --geojson write the exports (the CSV's lengths are in the
layout's unit system, like its reasons: metres in _m columns, or decimal feet
in _ft columns; the GeoJSON is in WGS 84 longitude and latitude when the
layout has an anchor, else in the local cell frame, which it says);
--as-built-template writes the
form for 'arcwright check --as-built': the station IDs under the measured
columns id, x, y, z, base_x, base_y, left empty to be filled in after set-up
(bare numbers in the layout's length unit). Every destination is checked
before planning: none may be the layout or another output, a directory or a
device. The files are written all or none: each goes to a temporary file
first, and they replace their targets only when every one was written (an
existing file keeps its permissions; a symbolic link is kept and its target
written). "-" writes that output to standard output instead of the summary;
the null device discards it. --format json prints the plan as JSON on
standard output instead of the summary.

Examples:
  arcwright plan layouts/anechoic-model-jet.yaml --pdf sheet.pdf
  arcwright plan layout.yaml --pdf sheet.pdf --csv stations.csv --geojson plan.geojson --paper Tabloid --scale 1:50

Exit status: 0 when the plan is made (blocked stations are part of the
answer; use 'arcwright check' as a gate), 1 on bad input or a failed write,
2 on a bad command line.`,
		Args: oneLayout,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.Layout = args[0]
			return runPlan(o, stdout)
		},
	}
	o.AddFlags(c.Flags())
	return c
}

// parseScale reads --scale: "1:50", "50" or a feet-and-inches scale such
// as 1" = 20'; "" is 0 (choose).
func parseScale(s string) (int, error) {
	if strings.TrimSpace(s) == "" {
		return 0, nil
	}
	n, err := sheet.ParseScale(s)
	if err != nil {
		return 0, usageError{fmt.Errorf("--scale %q is not a standard scale: want one of %s", s, sheet.ScaleNames())}
	}
	return n, nil
}

// checkPaper reads --paper; "" is fine (the layout's or A3).
func checkPaper(s string) error {
	if strings.TrimSpace(s) == "" {
		return nil
	}
	if _, err := sheet.ParsePaper(s); err != nil {
		return usageError{fmt.Errorf("--paper %q is not a paper size: want one of %s", s, sheet.PaperNames())}
	}
	return nil
}

func loadPlan(path, unitsOverride string, asBuilt string) (*planner.Plan, error) {
	req, err := loadRequest(path, unitsOverride)
	if err != nil {
		return nil, err
	}
	return planRequest(req, asBuilt)
}

// loadRequest reads the layout at path, in the unit system unitsOverride
// names ("" keeps the layout's).
func loadRequest(path, unitsOverride string) (*planner.Request, error) {
	req, _, err := layout.Load(path)
	if err != nil {
		return nil, err
	}
	switch unitsOverride {
	case "metric":
		req.Units = units.Metric
	case "imperial":
		req.Units = units.Imperial
	}
	if den := req.Sheet.Scale; den != 0 && sheet.CheckScale(den, req.Units) != nil {
		// --units switched the sheet's family: the layout's scale becomes
		// the largest of the new family not larger than it, so that a plan
		// that fitted still fits
		to := sameOrSmallerScale(den, req.Units)
		field, line := layout.SheetField(req)
		other := units.Metric
		if req.Units == units.Metric {
			other = units.Imperial
		}
		req.Sheet.Scale = to
		req.Notes = append(req.Notes, layout.Warning{File: req.Source, Line: line, Field: field,
			Msg: fmt.Sprintf("%s is a %s scale; with --units %s the sheet uses %s, the largest %s scale not larger than it",
				sheet.ScaleName(den, other), familyWords(other), unitsOverride, sheet.ScaleName(to, req.Units), familyWords(req.Units))}.String())
	}
	return req, nil
}

// familyWords names the scales of a unit system's sheets.
func familyWords(sys units.System) string {
	if sys == units.Imperial {
		return "feet-and-inches"
	}
	return "metric"
}

// sameOrSmallerScale returns the largest standard scale of the family of
// sheets in sys that is not larger than 1:den (the smallest denominator at
// least den), or the family's smallest scale when all are larger.
func sameOrSmallerScale(den int, sys units.System) int {
	best, smallest := 0, 0
	for _, d := range sheet.StandardScales() {
		if sheet.CheckScale(d, sys) != nil {
			continue
		}
		if d >= den && (best == 0 || d < best) {
			best = d
		}
		smallest = max(smallest, d)
	}
	if best == 0 {
		return smallest
	}
	return best
}

// planRequest plans req, with the as-built file asBuilt ("" none).
func planRequest(req *planner.Request, asBuilt string) (*planner.Plan, error) {
	var err error
	if asBuilt != "" {
		req.AsBuilt, err = layout.LoadAsBuilt(asBuilt, req)
		if err != nil {
			return nil, err
		}
	}
	p, err := planner.New(req)
	if errors.Is(err, planner.ErrAsBuilt) {
		// plan without the as-built file to name each unknown ID at its line
		req.AsBuilt = nil
		if q, qerr := planner.New(req); qerr == nil {
			ids := make([]string, len(q.Stations))
			for i, s := range q.Stations {
				ids[i] = s.ID
			}
			if lerr := layout.UnknownAsBuilt(asBuilt, ids); lerr != nil {
				return nil, lerr
			}
		}
		return nil, fmt.Errorf("%s: %w", asBuilt, err)
	}
	if err != nil {
		return nil, layout.Locate(req, err)
	}
	return p, nil
}

func runPlan(o *PlanOptions, w io.Writer) error {
	scale, err := parseScale(o.Scale)
	if err != nil {
		return err
	}
	if err := checkPaper(o.Paper); err != nil {
		return err
	}
	if o.PDF == "" && (o.Paper != "" || o.Scale != "") {
		return usageError{fmt.Errorf("--paper and --scale choose the sheet's paper and scale: give --pdf too")}
	}
	// every destination is checked before any work
	var p *planner.Plan
	var outs []export.Output
	toStdout := false
	add := func(label, path string, f func(io.Writer) error) {
		if path != "" {
			outs = append(outs, export.Output{Label: label, Path: path, Write: f})
			toStdout = toStdout || path == export.Stdout
		}
	}
	add("--pdf", o.PDF, func(b io.Writer) error {
		return sheet.Write(b, p, sheet.Options{Paper: o.Paper, Scale: scale})
	})
	add("--csv", o.CSV, func(b io.Writer) error { return export.CSV(b, p) })
	add("--json", o.JSON, func(b io.Writer) error { return export.JSON(b, p) })
	add("--geojson", o.GeoJSON, func(b io.Writer) error { return export.GeoJSON(b, p) })
	add("--as-built-template", o.AsBuiltTemplate, func(b io.Writer) error { return export.AsBuiltTemplate(b, p) })
	if toStdout && o.Format == "json" {
		return usageError{errors.New("--format json prints the plan on standard output, and so does an output given as -: choose one")}
	}
	ins := []export.Input{{Label: "the layout", Path: o.Layout}}
	if err := checkOutputs(outs, ins); err != nil {
		return err
	}
	req, err := loadRequest(o.Layout, o.Units)
	if err != nil {
		return err
	}
	// one family of scales per sheet: checked before planning
	if scale != 0 {
		if err := sheet.CheckScale(scale, req.Units); err != nil {
			return usageError{fmt.Errorf("--scale %q: %s", o.Scale, strings.TrimPrefix(err.Error(), sheet.ErrScale.Error()+": "))}
		}
	}
	if p, err = planRequest(req, ""); err != nil {
		return err
	}
	// every file is written to a temporary first: a failure leaves none
	if err := export.WriteFiles(outs, ins, w); err != nil {
		if errors.Is(err, export.ErrNoReader) {
			return usageError{err} // a destination of the command line
		}
		if (errors.Is(err, sheet.ErrScale) || errors.Is(err, sheet.ErrPaperRoom)) && o.Scale == "" && o.Paper == "" {
			// the layout's paper and scale: at their line and key
			return layout.LocateSheet(p.Request, err)
		}
		return layout.Locate(p.Request, err)
	}
	switch {
	case toStdout:
		return nil // standard output holds an export
	case o.Format == "json":
		return export.JSON(w, p)
	}
	planText(w, p)
	for _, out := range outs {
		fmt.Fprintf(w, "wrote %s\n", out.Path)
	}
	return nil
}

// checkOutputs checks the destinations of a run before any work: one that
// is an input, another output, a directory or a device is a bad command
// line; one that cannot be written is a failed write.
func checkOutputs(outs []export.Output, ins []export.Input) error {
	err := export.CheckOutputs(outs, ins)
	if errors.Is(err, export.ErrSamePath) || errors.Is(err, export.ErrNotRegular) {
		return usageError{err}
	}
	return err
}

// planText prints the plan's summary.
func planText(w io.Writer, p *planner.Plan) {
	req := p.Request
	sys := req.Units
	L := func(m float64) string { return units.FormatLength(m, sys) }
	conv := req.Convention
	fmt.Fprintf(w, "%s: %d stations — %d ok, %d warn, %d blocked\n", req.Source, len(p.Stations), p.OK, p.Warn, p.Blocked)
	fmt.Fprintf(w, "governing operating point: %s (largest conservative zones; the sheet draws it)\n", p.Points[p.Governing].Name)
	fmt.Fprintf(w, "polar angles %s (%s)\n\n", conv, conv.Symbol())

	fmt.Fprintln(w, "Operating points")
	tw := newTable(w, 0)
	fmt.Fprintln(tw, "  point\tNPR\tMj\tUj\tT0\tcore\tvelocity zone\thot zone\tcollector\t")
	for _, pt := range p.Points {
		zone := func(e *jet.Envelope) string {
			if e.Length == 0 {
				return "none"
			}
			return fmt.Sprintf("%s × %s", units.FormatLengthApprox(e.Length, sys), units.FormatLengthApprox(2*e.MaxRadius, sys))
		}
		fmt.Fprintf(tw, "  %s\t%.4g\t%.3f\t%s\t%s\t%s\t%s\t%s\t%s\t\n", pt.Name, pt.Condition.Primary.NPR, pt.Exit.Mach,
			units.FormatVelocity(pt.Exit.Velocity, sys), units.FormatTemperature(pt.Exit.TotalTemperature, sys),
			L(pt.CoreNominal), zone(pt.Velocity()), zone(pt.Hot()), pt.Capture)
	}
	tw.Flush()
	fmt.Fprintln(w, "  zones: conservative, length × width, for clearances")

	fmt.Fprintln(w, "\nArrays")
	for _, a := range p.Arrays {
		fmt.Fprintf(w, "  %s (%s, %d %s)", a.Name, a.Kind, a.Stations, plural(a.Stations, "station", "stations"))
		switch a.Kind {
		case planner.Arc:
			how := "as given"
			if a.Auto {
				how = "chosen: the largest the room allows"
			}
			fmt.Fprintf(w, ": radius %s, %s\n", L(a.Radius), how)
			if a.FarField[0] <= a.FarField[1] {
				fmt.Fprintf(w, "      far-field radii %s to %s: %s\n", L(a.FarField[0]), L(a.FarField[1]), a.FarFieldNote)
			} else {
				fmt.Fprintf(w, "      far-field radii: %s\n", a.FarFieldNote)
			}
			if !math.IsNaN(a.MinClearPolar) {
				fmt.Fprintf(w, "      closest angle to the jet that clears the zones at this radius: %s %.1f°\n", conv.Symbol(), a.MinClearPolar*180/math.Pi)
			} else {
				fmt.Fprintln(w, "      no angle clears the zones at this radius")
			}
		case planner.Line:
			fmt.Fprintf(w, ": %s from the axis\n", L(a.Radius))
		case planner.Ring:
			fmt.Fprintf(w, ": %s from the axis\n", L(a.Radius))
		default:
			fmt.Fprintln(w)
		}
		for _, n := range a.Notes {
			fmt.Fprintln(w, "      note: "+n)
		}
		for _, b := range a.Blocked {
			fmt.Fprintln(w, "      blocked: "+b)
		}
	}

	// stations that are not ok, runs with the same leading problem together
	type run struct {
		first, last *planner.Station
		n           int
	}
	var runs []run
	key := func(s *planner.Station) string {
		for _, c := range s.Checks {
			if c.Verdict == s.Status {
				return s.Status.String() + "/" + c.Name + "/" + s.Array
			}
		}
		return ""
	}
	for i := range p.Stations {
		s := &p.Stations[i]
		if s.Status == planner.OK {
			continue
		}
		if k := len(runs) - 1; k >= 0 && runs[k].last == &p.Stations[i-1] && key(runs[k].first) == key(s) {
			runs[k].last, runs[k].n = s, runs[k].n+1
			continue
		}
		runs = append(runs, run{first: s, last: s, n: 1})
	}
	if len(runs) > 0 {
		fmt.Fprintln(w, "\nStations that are not ok (the leading reason of the first of each run; the sheet and exports list every reason)")
		tw = newTable(w, 0)
		for _, r := range runs {
			ids := r.first.ID
			if r.n > 1 {
				ids += " to " + r.last.ID
			}
			more := ""
			if k := len(r.first.Reasons) - 1; k > 0 {
				more = fmt.Sprintf(" (+%d more)", k)
			}
			fmt.Fprintf(tw, "  %s\t%s\t%s%s\t\n", ids, r.first.Status, r.first.Reasons[0], more)
		}
		tw.Flush()
	}
	planNoiseText(w, p)
	if len(p.Warnings) > 0 {
		fmt.Fprintln(w, "\nWarnings")
		for _, s := range p.Warnings {
			fmt.Fprintln(w, "  - "+s)
		}
	}
}
