package main

import (
	"errors"
	"fmt"
	"io"
	"math"
	"sort"
	"strings"
	"text/tabwriter"

	"github.com/spf13/cobra"
	"github.com/spf13/pflag"

	"arcwright/internal/export"
	"arcwright/internal/jet"
	"arcwright/internal/layout"
	"arcwright/internal/units"
)

// PlumeOptions are the plume command's inputs.
type PlumeOptions struct {
	Layout, Point                       string
	Nozzle                              string
	Diameter, DesignMach, AspectRatio   float64
	NPR, TotalTemperature, TempRatio    float64
	SecondaryNPR, SecondaryTotal        float64
	SecondaryRatio, SecondaryDiameter   float64
	Gamma, GasConstant                  float64
	AmbientTemperature, AmbientPressure float64
	VelocityLimit, TemperatureLimit     float64
	At                                  []float64
	Format, Units                       string

	flags map[string]*quantityFlag
}

// AddFlags binds the options to fs.
func (o *PlumeOptions) AddFlags(fs *pflag.FlagSet) {
	o.flags = map[string]*quantityFlag{}
	q := func(name string, dim units.Dim, bare string, v *float64, def string, r layout.Range, usage string) {
		f := newQuantity(dim, bare, v, def)
		f.plausible = &r
		switch dim {
		case units.Length:
			f.doubt = doubtful(0, 20, "m")
		case units.Temperature:
			f.doubt = doubtful(150, 5000, "K")
		case units.Pressure:
			f.doubt = doubtful(10e3, 10e6, "Pa")
		}
		o.flags[name] = f
		fs.Var(f, name, usage)
	}
	fs.StringVar(&o.Layout, "layout", "", "read the nozzle, ambient and limits from this layout file")
	fs.StringVar(&o.Point, "point", "", "with --layout: the operating point to predict")
	fs.Var(newChoice(&o.Nozzle, "convergent", "convergent", "cd", "rectangular", "coaxial"), "nozzle", "nozzle kind: convergent, cd (convergent-divergent), rectangular, coaxial")
	q("diameter", units.Length, "", &o.Diameter, "", layout.NozzleSizeRange, "exit diameter (area-equivalent for rectangular, primary for coaxial), e.g. 50.8mm or 2in")
	fs.Var(newNumber(&o.DesignMach, 0, layout.DesignMachRange), "design-mach", "design Mach number of a cd nozzle (also rectangular cd), "+layout.DesignMachRange.Want())
	fs.Var(newNumber(&o.AspectRatio, 1, layout.AspectRatioRange), "aspect-ratio", "width over height of a rectangular exit, "+layout.AspectRatioRange.Want())
	fs.Var(newNumber(&o.NPR, 0, layout.NPRRange), "npr", "nozzle pressure ratio, total over ambient pressure, "+layout.NPRRange.Want())
	q("total-temperature", units.Temperature, "", &o.TotalTemperature, "", layout.TotalTemperatureRange, "total temperature, e.g. 800K or 527C")
	fs.Var(newNumber(&o.TempRatio, 0, layout.TemperatureRatioRange), "temperature-ratio", "total temperature over ambient (1 for an unheated jet), "+layout.TemperatureRatioRange.Want()+"; instead of --total-temperature")
	fs.Var(newNumber(&o.SecondaryNPR, 0, layout.NPRRange), "secondary-npr", "coaxial: nozzle pressure ratio of the secondary stream")
	q("secondary-total-temperature", units.Temperature, "", &o.SecondaryTotal, "", layout.TotalTemperatureRange, "coaxial: total temperature of the secondary stream")
	fs.Var(newNumber(&o.SecondaryRatio, 0, layout.TemperatureRatioRange), "secondary-temperature-ratio", "coaxial: total-temperature ratio of the secondary stream")
	q("secondary-diameter", units.Length, "", &o.SecondaryDiameter, "", layout.NozzleSizeRange, "coaxial: outer diameter of the secondary annulus")
	fs.Var(newNumber(&o.Gamma, jet.GammaAir, layout.GammaRange), "gamma", "ratio of specific heats of the jet gas (about 1.33–1.35 for combustion products)")
	fs.Var(newNumber(&o.GasConstant, jet.RAir, layout.GasConstantRange), "gas-constant", "gas constant of the jet gas, J/(kg K)")
	q("ambient-temperature", units.Temperature, "", &o.AmbientTemperature, "15C", layout.AmbientTempRange, "ambient temperature")
	q("ambient-pressure", units.Pressure, "", &o.AmbientPressure, "101.325kPa", layout.AmbientPressureRange, "ambient pressure")
	q("velocity-limit", units.Velocity, "", &o.VelocityLimit, "5m/s", layout.VelocityLimitRange, "mean velocity that bounds the velocity zone")
	q("temperature-limit", units.Temperature, "", &o.TemperatureLimit, "50C", layout.TempLimitRange, "temperature that bounds the hot zone")
	fs.Var(&quantityList{dim: units.Length, values: &o.At, plausible: &layout.DistanceRange}, "at", "extra axial distances for the profile table, e.g. 0.5m,1m,2m")
	formatFlag(fs, &o.Format, "text", "json", "csv")
	unitsFlag(fs, &o.Units)
}

