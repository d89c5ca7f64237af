package layout

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"regexp"
	"strconv"
	"strings"
	"unicode"

	"go.yaml.in/yaml/v3"

	"arcwright/internal/units"
)

// decoder walks the YAML tree of one layout file and collects every problem
// it finds.
type decoder struct {
	file    string
	errs    Errors
	warns   []Warning
	lenUnit string       // symbol that a bare length is read in
	lenBad  bool         // units.length is unusable: bare lengths cannot be read
	sys     units.System // how lengths are printed in messages
}

// add records a problem classified by kind (a sentinel error), caused by
// cause (nil, or the error of another package that msg reports).
func (d *decoder) add(kind, cause error, line int, field, msg string) {
	d.errs = append(d.errs, &Error{File: d.file, Line: line, Field: field, Msg: msg, kind: kind, cause: cause})
}

// errorf records a problem with a formatted message.
func (d *decoder) errorf(kind error, line int, field, format string, args ...any) {
	d.add(kind, nil, line, field, fmt.Sprintf(format, args...))
}

// warnf records a warning.
func (d *decoder) warnf(line int, field, format string, args ...any) {
	d.warns = append(d.warns, Warning{File: d.file, Line: line, Field: field, Msg: fmt.Sprintf(format, args...)})
}

// yamlLine matches the line number in the parser's messages.
var yamlLine = regexp.MustCompile(`^yaml: line (\d+): (.*)$`)

// syntax records a parser error with its line.
func (d *decoder) syntax(err error) {
	msg := err.Error()
	line := 0
	if m := yamlLine.FindStringSubmatch(msg); m != nil {
		line, _ = strconv.Atoi(m[1])
		msg = m[2]
	} else {
		msg = strings.TrimPrefix(msg, "yaml: ")
	}
	d.add(ErrSyntax, err, line, "", "bad YAML: "+msg)
}

// noLayout is the message for a file with no YAML document, or an empty one.
const noLayout = "the file holds no layout (`arcwright init` writes a starter)"

// parse reads data as one YAML document and returns its root node, or nil
// after recording why there is none.
func (d *decoder) parse(data []byte) *yaml.Node {
	if !d.checkText(data) {
		return nil
	}
	dec := yaml.NewDecoder(bytes.NewReader(data))
	var doc yaml.Node
	if err := dec.Decode(&doc); err != nil {
		if errors.Is(err, io.EOF) {
			d.errorf(ErrSyntax, 0, "", noLayout)
		} else {
			d.syntax(err)
		}
		return nil
	}
	var extra yaml.Node
	switch err := dec.Decode(&extra); {
	case errors.Is(err, io.EOF):
	case err != nil:
		d.syntax(err)
		return nil
	default:
		line := extra.Line
		if len(extra.Content) > 0 {
			line = extra.Content[0].Line
		}
		d.errorf(ErrSyntax, line, "", "a second YAML document starts here; want one layout per file")
	}
	root := &doc
	if doc.Kind == yaml.DocumentNode && len(doc.Content) == 1 {
		root = doc.Content[0]
	}
	if root.Kind == yaml.DocumentNode || isNull(root) {
		d.errorf(ErrSyntax, 0, "", noLayout)
		return nil
	}
	if !d.checkTree(root, 1) {
		return nil
	}
	return root
}

// describe names what a node is, for "got …" in messages.
func describe(n *yaml.Node) string {
	switch n.Kind {
	case yaml.MappingNode:
		return "a map"
	case yaml.SequenceNode:
		return "a list"
	case yaml.ScalarNode:
		if isNull(n) {
			return "nothing"
		}
		return strconv.Quote(n.Value)
	case yaml.AliasNode:
		return "an alias"
	case yaml.DocumentNode:
		return "a document"
	}
	return "an unknown YAML node"
}

// isNull reports whether n is an empty value ("key:" with nothing after it,
// "~" or "null").
func isNull(n *yaml.Node) bool {
	return n.Kind == yaml.ScalarNode && n.ShortTag() == "!!null"
}

// alias reports, and records as a problem, an alias node: the format has
// no anchors and aliases, so every value is written where it is used.
func (d *decoder) alias(n *yaml.Node, field string) bool {
	if n.Kind != yaml.AliasNode {
		return false
	}
	d.errorf(ErrInvalid, n.Line, field, "aliases (*%s) are not supported; write the value out", n.Value)
	return true
}

// scalar returns the text of a scalar node; want says what was expected,
// for the message when n is a map or a list. An empty value gives "".
func (d *decoder) scalar(n *yaml.Node, field, want string) (string, bool) {
	if d.alias(n, field) {
		return "", false
	}
	if n.Kind != yaml.ScalarNode {
		d.errorf(ErrWrongType, n.Line, field, "want %s, got %s", want, describe(n))
		return "", false
	}
	if isNull(n) {
		return "", true
	}
	return n.Value, true
}

