package main

import (
	"context"
	"errors"
	"fmt"
	"io"
	"net"
	"net/http"
	"os"
	"os/signal"
	"strconv"
	"syscall"
	"time"

	"github.com/spf13/cobra"
	"github.com/spf13/pflag"

	"arcwright/internal/preview"
)

// defaultAddr is where serve listens unless told otherwise: loopback only.
const defaultAddr = "127.0.0.1:8570"

// ServeOptions are the serve command's inputs.
type ServeOptions struct {
	Layout string
	Addr   string
}

// AddFlags binds the options to fs.
func (o *ServeOptions) AddFlags(fs *pflag.FlagSet) {
	fs.StringVar(&o.Addr, "addr", defaultAddr, "HOST:PORT to listen on; port 0 picks a free one, an empty host means 127.0.0.1")
}

func newServeCommand(stdout, stderr io.Writer) *cobra.Command {
	o := &ServeOptions{}
	c := &cobra.Command{
		Use:   "serve LAYOUT",
		Short: "Show the plan in a browser and redraw it each time the layout is saved",
		Long: `Serve a page that draws the plan view of the layout, as the sheet draws it,
with the station and operating-point tables and the warnings, and redraws it
within a second of each save of the layout file, in any editor. Point at or
tap a station to see its checks and their reasons. While the file has
problems the page lists them with their lines above the last good drawing,
marked stale; fixing the file brings the plan back.

The first line of output is the address to open, 'serving http://HOST:PORT/'.
The server listens on this computer only (127.0.0.1) unless --addr names
another interface, which is printed as a warning (on loopback it answers only
requests addressed to localhost); it serves this one layout, read-only, and
needs no internet access. Ctrl-C stops it.

Besides the page: /plan.json (as 'plan --format json'; 422 with the errors
while the layout is bad), /plan.svg, /sheet.pdf and /events (Server-Sent
Events, one each time the plan changes).

Examples:
  arcwright serve layouts/anechoic-model-jet.yaml
  arcwright serve layout.yaml --addr :0

Exit status: 0 when stopped by Ctrl-C or SIGTERM, 1 when the layout file
cannot be read or the address cannot be listened on, 2 on a bad command line.`,
		Args: oneLayout,
		RunE: func(cmd *cobra.Command, args []string) error {
			o.Layout = args[0]
			ctx, stop := signal.NotifyContext(cmd.Context(), os.Interrupt, syscall.SIGTERM)
			defer stop()
			return runServe(ctx, o, stdout, stderr)
		},
	}
	o.AddFlags(c.Flags())
	return c
}

// listenAddr checks --addr and returns it with an empty host made
// 127.0.0.1, and whether the host is a loopback address.
func listenAddr(addr string) (string, bool, error) {
	host, port, err := net.SplitHostPort(addr)
	if err != nil {
		return "", false, usageError{fmt.Errorf("--addr: want HOST:PORT such as %s or :0, got %q", defaultAddr, addr)}
	}
	if n, err := strconv.Atoi(port); err != nil || n < 0 || n > 65535 {
		return "", false, usageError{fmt.Errorf("--addr: want a port from 0 to 65535, got %q", port)}
	}
	if host == "" {
		host = "127.0.0.1"
	}
	loop := host == "localhost"
	if ip := net.ParseIP(host); ip != nil {
		loop = ip.IsLoopback()
	}
	return net.JoinHostPort(host, port), loop, nil
}

// runServe serves the layout until ctx is done.
func runServe(ctx context.Context, o *ServeOptions, stdout, stderr io.Writer) error {
	addr, loopback, err := listenAddr(o.Addr)
	if err != nil {
		return err
	}
	if fi, err := os.Stat(o.Layout); err != nil {
		return fmt.Errorf("%s: cannot read the layout file: %w", o.Layout, err)
	} else if fi.IsDir() {
		return fmt.Errorf("%s: is a folder; serve takes one layout file", o.Layout)
	}
	ln, err := net.Listen("tcp", addr)
	if err != nil {
		return fmt.Errorf("--addr %s: %w (pick another port, or :0 for a free one)", o.Addr, err)
	}
	srv := preview.New(o.Layout)
	h := srv.Handler()
	if loopback {
		h = preview.LoopbackOnly(h)
	}
	hs := &http.Server{Handler: h, ReadHeaderTimeout: 10 * time.Second}
	fmt.Fprintf(stdout, "serving http://%s/\n", ln.Addr().String())
	if !loopback {
		fmt.Fprintf(stderr, "arcwright: warning: listening on %s, which other computers can reach; the plan is served to anyone who asks. Use --addr 127.0.0.1:PORT to keep it on this computer.\n", addr)
	}
	if ps := srv.Problems(); len(ps) > 0 {
		for _, p := range ps {
			fmt.Fprintln(stderr, problemLine(p))
		}
		fmt.Fprintf(stderr, "arcwright: the layout has %d %s; the page lists %s until the file is fixed\n", len(ps), plural(len(ps), "problem", "problems"), plural(len(ps), "it", "them"))
	}
	fmt.Fprintf(stderr, "watching %s; Ctrl-C stops\n", o.Layout)

	watchCtx, stopWatch := context.WithCancel(ctx)
	defer stopWatch()
	watchErr := make(chan error, 1)
	go func() { watchErr <- srv.Watch(watchCtx) }()
	served := make(chan error, 1)
	go func() { served <- hs.Serve(ln) }()

	var failure error
	select {
	case <-ctx.Done():
	case err := <-served:
		failure = fmt.Errorf("serving %s: %w", addr, err)
	case err := <-watchErr:
		if err != nil && !errors.Is(err, context.Canceled) {
			failure = err
		}
	}
	srv.Close() // ends the event streams so that Shutdown does not wait on them
	sctx, cancel := context.WithTimeout(context.Background(), 3*time.Second)
	defer cancel()
	if err := hs.Shutdown(sctx); err != nil {
		hs.Close()
	}
	stopWatch()
	if failure == nil {
		fmt.Fprintln(stderr, "stopped")
	}
	return failure
}

// problemLine prints a problem as the other commands print a layout's
// errors: "file:line: key: message".
func problemLine(p preview.Problem) string {
	s := p.File
	if p.Line > 0 {
		s += ":" + strconv.Itoa(p.Line)
	}
	if p.Key != "" {
		s += ": " + p.Key
	}
	return s + ": " + p.Message
}
