package export

import (
	"encoding/json"
	"fmt"
	"io"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/planner"
)

// The format name and version written at the top of the JSON document.
const (
	jsonFormat        = "arcwright-plan"
	jsonFormatVersion = 1
)

// planDoc is the JSON document. Field order is key order.
type planDoc struct {
	Format         string          `json:"format"`
	FormatVersion  int             `json:"format_version"`
	Source         string          `json:"source"`
	Title          string          `json:"title"`
	TitleBlock     titleDoc        `json:"title_block"`
	Convention     string          `json:"polar_angle_convention"`
	GoverningPoint *string         `json:"governing_point"`
	GoverningHot   *string         `json:"governing_hot_point"`
	Counts         countsDoc       `json:"counts"`
	Warnings       []string        `json:"warnings"`
	Stations       []stationDoc    `json:"stations"`
	Arrays         []arrayDoc      `json:"arrays"`
	Points         []pointDoc      `json:"points"`
	Absorption     []absorptionDoc `json:"absorption"`
	Crew           []crewDoc       `json:"crew"`
}

type titleDoc struct {
	Facility   string `json:"facility"`
	Test       string `json:"test"`
	Revision   string `json:"revision"`
	PreparedBy string `json:"prepared_by"`
	CheckedBy  string `json:"checked_by"`
	ApprovedBy string `json:"approved_by"`
	Date       string `json:"date"`
}

type countsDoc struct {
	OK      int `json:"ok"`
	Warn    int `json:"warn"`
	Blocked int `json:"blocked"`
}

// vecDoc is a position in the cell frame, m.
type vecDoc struct {
	X num `json:"x_m"`
	Y num `json:"y_m"`
	Z num `json:"z_m"`
}

func newVecDoc(v r3.Vec) vecDoc { return vecDoc{metres(v.X), metres(v.Y), metres(v.Z)} }

// arrayDoc is one array's summary.
type arrayDoc struct {
	Name          string   `json:"name"`
	Kind          string   `json:"kind"`
	Radius        num      `json:"radius_m"`
	AutoRadius    bool     `json:"auto_radius"`
	MaxRadius     num      `json:"max_radius_m"`
	Centre        vecDoc   `json:"centre"`
	MinClearPolar num      `json:"min_clear_polar_deg"`
	FarField      *[2]num  `json:"far_field_radius_interval_m"`
	FarFieldNote  string   `json:"far_field_note"`
	Blocked       []string `json:"blocked"`
	Notes         []string `json:"notes"`
	Stations      int      `json:"stations"`
}

func newArrayDoc(a *planner.ArrayResult) arrayDoc {
	d := arrayDoc{
		Name:          a.Name,
		Kind:          kindName(a.Kind),
		Radius:        metres(a.Radius),
		AutoRadius:    a.Auto,
		MaxRadius:     num(nan),
		Centre:        newVecDoc(a.Centre),
		MinClearPolar: degrees(a.MinClearPolar),
		FarFieldNote:  a.FarFieldNote,
		Blocked:       list(a.Blocked),
		Notes:         list(a.Notes),
		Stations:      a.Stations,
	}
	if a.Kind == planner.Arc {
		d.MaxRadius = metres(a.MaxRadius)
	}
	if lo, hi := a.FarField[0], a.FarField[1]; !(lo > hi) {
		d.FarField = &[2]num{metres(lo), metres(hi)}
	}
	return d
}

// absorptionDoc is one band of the absorption table.
type absorptionDoc struct {
	Band    string `json:"band"`
	Centre  num    `json:"centre_hz"`
	PerM    num    `json:"db_per_m"`
	ArrayDB []num  `json:"arrays_db"`
}

func newAbsorptionDoc(r *planner.AbsorptionRow) absorptionDoc {
	d := absorptionDoc{Band: r.Band.Nominal, Centre: sig(r.Band.Centre), PerM: sig(r.PerM), ArrayDB: make([]num, len(r.ArrayDB))}
	for i, v := range r.ArrayDB {
		d.ArrayDB[i] = sig(v)
	}
	return d
}

// list returns s, or an empty list for nil, so that every list is
// written as [] rather than null.
func list(s []string) []string {
	if s == nil {
		return []string{}
	}
	return s
}

// JSON writes p to w as one indented JSON object (see the package
// documentation for its keys), followed by a newline. The output is
// deterministic: the same plan gives the same bytes.
//
// It returns an error wrapping [ErrNoPlan] when p or p.Request is nil,
// wrapping [ErrInvalidPlan] when p holds a convention, verdict or governing
// index that cannot be written, and the error of w.
func JSON(w io.Writer, p *planner.Plan) error {
	if err := checkPlan(p); err != nil {
		return err
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	if err := enc.Encode(newPlanDoc(p)); err != nil {
		return fmt.Errorf("export: writing JSON: %w", err)
	}
	return nil
}

// newPlanDoc builds the document of a plan that passed checkPlan.
func newPlanDoc(p *planner.Plan) *planDoc {
	r := p.Request
	conv, _ := conventionName(r.Convention)
	d := &planDoc{
		Format:        jsonFormat,
		FormatVersion: jsonFormatVersion,
		Source:        r.Source,
		Title:         r.Title.Title,
		TitleBlock: titleDoc{
			Facility: r.Title.Facility, Test: r.Title.Test, Revision: r.Title.Revision,
			PreparedBy: r.Title.PreparedBy, CheckedBy: r.Title.CheckedBy, ApprovedBy: r.Title.ApprovedBy,
			Date: r.Title.Date,
		},
		Convention: conv,
		Counts:     countsDoc{OK: p.OK, Warn: p.Warn, Blocked: p.Blocked},
		Warnings:   list(p.Warnings),
		Stations:   make([]stationDoc, len(p.Stations)),
		Arrays:     make([]arrayDoc, len(p.Arrays)),
		Points:     make([]pointDoc, len(p.Points)),
		Absorption: make([]absorptionDoc, len(p.Absorption)),
		Crew:       newCrewDocs(p),
	}
	if len(p.Points) > 0 {
		name := p.Points[p.Governing].Name
		d.GoverningPoint = &name
		if p.GoverningHot >= 0 && p.GoverningHot < len(p.Points) {
			hot := p.Points[p.GoverningHot].Name
			d.GoverningHot = &hot
		}
	}
	for i := range p.Stations {
		d.Stations[i] = newStationDoc(p, &p.Stations[i])
	}
	for i := range p.Arrays {
		d.Arrays[i] = newArrayDoc(&p.Arrays[i])
	}
	collector := r.Cell.Collector != nil
	for i := range p.Points {
		d.Points[i] = newPointDoc(&p.Points[i], collector)
	}
	for i := range p.Absorption {
		d.Absorption[i] = newAbsorptionDoc(&p.Absorption[i])
	}
	return d
}
