package main

import (
	"encoding/csv"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"strconv"
	"strings"
	"text/tabwriter"
	"unicode"

	"github.com/spf13/cobra"
	"github.com/spf13/pflag"

	"arcwright/internal/acoustics"
	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// AirOptions are the air command's inputs.
type AirOptions struct {
	Temperature, Humidity, Pressure float64
	From, To                        float64
	Distances                       []float64
	Format                          string
}

// AddFlags binds the options to fs.
func (o *AirOptions) AddFlags(fs *pflag.FlagSet) {
	temp := newQuantity(units.Temperature, "", &o.Temperature, "")
	temp.doubt = doubtful(150, 400, "K")
	temp.plausible = &layout.AmbientTempRange
	fs.Var(temp, "temperature", "air temperature, e.g. 20C (without a layout)")
	hum := newQuantity(units.Fraction, "%", &o.Humidity, "")
	hum.doubt = func(v float64) string {
		if v <= 0.01 {
			return strconv.FormatFloat(100*v, 'g', 4, 64) + " % relative humidity (a bare number is in percent)"
		}
		return ""
	}
	hum.plausible = &layout.Range{What: "relative humidity", Min: 0, Max: 1, Show: func(v float64) string { return strconv.FormatFloat(100*v, 'g', 4, 64) + " %" }}
	fs.Var(&percentFlag{hum}, "humidity", "relative humidity in percent, e.g. 70% (without a layout)")
	pres := newQuantity(units.Pressure, "", &o.Pressure, "101.325kPa")
	pres.doubt = doubtful(10e3, 200e3, "Pa")
	pres.plausible = &layout.AmbientPressureRange
	fs.Var(pres, "pressure", "air pressure (without a layout)")
	fs.Var(newQuantity(units.Frequency, "", &o.From, "50Hz"), "from", "lowest band centre (without a layout)")
	fs.Var(newQuantity(units.Frequency, "", &o.To, "100kHz"), "to", "highest band centre (without a layout)")
	fs.Var(&quantityList{dim: units.Length, values: &o.Distances, plausible: &layout.DistanceRange}, "distance", "paths to give the loss over, e.g. 3m,5m (without a layout)")
	formatFlag(fs, &o.Format, "text", "csv", "json")
}

func newAirCommand(stdout io.Writer) *cobra.Command {
	o := &AirOptions{}
	c := &cobra.Command{
		Use:   "air [LAYOUT]",
		Short: "Tabulate atmospheric absorption over the band of interest (ISO 9613-1)",
		Long: `Tabulate the pure-tone atmospheric absorption of ISO 9613-1:1993 at the exact
base-ten centre of every 1/3-octave band (labelled with its nominal name), in
dB/m, and the loss over each array's path: the table used to correct measured
spectra to lossless.

With a layout, the ambient air, the band of interest and the arrays come from
it (the arrays are placed first, so automatic radii are known). Without one,
give --temperature and --humidity (and optionally --pressure, --from, --to and
--distance).

Examples:
  arcwright air layouts/anechoic-model-jet.yaml
  arcwright air --temperature 20C --humidity 70% --from 1kHz --to 80kHz --distance 3m,5m --format csv

Exit status: 0 on success, 1 on bad input, 2 on a bad command line.`,
		Args: atMostOne("layout file"),
		RunE: func(cmd *cobra.Command, args []string) error {
			return runAir(o, cmd.Flags(), args, stdout)
		},
	}
	o.AddFlags(c.Flags())
	return c
}

func runAir(o *AirOptions, fs *pflag.FlagSet, args []string, w io.Writer) error {
	var tab airTable
	if len(args) == 1 {
		for _, f := range []string{"temperature", "humidity", "pressure", "from", "to", "distance"} {
			if fs.Changed(f) {
				return usageError{fmt.Errorf("--%s is for use without a layout; the layout sets it", f)}
			}
		}
		req, _, err := layout.Load(args[0])
		if err != nil {
			return err
		}
		plan, err := planner.New(req)
		if err != nil {
			return layout.Locate(req, err)
		}
		tab = airFromPlan(plan)
	} else {
		if !fs.Changed("temperature") || !fs.Changed("humidity") {
			return usageError{errors.New("give --temperature and --humidity (absorption depends strongly on both), or a layout file")}
		}
		atm := acoustics.Atmosphere{Temperature: o.Temperature, RelativeHumidity: 100 * o.Humidity, Pressure: o.Pressure}
		if err := atm.Validate(); err != nil {
			return fmt.Errorf("--temperature %s, --humidity %s, --pressure %s: %w", units.FormatTemperature(atm.Temperature, units.Metric),
				strconv.FormatFloat(atm.RelativeHumidity, 'g', 4, 64)+" %", units.FormatPressure(atm.Pressure, units.Metric), err)
		}
		bands, err := acoustics.ThirdOctaveBands(o.From, o.To)
		if err != nil {
			return fmt.Errorf("--from/--to: %w", err)
		}
		tab = airTable{Atmosphere: atm, Paths: []airPath{}, Rows: []airRow{}}
		for _, d := range o.Distances {
			tab.Paths = append(tab.Paths, airPath{Label: units.FormatLength(d, units.Metric), Metres: d})
		}
		for _, b := range bands {
			row := airRow{Nominal: b.Nominal, Centre: b.Centre, PerM: atm.Absorption(b.Centre), Loss: []float64{}}
			for _, d := range o.Distances {
				row.Loss = append(row.Loss, row.PerM*d)
			}
			tab.Rows = append(tab.Rows, row)
		}
	}
	switch o.Format {
	case "csv":
		return airCSV(w, tab)
	case "json":
		a := tab.Atmosphere
		tab.Air = airJSON{TemperatureK: a.Temperature, RelativeHumidity: a.RelativeHumidity, PressurePa: a.Pressure, Standard: "ISO 9613-1:1993, pure tone at the exact band centre"}
		enc := json.NewEncoder(w)
		enc.SetIndent("", "  ")
		return enc.Encode(tab)
	}
	return airText(w, tab)
}

// airTable is the absorption table the air command prints.
type airTable struct {
	Atmosphere acoustics.Atmosphere `json:"-"`
	Air        airJSON              `json:"atmosphere"`
	Paths      []airPath            `json:"paths"`
	Rows       []airRow             `json:"bands"`
}

type airJSON struct {
	TemperatureK     float64 `json:"temperature_k"`
	RelativeHumidity float64 `json:"relative_humidity_percent"`
	PressurePa       float64 `json:"pressure_pa"`
	Standard         string  `json:"standard"`
}

// airPath is a path the loss is given over: an array's radius or mean
// distance, or a --distance.
type airPath struct {
	Label  string  `json:"label"`
	Metres float64 `json:"metres"`

	array    string // the array's name; "" for a --distance
	mean     bool   // the array's mean distance, not its radius
	imperial bool   // the layout is in feet and inches
}

type airRow struct {
	Nominal string    `json:"nominal"`
	Centre  float64   `json:"frequency_hz"`
	PerM    float64   `json:"db_per_m"`
	Loss    []float64 `json:"loss_db"`
}

// airFromPlan takes the plan's absorption table and its arrays' paths.
func airFromPlan(p *planner.Plan) airTable {
	a := p.Request.Ambient
	t := airTable{Atmosphere: acoustics.Atmosphere{Temperature: a.Temperature, RelativeHumidity: a.Humidity, Pressure: a.Pressure}}
	for i, arr := range p.Arrays {
		d := 0.0
		if len(p.Absorption) > 0 && p.Absorption[0].PerM > 0 {
			d = p.Absorption[0].ArrayDB[i] / p.Absorption[0].PerM
		}
		label := arr.Name + " " + units.FormatLength(d, p.Request.System())
		if arr.Kind != planner.Arc {
			label += " (mean)"
		}
		t.Paths = append(t.Paths, airPath{Label: label, Metres: d, array: arr.Name, mean: arr.Kind != planner.Arc, imperial: p.Request.System() == units.Imperial})
	}
	for _, r := range p.Absorption {
		t.Rows = append(t.Rows, airRow{Nominal: r.Band.Nominal, Centre: r.Band.Centre, PerM: r.PerM, Loss: r.ArrayDB})
	}
	return t
}

func airCSV(w io.Writer, t airTable) error {
	cw := csv.NewWriter(w)
	head := []string{"band", "frequency_hz", "db_per_m"}
	seen := map[string]int{}
	for _, p := range t.Paths {
		h := p.csvColumn()
		if seen[h]++; seen[h] > 1 {
			h += fmt.Sprintf("_%d", seen[h])
		}
		head = append(head, h)
	}
	cw.Write(head)
	for _, r := range t.Rows {
		rec := []string{r.Nominal, strconv.FormatFloat(r.Centre, 'f', 3, 64), strconv.FormatFloat(r.PerM, 'g', 6, 64)}
		for _, l := range r.Loss {
			rec = append(rec, strconv.FormatFloat(l, 'f', 4, 64))
		}
		cw.Write(rec)
	}
	cw.Flush()
	return cw.Error()
}

// csvColumn names the loss column of path p so that it imports cleanly
// into a spreadsheet, a data frame or a database: only letters, digits and
// underscores, the path in whole millimetres (whole inches for a layout in
// feet and inches), such as loss_db_3000mm, loss_db_A_4113mm or
// loss_db_S_mean_3124mm.
func (p airPath) csvColumn() string {
	length := fmt.Sprintf("%.0fmm", p.Metres*1000)
	if p.imperial {
		length = fmt.Sprintf("%.0fin", p.Metres/units.Inch)
	}
	if p.array == "" {
		return "loss_db_" + length
	}
	name := strings.Map(func(r rune) rune {
		if r < 128 && (unicode.IsLetter(r) || unicode.IsDigit(r)) {
			return r
		}
		return '_'
	}, p.array)
	if p.mean {
		name += "_mean"
	}
	return "loss_db_" + name + "_" + length
}

func airText(w io.Writer, t airTable) error {
	a := t.Atmosphere
	fmt.Fprintf(w, "Atmospheric absorption, ISO 9613-1:1993, at %.1f °C, %.4g %% relative humidity, %.2f kPa\n",
		a.Temperature-273.15, a.RelativeHumidity, a.Pressure/1000)
	for _, s := range a.Warnings() {
		fmt.Fprintln(w, "  warning: "+s)
	}
	tw := newTable(w, tabwriter.AlignRight)
	fmt.Fprint(tw, "band\tcentre (Hz)\tdB/m\tdB/100 m\t")
	for _, p := range t.Paths {
		fmt.Fprintf(tw, "%s\t", p.Label)
	}
	fmt.Fprintln(tw)
	for _, b := range t.Rows {
		fmt.Fprintf(tw, "%s\t%.1f\t%.5f\t%.2f\t", b.Nominal, b.Centre, b.PerM, 100*b.PerM)
		for _, l := range b.Loss {
			fmt.Fprintf(tw, "%.2f dB\t", l)
		}
		fmt.Fprintln(tw)
	}
	return tw.Flush()
}

// percentFlag shows a fraction flag's type as "percent" in the help.
type percentFlag struct{ *quantityFlag }

func (p *percentFlag) Type() string { return "percent" }
