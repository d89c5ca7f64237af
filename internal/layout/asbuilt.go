package layout

import (
	"bytes"
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"math"
	"os"
	"strings"

	"github.com/paulmach/orb"
	"go.yaml.in/yaml/v3"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

var (
	asBuiltColumns  = []string{"id", "x", "y", "z", "base_x", "base_y"}
	asBuiltRequired = []string{"id", "x", "y", "z"}
	// exportOnly are the other columns of the station CSV that
	// 'arcwright plan --csv' writes: an edited copy of it is read as an
	// as-built file, its x_m … base_y_m columns in metres, the rest ignored.
	exportOnly = []string{"channel", "array", "kind", "height_m", "radius_m", "polar_deg", "polar_convention", "azimuth_deg",
		"stand", "aim", "status", "governing_point", "velocity_clearance_m", "hot_clearance_m", "wall_clearance_m", "reasons"}
)

// LoadAsBuilt reads the station positions measured after set-up from the
// CSV file at path, for planner.Request.AsBuilt; see [DecodeAsBuilt] for
// the format. req is the request decoded from the layout: a bare number is
// read in the layout's length unit (req.LengthUnit), and heights are
// checked against the cell's ceiling. A file that cannot be read gives an Errors value of one problem
// wrapping [ErrRead].
func LoadAsBuilt(path string, req *planner.Request) (map[string]planner.Placement, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		msg := err.Error()
		var pe *fs.PathError
		if errors.As(err, &pe) {
			msg = pe.Err.Error()
		}
		return nil, Errors{{File: path, Msg: "cannot read the file: " + msg, kind: ErrRead, cause: err}}
	}
	return DecodeAsBuilt(path, data, req.LengthUnit, req.Cell.Ceiling)
}

// DecodeAsBuilt reads measured station positions from CSV data; name is
// used in messages. The first row is a header naming the columns, in any
// order: id, x, y, z (the microphone or probe tip, cell frame, z above the
// floor) and, optionally, base_x and base_y (the stand pole in plan).
// Lines starting with # are comments. Values take units ("1.25 m",
// "4 ft 2 in"); a bare number is in the unit bare (m, mm, cm, in or ft; ""
// means m). ceiling is the cell's ceiling height, m (+Inf for open sky).
//
// Each row gives one station ID's Placement, in metres; a row that leaves
// both base columns empty keeps Base nil (the planner derives the pole).
// IDs must be unique; whether they name stations of the plan is the
// planner's check. Like [Decode], it returns either the positions or an
// [Errors] value with every problem found, the Field of each being the
// column name.
//
// DecodeAsBuilt panics if bare is not one of "", m, mm, cm, in or ft
// (programmer misuse).
func DecodeAsBuilt(name string, data []byte, bare string, ceiling float64) (map[string]planner.Placement, error) {
	if bare == "" {
		bare = "m"
	}
	if !contains(lengthUnits, bare) {
		panic(fmt.Sprintf("layout: DecodeAsBuilt: bare unit %q is not one of %s", bare, oneOf(lengthUnits)))
	}
	d := &decoder{file: name, lenUnit: bare, sys: units.Metric}
	out := d.asBuilt(data, ceiling)
	if len(d.errs) > 0 {
		sortErrors(d.errs)
		return nil, d.errs
	}
	return out, nil
}

