" Syntax of Skerry scenario files (*.skerry), found through 'runtimepath' once skerry.lua has
" added editors/neovim to it. Neovim 0.7 has no semantic tokens, so this is all the colour a
" file gets there.

if exists('b:current_syntax')
  finish
endif

syntax keyword skerryDeclaration scenario units const include vehicle area zone target waypoint plan
syntax keyword skerryProperty dynamics start speed accel radius sides velocity moving heading climb altitude
syntax keyword skerryOption step horizon minimize clusters closed_loop solver time_limit gap threads guard pruning dimensions separation
syntax keyword skerryShape box polygon point
syntax keyword skerryConnective at to within max
syntax keyword skerryValue on off rest time fuel latest

" A number and the unit after it: `4 m`, `3kn`, `1 m/s^2`, `0.5%`, `2e-3 s`.
syntax match skerryNumber "\%(\<\d\+\%(\.\d*\)\=\|\.\d\+\)\%([eE][+-]\=\d\+\)\=" nextgroup=skerryUnit,skerryPercent skipwhite
" A keyword after a number is no unit (`0.1 fuel`, `3 at rest`).
syntax match skerryUnit "\a\+/\a\+\%(\^\d\|\d\)\=\|\%(\<\%(accel\|area\|at\|box\|closed_loop\|clusters\|const\|dynamics\|fuel\|gap\|guard\|heading\|horizon\|include\|max\|minimize\|moving\|off\|on\|plan\|point\|polygon\|pruning\|radius\|rest\|scenario\|sides\|solver\|speed\|start\|step\|target\|threads\|time\|time_limit\|to\|units\|vehicle\|velocity\|waypoint\|within\|zone\|altitude\|climb\|dimensions\|latest\|separation\)\>\)\@!\a\w*" contained
syntax match skerryUnit "\<\a\+/\a\+\%(\^\d\|\d\)\="
syntax match skerryPercent "%"

syntax region skerryString start=+"+ end=+"+ oneline
syntax match skerryComment "\%(//\|#\).*$" contains=@Spell
syntax region skerryComment start="/\*" end="\*/" contains=@Spell

highlight default link skerryDeclaration Statement
highlight default link skerryProperty Identifier
highlight default link skerryOption Identifier
highlight default link skerryShape Type
highlight default link skerryConnective Keyword
highlight default link skerryValue Constant
highlight default link skerryNumber Number
highlight default link skerryUnit Special
highlight default link skerryPercent Special
highlight default link skerryString String
highlight default link skerryComment Comment

let b:current_syntax = 'skerry'
