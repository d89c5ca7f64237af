package layout

import (
	"bytes"
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"math"
	"strings"

	"github.com/paulmach/orb"
	"go.yaml.in/yaml/v3"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

var (
	// asBuiltColumns are the measured columns; height is the microphone's
	// height above the floor, the same as z (the station CSV writes both).
	asBuiltColumns  = []string{"id", "x", "y", "z", "height", "base_x", "base_y"}
	asBuiltRequired = []string{"id", "x", "y"}
	// lengthSuffixes are the unit suffixes of the station CSV's length
	// columns: x_m in metres, x_ft in feet.
	lengthSuffixes = map[string]string{"_m": "m", "_ft": "ft"}
	// exportOnly are the other columns of the station CSV that
	// 'arcwright plan --csv' writes (without their unit suffix): an edited
	// copy of it is read as an as-built file, its x_m … base_y_m (or x_ft …)
	// columns in their unit, the rest ignored.
	exportOnly = []string{"channel", "array", "kind", "radius", "nominal_radius", "polar_deg", "nominal_polar_deg", "acoustic_distance", "acoustic_polar_deg",
		"polar_convention", "azimuth_deg", "stand", "aim", "status", "governing_point", "velocity_clearance", "velocity_point",
		"hot_clearance", "hot_point", "wall_clearance", "oaspl_db", "reasons"}
)

// heightTolerance is how far, m, the z and height of an as-built row may
// differ and still count as one value: the rounding of the station CSV's
// 4 decimals of a foot (0.03 mm), with room to spare.
const heightTolerance = 1e-4

// LoadAsBuilt reads the station positions measured after set-up from the
// CSV file at path, for planner.Request.AsBuilt; see [DecodeAsBuilt] for
// the format. req is the request decoded from the layout: a bare number is
// read in the layout's length unit (req.LengthUnit), and heights are
// checked against the cell's ceiling. A file that cannot be read, is not a
// regular file or is larger than [MaxInputSize] gives an Errors value of
// one problem wrapping [ErrRead].
func LoadAsBuilt(path string, req *planner.Request) (map[string]planner.Placement, error) {
	data, err := readInput(path)
	if err != nil {
		return nil, err
	}
	return DecodeAsBuilt(path, data, req.LengthUnit, req.Cell.Ceiling)
}

// DecodeAsBuilt reads measured station positions from CSV data; name is
// used in messages. The first row is a header naming the columns, in any
// order: id, x, y, z (the microphone or probe tip, cell frame, z above the
// floor) and, optionally, base_x and base_y (the stand pole in plan).
// Lines starting with # are comments. A UTF-8 byte-order mark is skipped,
// and a file whose header is separated by semicolons or tabs instead of
// commas (as spreadsheets save it in some locales) is read with that
// separator and decimal commas ("1,25"). Values take units ("1.25 m",
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
		d.errs = summarise(d.errs)
		return nil, d.errs
	}
	return out, nil
}