// asBuilt does the work of DecodeAsBuilt.
func (d *decoder) asBuilt(data []byte, ceiling float64) map[string]planner.Placement {
	r := csv.NewReader(bytes.NewReader(data))
	r.Comment = '#'
	r.TrimLeadingSpace = true
	r.FieldsPerRecord = -1 // short and long rows are reported here, with the column
	header, err := r.Read()
	if err != nil {
		if errors.Is(err, io.EOF) {
			d.errorf(ErrMissing, 0, "", "the file holds no header row; want id, x, y, z and optionally base_x, base_y")
		} else {
			d.csvError(err)
		}
		return nil
	}
	col, metres, ok := d.asBuiltHeader(header)
	if !ok {
		return nil
	}
	bare := d.lenUnit
	length := func(n *yaml.Node, c string) (float64, bool) {
		if d.lenUnit = bare; metres[c] {
			d.lenUnit = "m"
		}
		defer func() { d.lenUnit = bare }()
		return d.asBuiltLength(n, c)
	}
	ci := &cellInfo{cell: geometry.Cell{Ceiling: ceiling}, ceilingOK: !math.IsNaN(ceiling)}
	out := map[string]planner.Placement{}
	firstLine := map[string]int{}
	for {
		rec, err := r.Read()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			d.csvError(err)
			return nil
		}
		line, _ := r.FieldPos(0)
		if len(rec) > len(header) {
			d.errorf(ErrSyntax, line, "", "bad CSV: %d fields, but the header names %d columns", len(rec), len(header))
			continue
		}
		at := func(c string) *yaml.Node { // the cell of column c as a scalar node, for the quantity readers
			i, ok := col[c]
			if !ok {
				return nil
			}
			v := ""
			if i < len(rec) {
				v = strings.TrimSpace(rec[i])
			}
			return &yaml.Node{Kind: yaml.ScalarNode, Tag: "!!str", Value: v, Line: line}
		}
		id := at("id").Value
		if id == "" {
			d.errorf(ErrMissing, line, "id", "missing; want the station ID, such as A-01")
			continue
		}
		if first, dup := firstLine[id]; dup {
			d.errorf(ErrDuplicateName, line, "id", "station %q is already given at line %d", id, first)
			continue
		}
		firstLine[id] = line
		var p planner.Placement
		good := true
		coords := []*float64{&p.Mic.X, &p.Mic.Y, &p.Mic.Z}
		for i, c := range []string{"x", "y", "z"} {
			v, ok := length(at(c), c)
			if ok && c == "z" {
				ok = d.heightRange(ci, v, line, "z", "the station")
			}
			*coords[i], good = v, good && ok
		}
		if bx, by := at("base_x"), at("base_y"); bx != nil && (bx.Value != "" || by.Value != "") {
			x, okX := length(bx, "base_x")
			y, okY := length(by, "base_y")
			p.Base, good = &orb.Point{x, y}, good && okX && okY
		}
		if good {
			out[id] = p
		}
	}
	if len(firstLine) == 0 {
		d.errorf(ErrMissing, 0, "", "the file holds no positions; want one row per station after the header")
	}
	return out
}

// asBuiltHeader maps the column names of the header row to their index.
func (d *decoder) asBuiltHeader(header []string) (col map[string]int, metres map[string]bool, ok bool) {
	col, metres, ok = map[string]int{}, map[string]bool{}, true
	for i, h := range header {
		h = strings.ToLower(strings.TrimSpace(h))
		if base, cut := strings.CutSuffix(h, "_m"); cut && contains(asBuiltColumns, base) {
			h, metres[base] = base, true
		}
		switch {
		case contains(exportOnly, h):
			continue
		case !contains(asBuiltColumns, h):
			d.add(ErrUnknownKey, nil, 1, h, strings.Replace(unknownKeyMsg(h, "an as-built file", asBuiltColumns), "unknown key", "unknown column", 1))
			ok = false
		case has(col, h):
			d.errorf(ErrSyntax, 1, h, "column %q is given twice", h)
			ok = false
		default:
			col[h] = i
		}
	}
	for _, c := range asBuiltRequired {
		if !has(col, c) {
			d.errorf(ErrMissing, 1, c, "missing column; want id, x, y, z and optionally base_x, base_y")
			ok = false
		}
	}
	if has(col, "base_x") != has(col, "base_y") {
		d.errorf(ErrMissing, 1, "base_y", "give both base_x and base_y, or neither")
		ok = false
	}
	return col, metres, ok
}

// has reports whether the header has column c.
func has(col map[string]int, c string) bool { _, ok := col[c]; return ok }

// asBuiltLength reads a coordinate of an as-built row, m.
func (d *decoder) asBuiltLength(n *yaml.Node, field string) (float64, bool) {
	if n == nil {
		d.errorf(ErrMissing, 0, field, "missing; want a length")
		return 0, false
	}
	v, ok := d.length(n, field)
	if ok && math.Abs(v) > geometry.MaxCoord {
		d.errorf(ErrInvalid, n.Line, field, "%s is more than %s from the datum", d.fmtLen(v), d.fmtLen(geometry.MaxCoord))
		return v, false
	}
	return v, ok
}

// csvError records a CSV syntax error with its line.
func (d *decoder) csvError(err error) {
	var pe *csv.ParseError
	if errors.As(err, &pe) {
		d.add(ErrSyntax, err, pe.Line, "", "bad CSV: "+pe.Err.Error())
		return
	}
	d.add(ErrSyntax, err, 0, "", "bad CSV: "+err.Error())
}