func newPlumeCommand(stdout io.Writer) *cobra.Command {
	o := &PlumeOptions{}
	c := &cobra.Command{
		Use:   "plume",
		Short: "Predict the exit state, core, decay and zones of one jet",
		Long: `Predict one jet at one operating point: the fully expanded exit state, the
potential core, the mixing layer, the centreline decay of velocity and
temperature, and the zones where the mean velocity or temperature is above a
limit (the conservative zones that clearances use, and the nominal ones).

Give the nozzle and the operating point with flags, or name a layout and one of
its operating points with --layout and --point. Quantities take units: 50.8mm,
2in, 800K, 527C, 101.3kPa, 5m/s; a bare number is SI.

Examples:
  arcwright plume --diameter 50.8mm --npr 1.86 --total-temperature 800K
  arcwright plume --nozzle cd --design-mach 1.5 --diameter 2in --npr 3.67 --temperature-ratio 1
  arcwright plume --layout layouts/anechoic-model-jet.yaml --point HS-090 --format json

Exit status: 0 on success, 1 on bad input, 2 on a bad command line.`,
		Args: noArgs,
		RunE: func(cmd *cobra.Command, args []string) error {
			return runPlume(o, cmd.Flags(), stdout)
		},
	}
	o.AddFlags(c.Flags())
	return c
}

