package layout

import (
	"bytes"
	"errors"
	"fmt"
	"regexp"
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"

	"arcwright/internal/planner"
)

// Patterns of the messages of the planner and of the writers that name a
// part of the request.
var (
	arrayRef   = regexp.MustCompile(`(?:^|: )array (.+?): (.*)$`)
	pointRef   = regexp.MustCompile(`operating point (\d+) \((.*?)\): (.*)$`)
	pointIndex = regexp.MustCompile(`Points\[(\d+)\] \((.*?)\)\.?(.*)$`)
	twoIDs     = regexp.MustCompile(`two stations are named "(.*)"`)
)

// Locate turns an error that the planner, the sheet or an export returned
// for req — a request this package decoded — into an [Errors] value of one
// problem at the line and key of the layout file (req.Source) that caused
// it: the array of an automatic radius that fits nowhere, the station
// named twice, the operating point whose plume cannot be computed. A
// problem it cannot place is given with the file name only. It returns nil
// for a nil err, and err itself when it is already an Errors value or when
// req is nil.
func Locate(req *planner.Request, err error) error {
	var es Errors
	if err == nil || req == nil || errors.As(err, &es) {
		return err
	}
	msg := err.Error()
	msg = strings.TrimPrefix(msg, "planner: ")
	msg = strings.TrimPrefix(msg, "bad request: ")
	field, detail := "", ""
	var lineHint int
	switch {
	case twoIDs.MatchString(msg):
		field, lineHint, detail = duplicateID(req, twoIDs.FindStringSubmatch(msg)[1])
	case pointRef.MatchString(msg):
		m := pointRef.FindStringSubmatch(msg)
		i, _ := strconv.Atoi(m[1]) // digits, by the pattern
		field, detail = index("operating_points", i-1), strings.TrimPrefix(m[3], "jet: ")
	case pointIndex.MatchString(msg):
		m := pointIndex.FindStringSubmatch(msg)
		i, _ := strconv.Atoi(m[1])
		field, detail = index("operating_points", i), "the plan of this operating point cannot be written: "+strings.TrimSpace(m[3])
	case arrayRef.MatchString(msg):
		m := arrayRef.FindStringSubmatch(msg)
		for i, a := range req.Arrays {
			if a.Name == m[1] {
				field, lineHint, detail = index("arrays", i), a.Line, m[2]
				if strings.Contains(detail, "radius") && a.Kind == planner.Arc {
					field += ".arc.radius"
				}
			}
		}
	case strings.HasPrefix(msg, "band"):
		field, detail = "band", msg
	case strings.HasPrefix(msg, "ambient: "):
		field, detail = "ambient", strings.TrimPrefix(msg, "ambient: ")
	}
	if detail == "" {
		detail = msg
	}
	line := fieldLine(req.Source, field)
	if line == 0 {
		line = lineHint
	}
	return Errors{{File: req.Source, Line: line, Field: field, Msg: detail, kind: ErrInvalid, cause: err}}
}

// SheetField returns the key of the layout's sheet wishes that an error
// of the sheet's scale or paper (sheet.ErrScale, sheet.ErrPaperRoom) is
// about, and its line: sheet.scale when the layout gives a scale, else
// sheet.paper when it gives a paper, else sheet.
func SheetField(req *planner.Request) (field string, line int) {
	switch {
	case req.Sheet.Scale != 0:
		field = "sheet.scale"
	case req.Sheet.Paper != "":
		field = "sheet.paper"
	default:
		field = "sheet"
	}
	return field, fieldLine(req.Source, field)
}

// LocateSheet returns err, an error of the sheet's scale or paper made
// with the layout's sheet wishes, at the key and line of [SheetField].
func LocateSheet(req *planner.Request, err error) error {
	field, line := SheetField(req)
	msg := strings.Replace(strings.TrimPrefix(err.Error(), "sheet: "), ": sheet: ", ": ", 1)
	return Errors{{File: req.Source, Line: line, Field: field, Msg: msg, kind: ErrInvalid, cause: err}}
}

// duplicateID finds the station named id twice: the field and line of a
// single station given that name, and a message saying what else has it.
func duplicateID(req *planner.Request, id string) (field string, line int, msg string) {
	var others []string
	for i, a := range req.Arrays {
		for j, f := range a.Fixed {
			if f.Name == id {
				if field != "" {
					others = append(others, "another station of this layout")
					continue
				}
				key := "points"
				if a.Kind == planner.Probes {
					key = "probes"
				}
				field, line = index(index("arrays", i)+"."+key, j)+".name", f.Line
			}
		}
		if strings.HasPrefix(id, a.Name+"-") {
			others = append(others, fmt.Sprintf("a station numbered by array %s (%s-01, %s-02 …)", a.Name, a.Name, a.Name))
		}
	}
	msg = fmt.Sprintf("the station ID %q is used twice", id)
	if len(others) > 0 {
		msg += ": it is also " + strings.Join(others, " and ")
	}
	return field, line, msg + "; give each station its own name"
}

// lineOf reads the layout file at path again and returns the line of the
// value at field ("arrays[2].arc.radius"), or 0 when the file or the field
// cannot be found.
func fieldLine(path, field string) int {
	if path == "" || field == "" {
		return 0
	}
	data, err := readInput(path)
	if err != nil {
		return 0
	}
	var doc yaml.Node
	if err := yaml.NewDecoder(bytes.NewReader(data)).Decode(&doc); err != nil || len(doc.Content) == 0 {
		return 0
	}
	n, line := doc.Content[0], 0
	for _, part := range strings.Split(field, ".") {
		key, rest, _ := strings.Cut(part, "[")
		next, keyLine := mapValue(n, key)
		if next == nil {
			return line
		}
		n, line = next, keyLine
		for rest != "" {
			num, after, _ := strings.Cut(rest, "]")
			i, err := strconv.Atoi(num)
			if err != nil || n.Kind != yaml.SequenceNode || i < 0 || i >= len(n.Content) {
				return line
			}
			n, line = n.Content[i], n.Content[i].Line
			rest = strings.TrimPrefix(after, "[")
		}
	}
	return line
}

// mapValue returns the value of key in the map n and the line of the key.
func mapValue(n *yaml.Node, key string) (*yaml.Node, int) {
	if n.Kind != yaml.MappingNode {
		return nil, 0
	}
	for i := 0; i+1 < len(n.Content); i += 2 {
		if n.Content[i].Value == key {
			return n.Content[i+1], n.Content[i].Line
		}
	}
	return nil, 0
}
