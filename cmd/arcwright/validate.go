package main

import (
	"errors"
	"fmt"
	"io"
	"math"
	"strings"

	"github.com/spf13/cobra"

	"arcwright/internal/export"
	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
	"arcwright/internal/units"
)

func newValidateCommand(stdout io.Writer) *cobra.Command {
	return &cobra.Command{
		Use:   "validate LAYOUT",
		Short: "Check a layout file and summarise it",
		Long: `Read a layout file, check every key, unit, polygon, height, name and
reference in it, and print a short summary: the cell, the nozzle, the
operating points and the arrays with the stations they ask for. Every problem
found is printed with its file, line and key, all of them in one run.

The stations are then placed and checked, and the sheet and the exports
made, as 'arcwright plan' does, so that a layout that validates also plans:
an automatic radius that fits nowhere or a station ID used twice is reported
here, at its line and key.

Every command that reads a layout checks it the same way first.

Exit status: 0 when the layout is valid, 1 otherwise, 2 on a bad command line.`,
		Args: oneLayout,
		RunE: func(cmd *cobra.Command, args []string) error {
			req, warnings, err := layout.Load(args[0])
			if err != nil {
				return err
			}
			more, err := planCheck(req)
			if err != nil {
				return err
			}
			return summary(stdout, req, append(warnings, more...))
		},
	}
}

// planCheck plans req and writes the sheet and every export to nowhere,
// so that validate refuses whatever plan would refuse, at the line and key
// of the layout. A sheet that does not fit the layout's paper and scale is
// a warning: plan --pdf can choose others with --paper and --scale.
func planCheck(req *planner.Request) ([]layout.Warning, error) {
	p, err := planner.New(req)
	if err != nil {
		return nil, layout.Locate(req, err)
	}
	var warns []layout.Warning
	if err := sheet.Write(io.Discard, p, sheet.Options{}); errors.Is(err, sheet.ErrScale) || errors.Is(err, sheet.ErrPaperRoom) {
		field, line := layout.SheetField(req)
		warns = append(warns, layout.Warning{File: req.Source, Line: line, Field: field, Msg: strings.TrimPrefix(err.Error(), "sheet: ") + " (plan --pdf refuses it without --paper or --scale)"})
	} else if err != nil {
		return nil, layout.Locate(req, err)
	}
	for _, write := range []func(io.Writer, *planner.Plan) error{export.CSV, export.JSON, export.GeoJSON} {
		if err := write(io.Discard, p); err != nil {
			return nil, layout.Locate(req, err)
		}
	}
	return warns, nil
}

// summary prints what a layout holds.
func summary(w io.Writer, req *planner.Request, warnings []layout.Warning) error {
	sys := req.Units
	L := func(m float64) string { return units.FormatLength(m, sys) }
	fmt.Fprintf(w, "%s: valid\n", req.Source)
	if req.Title.Title != "" {
		fmt.Fprintf(w, "  %s — %s\n", req.Title.Title, req.Title.Facility)
	}
	tw := newTable(w, 0)
	cell := &req.Cell
	size := "open site, no boundary"
	if cell.Bounded() {
		b := cell.Extent()
		size = fmt.Sprintf("%s × %s in plan", units.FormatLengthApprox(b.Max[0]-b.Min[0], sys), units.FormatLengthApprox(b.Max[1]-b.Min[1], sys))
	}
	ceiling := "open sky"
	if !math.IsInf(cell.Ceiling, 1) {
		ceiling = units.FormatLengthApprox(cell.Ceiling, sys) + " ceiling"
	}
	fmt.Fprintf(tw, "  cell\t%s, %s, %s, %s floor\t\n", cell.Kind, size, ceiling, cell.Floor)
	count := func(n int, one, many string) string { return fmt.Sprintf("%d %s", n, plural(n, one, many)) }
	fmt.Fprintf(tw, "  \t%s, %s, %s\t\n", count(len(cell.Obstacles), "obstacle", "obstacles"), count(len(cell.KeepOuts), "keep-out zone", "keep-out zones"), count(len(cell.Marks), "floor mark", "floor marks"))
	if col := cell.Collector; col != nil {
		fmt.Fprintf(tw, "  collector\tinlet Ø %s at X %s Y %s, %s downstream of the exit\t\n", L(col.Diameter), L(col.Inlet.X), L(col.Inlet.Y), L(req.Exit.ToJet(col.Inlet).X))
	} else {
		fmt.Fprintf(tw, "  collector\tnone\t\n")
	}
	n := req.Nozzle
	e := req.Exit.Exit
	fmt.Fprintf(tw, "  nozzle\t%s, D %s, exit at X %s Y %s, axis %s above the floor, heading %.1f°\t\n",
		n.Kind, L(n.EquivalentDiameter()), L(e.X), L(e.Y), L(e.Z), req.Exit.Heading*180/math.Pi)
	fmt.Fprintf(tw, "  polar angles\t%s\t\n", req.Convention)
	fmt.Fprintf(tw, "  band\t%s to %s\t\n", units.FormatFrequency(req.Band.Low), units.FormatFrequency(req.Band.High))
	for i, c := range req.Points {
		label := ""
		if i == 0 {
			label = "  operating points"
		}
		t0 := "T0/Ta " + fmt.Sprintf("%.3g", c.Primary.TemperatureRatio)
		if c.Primary.TotalTemperature > 0 {
			t0 = "T0 " + units.FormatTemperature(c.Primary.TotalTemperature, sys)
		}
		fmt.Fprintf(tw, "%s\t%s: NPR %.4g, %s\t\n", label, c.Name, c.Primary.NPR, t0)
	}
	total := 0
	for i, a := range req.Arrays {
		label := ""
		if i == 0 {
			label = "  arrays"
		}
		k := a.Count()
		total += k
		what := plural(k, "station", "stations")
		if a.Kind == planner.Probes {
			what = plural(k, "probe stand", "probe stands")
		}
		radius := ""
		switch {
		case a.Kind == planner.Arc && a.AutoRadius:
			radius = ", radius chosen automatically"
		case a.Kind == planner.Arc:
			radius = ", radius " + L(a.Radius)
		}
		fmt.Fprintf(tw, "%s\t%s: %s, %d %s to place%s\t\n", label, a.Name, a.Kind, k, what, radius)
	}
	fmt.Fprintf(tw, "  in all\t%d %s\t\n", total, plural(total, "station", "stations"))
	if err := tw.Flush(); err != nil {
		return err
	}
	for _, wn := range warnings {
		fmt.Fprintln(w, "warning: "+wn.String())
	}
	return nil
}