// plumeInputs turns the options into a nozzle, a condition and limits.
func plumeInputs(o *PlumeOptions, fs *pflag.FlagSet) (jet.Nozzle, jet.Condition, jet.Limits, units.System, error) {
	sys := units.Metric
	if o.Layout == "" && o.Point != "" {
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{errors.New("--point names an operating point of a layout: give --layout too")}
	}
	if o.Layout != "" {
		var ignored []string
		for _, name := range []string{"nozzle", "diameter", "design-mach", "aspect-ratio", "npr", "total-temperature", "temperature-ratio",
			"secondary-npr", "secondary-total-temperature", "secondary-temperature-ratio", "secondary-diameter", "gamma", "gas-constant",
			"ambient-temperature", "ambient-pressure"} {
			if fs.Changed(name) {
				ignored = append(ignored, "--"+name)
			}
		}
		if len(ignored) > 0 {
			return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{fmt.Errorf("%s would be ignored: with --layout the nozzle, the operating point and the ambient come from the layout", strings.Join(ignored, ", "))}
		}
	}
	if o.Layout != "" {
		req, _, err := layout.Load(o.Layout)
		if err != nil {
			return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, err
		}
		sys = req.Units
		if o.Point == "" {
			return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{fmt.Errorf("--layout needs --point: one of %s", pointNames(req.Points))}
		}
		for _, c := range req.Points {
			if c.Name == o.Point {
				c.Ambient = req.Ambient.JetAmbient()
				lim := req.Limits
				jl := jet.DefaultLimits()
				if lim.Velocity > 0 {
					jl.Velocity = lim.Velocity
				}
				if lim.Temperature > 0 {
					jl.Temperature = lim.Temperature
				}
				if fs.Changed("velocity-limit") {
					jl.Velocity = o.VelocityLimit
				}
				if fs.Changed("temperature-limit") {
					jl.Temperature = o.TemperatureLimit
				}
				return req.Nozzle, c, jl, sys, nil
			}
		}
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{fmt.Errorf("--point: no operating point named %q in %s; the layout has %s", o.Point, o.Layout, pointNames(req.Points))}
	}
	missing := func(name, what string) error {
		return usageError{fmt.Errorf("--%s is required: %s", name, what)}
	}
	if !fs.Changed("diameter") {
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, missing("diameter", "the exit diameter, e.g. --diameter 50.8mm (or give --layout and --point)")
	}
	if !fs.Changed("npr") {
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, missing("npr", "the nozzle pressure ratio, e.g. --npr 1.86")
	}
	if fs.Changed("total-temperature") == fs.Changed("temperature-ratio") {
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{errors.New("give exactly one of --total-temperature and --temperature-ratio (1 for an unheated jet)")}
	}
	gas := jet.Gas{Gamma: o.Gamma, R: o.GasConstant}
	for _, r := range []struct {
		flag, nozzle string
	}{{"design-mach", "cd or rectangular"}, {"aspect-ratio", "rectangular"}, {"secondary-npr", "coaxial"}, {"secondary-diameter", "coaxial"},
		{"secondary-total-temperature", "coaxial"}, {"secondary-temperature-ratio", "coaxial"}} {
		if fs.Changed(r.flag) && !strings.Contains(r.nozzle, o.Nozzle) {
			return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{fmt.Errorf("--%s is for --nozzle %s, not %s", r.flag, r.nozzle, o.Nozzle)}
		}
	}
	switch {
	case o.Nozzle == "cd" && !fs.Changed("design-mach"):
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, missing("design-mach", "the design Mach number of the convergent-divergent nozzle, e.g. --design-mach 1.5")
	case o.Nozzle == "coaxial" && (!fs.Changed("secondary-npr") || !fs.Changed("secondary-diameter")):
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, missing("secondary-npr and --secondary-diameter", "a coaxial nozzle needs its secondary stream and annulus")
	case o.Nozzle == "coaxial" && fs.Changed("secondary-total-temperature") == fs.Changed("secondary-temperature-ratio"):
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{errors.New("give exactly one of --secondary-total-temperature and --secondary-temperature-ratio")}
	case o.Nozzle == "coaxial" && !(o.SecondaryDiameter > o.Diameter):
		// the annulus surrounds the primary nozzle: in the flags as typed
		return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{fmt.Errorf("--secondary-diameter %s must exceed --diameter %s: it is the outer diameter of the annulus around the primary nozzle",
			fs.Lookup("secondary-diameter").Value, fs.Lookup("diameter").Value)}
	}
	n := jet.Nozzle{Diameter: o.Diameter}
	switch o.Nozzle {
	case "convergent":
		n.Kind = jet.Convergent
	case "cd":
		n.Kind, n.DesignMach = jet.ConvergentDivergent, o.DesignMach
	case "rectangular":
		if o.AspectRatio < 1 {
			return jet.Nozzle{}, jet.Condition{}, jet.Limits{}, 0, usageError{fmt.Errorf("--aspect-ratio must be at least 1 (width over height), got %g", o.AspectRatio)}
		}
		n = jet.RectangularFromAspect(o.Diameter, o.AspectRatio, o.DesignMach)
	case "coaxial":
		n.Kind, n.SecondaryDiameter = jet.Coaxial, o.SecondaryDiameter
	}
	c := jet.Condition{
		Name:    "flags",
		Primary: jet.Stream{NPR: o.NPR, TotalTemperature: o.TotalTemperature, TemperatureRatio: o.TempRatio, Gas: gas},
		Ambient: jet.Ambient{Pressure: o.AmbientPressure, Temperature: o.AmbientTemperature},
	}
	if n.Kind == jet.Coaxial {
		c.Secondary = &jet.Stream{NPR: o.SecondaryNPR, TotalTemperature: o.SecondaryTotal, TemperatureRatio: o.SecondaryRatio}
	}
	if o.Units == "imperial" {
		sys = units.Imperial
	}
	return n, c, jet.Limits{Velocity: o.VelocityLimit, Temperature: o.TemperatureLimit}, sys, nil
}

