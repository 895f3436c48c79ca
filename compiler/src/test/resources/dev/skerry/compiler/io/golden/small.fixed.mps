* Skerry MILP golden: 4 rows, 4 columns (2 integer), 9 non-zeros
* skerry-objective-sense: maximize
* The model maximises; this file minimises the negated objective.
* Negate the optimum a solver reports to get the model's.
* skerry-objective-constant: OBJCONST
* That column is fixed at 1; its cost is the objective constant.
* 1 name that fixed MPS cannot hold (over 8 characters, blanks or unusual characters) was replaced by an alias; the name map lists them.
NAME          golden
ROWS
 N  OBJ
 L  cap
 E  link
 G  floor
 G  band[1]
COLUMNS
    x         OBJ                 -3   cap                  1
    x         link                 1   floor                1
    x         band[1]              2
    MARKER    'MARKER'                 'INTORG'
    b         OBJ                 -2   cap                  4
    n         OBJ                  1   cap                  1
    n         floor                1   band[1]             -1
    MARKER    'MARKER'                 'INTEND'
    C0000001  OBJ               -0.5   link                -1
    OBJCONST  OBJ                -10
RHS
    RHS       cap                9.5   link               0.5
    RHS       floor               -1   band[1]             -2
RANGES
    RNG       band[1]             10
BOUNDS
 LO BND       x                    0
 UP BND       x                    4
 BV BND       b
 LO BND       n                   -3
 UP BND       n                    5
 FR BND       C0000001
 FX BND       OBJCONST             1
ENDATA