// list returns the items of a sequence node. An absent (nil) or empty value
// is an empty list.
func (d *decoder) list(n *yaml.Node, field string, line int, want string) ([]*yaml.Node, bool) {
	if n == nil {
		return nil, true
	}
	if d.alias(n, field) {
		return nil, false
	}
	switch {
	case isNull(n):
		return nil, true
	case n.Kind != yaml.SequenceNode:
		d.errorf(ErrWrongType, line, field, "want %s, got %s", want, describe(n))
		return nil, false
	}
	return n.Content, true
}

// section is a YAML map being read: its values by key, and where to report
// a key that is missing from it.
type section struct {
	d        *decoder
	path     string // field path of the map itself; "" at the top level
	line     int    // line of the key that holds the map, or of the list item
	vals     map[string]*yaml.Node
	keyLines map[string]int
	isMap    bool // false when the value was not a map (already reported)
}

// section reads the map n found at path, reporting keys that are not in
// known and keys given twice. line is where a missing key is reported. A nil
// n (the key is absent) or an empty value gives an empty section.
func (d *decoder) section(n *yaml.Node, path string, line int, known []string) *section {
	s := &section{d: d, path: path, line: line, vals: map[string]*yaml.Node{}, keyLines: map[string]int{}, isMap: true}
	if n == nil || isNull(n) {
		return s
	}
	if d.alias(n, path) {
		s.isMap = false
		return s
	}
	if n.Kind != yaml.MappingNode {
		d.errorf(ErrWrongType, line, path, "want a map of keys (%s), got %s", strings.Join(known, ", "), describe(n))
		s.isMap = false
		return s
	}
	where := path
	if where == "" {
		where = "the top level"
	}
	for i := 0; i+1 < len(n.Content); i += 2 {
		k, v := n.Content[i], n.Content[i+1]
		if k.Kind != yaml.ScalarNode {
			d.errorf(ErrWrongType, k.Line, path, "want a key name, got %s", describe(k))
			continue
		}
		if first, dup := s.keyLines[k.Value]; dup {
			d.errorf(ErrSyntax, k.Line, s.field(k.Value), "key %q is given twice (first at line %d)", k.Value, first)
			continue
		}
		if !contains(known, k.Value) {
			d.add(ErrUnknownKey, nil, k.Line, s.field(k.Value), unknownKeyMsg(k.Value, where, known))
			continue
		}
		s.vals[k.Value] = v
		s.keyLines[k.Value] = k.Line
	}
	return s
}

// get returns the value of key, or nil when it is absent.
func (s *section) get(key string) *yaml.Node { return s.vals[key] }

// has reports whether key is present.
func (s *section) has(key string) bool { return s.vals[key] != nil }

// field returns the path of key inside the section.
func (s *section) field(key string) string {
	if strings.IndexFunc(key, func(r rune) bool { return !unicode.IsPrint(r) }) >= 0 {
		key = strconv.QuoteToASCII(key) // a key such as "\e[2J" must not reach the terminal raw
	}
	if s.path == "" {
		return key
	}
	return s.path + "." + key
}

// keyLine returns the line of key, or the section's line when it is absent.
func (s *section) keyLine(key string) int {
	if l, ok := s.keyLines[key]; ok {
		return l
	}
	return s.line
}

// need returns the value of key and records a missing key (want says what
// was expected) when it is absent from a map.
func (s *section) need(key, want string) *yaml.Node {
	n := s.vals[key]
	if n == nil && s.isMap {
		s.d.errorf(ErrMissing, s.line, s.field(key), "missing; want %s", want)
	}
	return n
}

// sub reads the map held by key as a section.
func (s *section) sub(key string, known []string) *section {
	return s.d.section(s.get(key), s.field(key), s.keyLine(key), known)
}

// needSub reads the map held by a required key. When the key is absent it
// records one missing key, and the returned section reports nothing more.
func (s *section) needSub(key, want string, known []string) *section {
	if s.need(key, want) == nil {
		return &section{d: s.d, path: s.field(key), line: s.line, vals: map[string]*yaml.Node{}, keyLines: map[string]int{}}
	}
	return s.sub(key, known)
}

// contains reports whether list holds w.
func contains(list []string, w string) bool {
	for _, v := range list {
		if v == w {
			return true
		}
	}
	return false
}

// index returns the path of item i of the list at path: "arrays[2]".
func index(path string, i int) string { return path + "[" + strconv.Itoa(i) + "]" }