// flagOf names the command-line flag behind a model input.
var flagOf = map[string]string{
	"nozzle pressure ratio":             "--npr",
	"total temperature":                 "--total-temperature",
	"total-temperature ratio":           "--temperature-ratio",
	"ratio of specific heats":           "--gamma",
	"gas constant":                      "--gas-constant",
	"nozzle diameter":                   "--diameter",
	"nozzle width":                      "--diameter",
	"nozzle height":                     "--diameter",
	"design Mach number":                "--design-mach",
	"secondary diameter":                "--secondary-diameter",
	"secondary stream":                  "--secondary-npr",
	"secondary nozzle pressure ratio":   "--secondary-npr",
	"secondary total temperature":       "--secondary-total-temperature",
	"secondary total-temperature ratio": "--secondary-temperature-ratio",
	"ambient pressure":                  "--ambient-pressure",
	"ambient temperature":               "--ambient-temperature",
	"velocity limit":                    "--velocity-limit",
	"temperature limit":                 "--temperature-limit",
}

func runPlume(o *PlumeOptions, fs *pflag.FlagSet, w io.Writer) error {
	n, c, lim, sys, err := plumeInputs(o, fs)
	if err != nil {
		return err
	}
	if o.Units == "imperial" {
		sys = units.Imperial
	} else if o.Units == "metric" {
		sys = units.Metric
	}
	p, err := jet.NewPlume(n, c, lim)
	if err != nil {
		var ie *jet.InputError
		if o.Layout == "" && errors.As(err, &ie) {
			if f, ok := flagOf[ie.Field]; ok { // a bad combination of flags
				return usageError{fmt.Errorf("%s: %s %s", f, ie.Field, ie.Reason)}
			}
		}
		return err
	}
	xs := profileStations(p, o.At)
	switch o.Format {
	case "json":
		return export.PlumeJSON(w, p, xs)
	case "csv":
		return export.PlumeCSV(w, p, xs)
	}
	return plumeText(w, p, xs, sys)
}

// profileStations returns the axial distances of the profile table: round
// multiples of Dj, the end of the core and the user's extra distances.
func profileStations(p *jet.Plume, at []float64) []float64 {
	dj := p.Exit().FullyExpandedDiameter
	xs := []float64{p.CoreLength(jet.Nominal)}
	for _, k := range []float64{0, 1, 2, 4, 6, 8, 10, 15, 20, 30, 50, 100} {
		xs = append(xs, k*dj)
	}
	xs = append(xs, at...)
	sort.Float64s(xs)
	out := xs[:0]
	for i, x := range xs {
		if i == 0 || x-out[len(out)-1] > 1e-9*dj {
			out = append(out, x)
		}
	}
	return out
}

func pointNames(points []jet.Condition) string {
	var names []string
	for _, c := range points {
		names = append(names, c.Name)
	}
	return strings.Join(names, ", ")
}