// asBuilt does the work of DecodeAsBuilt.
func (d *decoder) asBuilt(data []byte, ceiling float64) map[string]planner.Placement {
	if !d.checkText(data) {
		return nil
	}
	data = bytes.TrimPrefix(data, utf8BOM) // spreadsheets write one
	sep := separator(data)
	r := csv.NewReader(bytes.NewReader(data))
	r.Comma = sep
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
	headerLine, _ := r.FieldPos(0) // after any comment lines
	col, unit, ok := d.asBuiltHeader(header, headerLine)
	if !ok {
		return nil
	}
	bare := d.lenUnit
	length := func(n *yaml.Node, c string) (float64, bool) {
		if d.lenUnit = bare; unit[c] != "" {
			d.lenUnit = unit[c]
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
			if sep != ',' && !strings.Contains(v, ".") && strings.Count(v, ",") == 1 {
				v = strings.Replace(v, ",", ".", 1) // a decimal comma, as spreadsheets write next to semicolons
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
		if unmeasured(at) {
			continue // a row of the template left empty: not measured
		}
		var p planner.Placement
		good := true
		coords := []*float64{&p.Mic.X, &p.Mic.Y}
		for i, c := range []string{"x", "y"} {
			v, ok := length(at(c), c)
			*coords[i], good = v, good && ok
		}
		z, zc, ok := d.asBuiltHeight(at, length, line)
		if ok {
			ok = d.heightRange(ci, z, line, zc, "the station")
		}
		p.Mic.Z, good = z, good && ok
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

// separator returns the field separator of a CSV file: a semicolon or a
// tab when the first line that is not a comment has one and no comma (as
// spreadsheets write in locales with a decimal comma), else a comma.
func separator(data []byte) rune {
	for _, line := range bytes.Split(data, []byte("\n")) {
		t := bytes.TrimSpace(line)
		if len(t) == 0 || t[0] == '#' {
			continue
		}
		if bytes.IndexByte(t, ',') >= 0 {
			return ','
		}
		switch {
		case bytes.IndexByte(t, ';') >= 0:
			return ';'
		case bytes.IndexByte(t, '\t') >= 0:
			return '\t'
		}
		return ','
	}
	return ','
}

// unmeasured reports whether a row gives no measured value at all (every
// measured column empty or absent): a row of the as-built template that
// was not filled in.
func unmeasured(at func(c string) *yaml.Node) bool {
	for _, c := range asBuiltColumns[1:] {
		if n := at(c); n != nil && n.Value != "" {
			return false
		}
	}
	return true
}

// asBuiltHeight reads a row's microphone height from its z or height
// column, whichever is given; when both are, they must agree (the station
// CSV writes the same number in both, so an edit of one alone would
// otherwise be lost). It returns the height, m, and the column read.
func (d *decoder) asBuiltHeight(at func(c string) *yaml.Node, length func(*yaml.Node, string) (float64, bool), line int) (float64, string, bool) {
	zn, hn := at("z"), at("height")
	switch {
	case hn == nil || hn.Value == "":
		v, ok := length(zn, "z")
		return v, "z", ok
	case zn == nil || zn.Value == "":
		v, ok := length(hn, "height")
		return v, "height", ok
	}
	z, okZ := length(zn, "z")
	h, okH := length(hn, "height")
	if !okZ || !okH {
		return z, "z", false
	}
	if math.Abs(z-h) > heightTolerance {
		d.errorf(ErrInvalid, line, "height", "%s, but z is %s: both are the microphone's height above the floor; change both, or leave one empty",
			d.fmtLen(h), d.fmtLen(z))
		return z, "z", false
	}
	return z, "z", true
}

// asBuiltHeader maps the column names of the header row to their index,
// and the length columns with a unit suffix (x_m, x_ft) to their unit.
func (d *decoder) asBuiltHeader(header []string, line int) (col map[string]int, unit map[string]string, ok bool) {
	col, unit, ok = map[string]int{}, map[string]string{}, true
	for i, h := range header {
		h = strings.ToLower(strings.TrimSpace(h))
		u := ""
		for suffix, name := range lengthSuffixes {
			if base, cut := strings.CutSuffix(h, suffix); cut && (contains(asBuiltColumns, base) || contains(exportOnly, base)) {
				h, u = base, name
			}
		}
		switch {
		case contains(exportOnly, h):
			continue
		case !contains(asBuiltColumns, h):
			d.add(ErrUnknownKey, nil, line, h, strings.Replace(unknownKeyMsg(h, "an as-built file", asBuiltColumns), "unknown key", "unknown column", 1))
			ok = false
		case has(col, h):
			d.errorf(ErrSyntax, line, h, "column %q is given twice", h)
			ok = false
		default:
			col[h] = i
			if u != "" {
				unit[h] = u
			}
		}
	}
	for _, c := range asBuiltRequired {
		if !has(col, c) {
			d.errorf(ErrMissing, line, c, "missing column; want id, x, y, z and optionally base_x, base_y")
			ok = false
		}
	}
	if !has(col, "z") && !has(col, "height") {
		d.errorf(ErrMissing, line, "z", "missing column; want id, x, y, z and optionally base_x, base_y")
		ok = false
	}
	if has(col, "base_x") != has(col, "base_y") {
		d.errorf(ErrMissing, line, "base_y", "give both base_x and base_y, or neither")
		ok = false
	}
	return col, unit, ok
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

// UnknownAsBuilt reads the as-built file at path again and reports, at its
// line, every row whose station ID is not one of ids (the stations of the
// plan), suggesting the nearest ID; a long list is summarised like every
// Errors value. It returns nil when every ID is known, and the reading
// errors of [LoadAsBuilt] when the file cannot be read.
func UnknownAsBuilt(path string, ids []string) error {
	data, err := readInput(path)
	if err != nil {
		return err
	}
	d := &decoder{file: path, lenUnit: "m", sys: units.Metric}
	if !d.checkText(data) {
		return summarise(d.errs)
	}
	data = bytes.TrimPrefix(data, utf8BOM)
	r := csv.NewReader(bytes.NewReader(data))
	r.Comma = separator(data)
	r.Comment = '#'
	r.TrimLeadingSpace = true
	r.FieldsPerRecord = -1
	header, err := r.Read()
	if err != nil {
		d.csvError(err)
		return summarise(d.errs)
	}
	col := -1
	for i, h := range header {
		if strings.ToLower(strings.TrimSpace(h)) == "id" {
			col = i
		}
	}
	known := make(map[string]bool, len(ids))
	for _, id := range ids {
		known[id] = true
	}
	like := "the plan has no stations"
	if len(ids) > 0 {
		like = "the plan's stations are named like " + ids[0]
	}
	for col >= 0 {
		rec, err := r.Read()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			d.csvError(err)
			break
		}
		if col >= len(rec) {
			continue
		}
		id := strings.TrimSpace(rec[col])
		if id == "" || known[id] {
			continue
		}
		line, _ := r.FieldPos(col)
		msg := fmt.Sprintf("no station %q in the plan", id)
		if len(d.errs) >= MaxProblems { // summarised: no suggestion needed
			d.add(ErrUnresolved, nil, line, "id", msg)
			continue
		}
		if s := suggest(id, ids); s != "" {
			msg += fmt.Sprintf("; did you mean %q?", s)
		} else {
			msg += " (" + like + ")"
		}
		d.add(ErrUnresolved, nil, line, "id", msg)
	}
	if len(d.errs) == 0 {
		return nil
	}
	return summarise(d.errs)
}
