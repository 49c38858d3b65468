package gui

import (
	"sync"

	"fyne.io/fyne/v2"
)

// measuringApp is the test app with a driver that remembers every text
// size it measured for the whole run. Fyne keeps its own sizes for a
// minute after last use; the tests open the same example a hundred times
// over several minutes, and measuring text is most of what a window
// costs on the test driver.
type measuringApp struct {
	fyne.App
	d *measuringDriver
}

// Driver returns the remembering driver.
func (a measuringApp) Driver() fyne.Driver { return a.d }

type textKey struct {
	text          string
	size          float32
	style         fyne.TextStyle
	source, theme string
}

type textSize struct {
	size fyne.Size
	base float32
}

// measuringDriver is the test driver with a lasting memory of text sizes.
type measuringDriver struct {
	fyne.Driver
	mu           sync.Mutex
	sizes        map[textKey]textSize
	calls, found int
}

// RenderedTextSize measures text once for the run. The key holds the
// theme's font for the style, so that a change of look measures again.
func (d *measuringDriver) RenderedTextSize(text string, size float32, style fyne.TextStyle, source fyne.Resource) (fyne.Size, float32) {
	k := textKey{text: text, size: size, style: style}
	if source != nil {
		k.source = source.Name()
	} else if f := fyne.CurrentApp().Settings().Theme().Font(style); f != nil {
		k.theme = f.Name()
	}
	d.mu.Lock()
	d.calls++
	m, ok := d.sizes[k]
	if ok {
		d.found++
	}
	d.mu.Unlock()
	if ok {
		return m.size, m.base
	}
	s, b := d.Driver.RenderedTextSize(text, size, style, source)
	d.mu.Lock()
	d.sizes[k] = textSize{s, b}
	d.mu.Unlock()
	return s, b
}