func plumeText(w io.Writer, p *jet.Plume, xs []float64, sys units.System) error {
	e := p.Exit()
	n := p.Nozzle()
	c := p.Condition()
	L := func(m float64) string { return units.FormatLength(m, sys) }
	T := func(k float64) string { return units.FormatTemperature(k, sys) }
	V := func(v float64) string { return units.FormatVelocity(v, sys) }
	fmt.Fprintf(w, "%s nozzle, D %s, NPR %.4g, T0 %s; ambient %s, %s\n\n", n.Kind, L(e.Diameter), c.Primary.NPR, T(e.TotalTemperature), T(c.Ambient.Temperature), units.FormatPressure(c.Ambient.Pressure, sys))
	tw := newTable(w, 0)
	fmt.Fprintln(tw, "Fully expanded exit state\t")
	fmt.Fprintf(tw, "  Mach number Mj\t%.3f\t(exit plane %.3f, design %.3g, %s)\n", e.Mach, e.ExitMach, e.DesignMach, e.Expansion)
	fmt.Fprintf(tw, "  velocity Uj\t%s\t\n", V(e.Velocity))
	fmt.Fprintf(tw, "  static temperature Tj\t%s\t\n", T(e.StaticTemperature))
	fmt.Fprintf(tw, "  density\t%.4g kg/m³\t(%.3g of ambient)\n", e.Density, e.DensityRatio)
	fmt.Fprintf(tw, "  diameter Dj\t%s\t(Thring–Newby effective %s)\n", L(e.FullyExpandedDiameter), L(e.EffectiveDiameter))
	fmt.Fprintf(tw, "  acoustic Mach Uj/a∞\t%.3f\t\n", e.AcousticMach)
	fmt.Fprintf(tw, "  convective Mach\t%.3f\t\n", e.ConvectiveMach)
	fmt.Fprintf(tw, "  Reynolds number\t%.3g\t\n", e.Reynolds)
	fmt.Fprintf(tw, "  mass flow\t%.4g kg/s\t(thrust %.4g N)\n", e.MassFlow, e.Thrust)
	if e.ShockCellSpacing > 0 {
		fmt.Fprintf(tw, "  shock-cell spacing\t%s\t(vortex-sheet %s)\n", L(e.ShockCellSpacing), L(e.ShockCellSpacingUpper))
	}
	dj := e.FullyExpandedDiameter
	fmt.Fprintf(tw, "Potential core\t%s\t(%.2f Dj nominal; %s, %.2f Dj, for clearances)\n", L(p.CoreLength(jet.Nominal)), p.CoreLength(jet.Nominal)/dj, L(p.CoreLength(jet.Conservative)), p.CoreLength(jet.Conservative)/dj)
	tw.Flush()

	fmt.Fprintln(w, "\nCentreline and mixing layer (nominal)")
	tw = newTable(w, tabwriter.AlignRight)
	fmt.Fprintln(tw, "x\tx/Dj\tUc\tUc/Uj\tr½\tT static\tT total\tcore radius\tlayer edge (1 %)\t")
	for _, x := range xs {
		ml := p.MixingLayer(x)
		fmt.Fprintf(tw, "%s\t%.1f\t%s\t%.3f\t%s\t%s\t%s\t%s\t%s\t\n", L(x), x/dj, V(p.CenterlineVelocity(x)), p.CenterlineVelocity(x)/e.Velocity,
			L(p.HalfVelocityRadius(x)), T(p.CenterlineTemperature(x)), T(p.TotalTemperature(x, 0)), L(ml.Inner), L(ml.Outer))
	}
	tw.Flush()

	lim := p.Limits()
	fmt.Fprintln(w, "\nZones")
	tw = newTable(w, 0)
	fmt.Fprintln(tw, "  zone\tlimit\tlength\twidest radius\tat x\t")
	for _, z := range []struct {
		name  string
		zone  jet.Zone
		v     jet.Variant
		limit string
	}{
		{"velocity, conservative (for clearances)", jet.VelocityZone, jet.Conservative, V(lim.Velocity)},
		{"velocity, nominal", jet.VelocityZone, jet.Nominal, V(lim.Velocity)},
		{"hot, conservative (for clearances)", jet.HotZone, jet.Conservative, T(lim.Temperature)},
		{"hot, nominal", jet.HotZone, jet.Nominal, T(lim.Temperature)},
	} {
		en := p.Envelope(z.zone, z.v)
		if en.Length == 0 {
			fmt.Fprintf(tw, "  %s\t%s\tnone\t\t\t\n", z.name, z.limit)
			continue
		}
		A := func(m float64) string { return units.FormatLengthApprox(m, sys) }
		fmt.Fprintf(tw, "  %s\t%s\t%s\t%s\t%s\t\n", z.name, z.limit, A(en.Length), A(en.MaxRadius), A(en.MaxRadiusAt))
	}
	tw.Flush()
	fmt.Fprintln(w, "  Mean-flow zones: gusts exceed the mean. Keep people, stands and cables out of them during runs.")
	if b := p.Buoyancy(); !math.IsInf(b.MomentumLength, 1) {
		fmt.Fprintf(w, "\nBuoyancy: momentum length %s; momentum-dominated to about %s (Chen & Rodi 1980)\n", units.FormatLengthApprox(b.MomentumLength, sys), units.FormatLengthApprox(b.Onset, sys))
	}
	if fl := p.Flags(); len(fl) > 0 {
		fmt.Fprintln(w, "\nWarnings")
		for _, f := range fl {
			fmt.Fprintln(w, "  - "+f.String())
		}
	}
	return nil
}
