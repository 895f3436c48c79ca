// The Skerry scenario language. Parser rules are named after what they declare; the compiler's
// AstBuilder has one method per rule. Keywords are soft where a name is expected (see `name`),
// so a zone may be called `box` or `time` without a clash.
grammar Skerry;

file
    : header? statement* EOF
    ;

header
    : SCENARIO name
    ;

statement
    : unitsDecl
    | constDecl
    | includeDecl
    | vehicleDecl
    | areaDecl
    | zoneDecl
    | targetDecl
    | waypointDecl
    | planDecl
    ;

unitsDecl
    : UNITS unitRef (',' unitRef)*
    ;

constDecl
    : CONST name '=' expr
    ;

includeDecl
    : INCLUDE STRING
    ;

vehicleDecl
    : VEHICLE name '{' vehicleItem* '}'
    ;

vehicleItem
    : DYNAMICS name                                            # dynamicsItem
    | START point startMotion?                                 # startItem
    | SPEED MAX expr                                           # speedItem
    | ACCEL MAX expr                                           # accelItem
    | RADIUS expr                                              # radiusItem
    | SIDES expr                                               # sidesItem
    | CLIMB MAX expr                                           # climbItem
    | CLIMB ACCEL MAX expr                                     # climbAccelItem
    | altitudeRange                                            # altitudeItem
    | TARGET name                                              # vehicleTargetItem
    ;

// A floor and a ceiling: `altitude 0 m to 60 m` (3-D scenarios only).
altitudeRange
    : ALTITUDE expr TO expr
    ;

startMotion
    : AT REST                                                  # atRest
    | VELOCITY point                                           # velocityVector
    | MOVING expr HEADING expr                                 # speedHeading
    ;

areaDecl
    : AREA name shape
    ;

zoneDecl
    : ZONE name shape
    ;

targetDecl
    : TARGET name targetShape arrival?
    ;

targetShape
    : shape                                                    # targetRegion
    | POINT point WITHIN expr                                  # targetPoint
    ;

arrival
    : AT REST
    ;

waypointDecl
    : WAYPOINT name point WITHIN expr
    ;

shape
    : BOX point TO point altitudeRange?                        # boxShape
    | POLYGON point+ altitudeRange?                            # polygonShape
    ;

planDecl
    : PLAN '{' planItem* '}'
    ;

planItem
    : STEP expr                                                # stepItem
    | HORIZON expr                                             # horizonItem
    | MINIMIZE objectiveTerm ('+' objectiveTerm)*              # minimizeItem
    | CLUSTERS simpleValue name?                               # clustersItem
    | CLOSED_LOOP MAX expr                                     # closedLoopItem
    | SOLVER name solverOption*                                # solverItem
    | GUARD onOff                                              # guardItem
    | PRUNING onOff                                            # pruningItem
    | SIDES expr                                               # planSidesItem
    | DIMENSIONS expr                                          # dimensionsItem
    | SEPARATION expr                                          # separationItem
    ;

// `latest` alone comes first, so `latest time` is never read as a constant named `latest`.
objectiveTerm
    : LATEST (TIME | FUEL)
    | simpleValue LATEST? (TIME | FUEL)
    | (TIME | FUEL)
    ;

// A value that cannot swallow the word after it as a unit: `clusters 2 ordered`, `0.1 fuel`.
simpleValue
    : NUMBER
    | name
    | '(' expr ')'
    ;

solverOption
    : TIME_LIMIT expr                                          # timeLimitOption
    | GAP expr                                                 # gapOption
    | THREADS expr                                             # threadsOption
    ;

onOff
    : ON
    | OFF
    ;

point
    : '(' expr (',' expr)+ ')' unitRef?
    ;

// Arithmetic on quantities. A number may carry a unit: `4 m`, `3 kn`, `1 m/s^2`, `0.5 %`.
expr
    : '-' expr                                                 # negate
    | expr op=('*' | '/') expr                                 # mulDiv
    | expr op=('+' | '-') expr                                 # addSub
    | '(' expr ')'                                             # parens
    | NUMBER unitRef?                                          # quantity
    | name                                                     # constRef
    ;

unitRef
    : UNIT
    | PERCENT
    | IDENT
    ;

// Names: identifiers, and keywords where a name is unambiguous.
name
    : IDENT
    | BOX | POLYGON | POINT | TIME | FUEL | REST | TO | ON | OFF | MAX | GAP | THREADS
    | STEP | SPEED | ACCEL | RADIUS | SIDES | START | GUARD | PRUNING | HEADING | MOVING
    | VELOCITY | WITHIN | DYNAMICS | AT
    | CLIMB | ALTITUDE | DIMENSIONS | SEPARATION | LATEST
    ;

SCENARIO    : 'scenario';
UNITS       : 'units';
CONST       : 'const';
INCLUDE     : 'include';
VEHICLE     : 'vehicle';
DYNAMICS    : 'dynamics';
START       : 'start';
AT          : 'at';
REST        : 'rest';
VELOCITY    : 'velocity';
MOVING      : 'moving';
HEADING     : 'heading';
SPEED       : 'speed';
ACCEL       : 'accel';
MAX         : 'max';
RADIUS      : 'radius';
SIDES       : 'sides';
AREA        : 'area';
ZONE        : 'zone';
TARGET      : 'target';
POINT       : 'point';
WITHIN      : 'within';
WAYPOINT    : 'waypoint';
BOX         : 'box';
TO          : 'to';
POLYGON     : 'polygon';
PLAN        : 'plan';
STEP        : 'step';
HORIZON     : 'horizon';
MINIMIZE    : 'minimize';
TIME        : 'time';
FUEL        : 'fuel';
CLUSTERS    : 'clusters';
CLOSED_LOOP : 'closed_loop';
SOLVER      : 'solver';
TIME_LIMIT  : 'time_limit';
GAP         : 'gap';
THREADS     : 'threads';
GUARD       : 'guard';
PRUNING     : 'pruning';
ON          : 'on';
CLIMB       : 'climb';
ALTITUDE    : 'altitude';
DIMENSIONS  : 'dimensions';
SEPARATION  : 'separation';
LATEST      : 'latest';
OFF         : 'off';

// Compound units are single tokens (no spaces inside): m/s, km/h, m/s^2, m/s2.
UNIT
    : [a-zA-Z]+ '/' [a-zA-Z]+ ( '^' [0-9] | [0-9] )?
    ;

PERCENT : '%';

NUMBER
    : [0-9]+ ('.' [0-9]*)? EXPONENT?
    | '.' [0-9]+ EXPONENT?
    ;

fragment EXPONENT : [eE] [+-]? [0-9]+;

STRING
    : '"' ~["\r\n]* '"'
    ;

IDENT
    : [a-zA-Z_] [a-zA-Z_0-9]*
    ;

LINE_COMMENT
    : ('//' | '#') ~[\r\n]* -> channel(HIDDEN)
    ;

BLOCK_COMMENT
    : '/*' .*? '*/' -> channel(HIDDEN)
    ;

WS
    : [ \t\r\n\f]+ -> channel(HIDDEN)
    ;

// Anything else becomes one token the parser reports, instead of a lexer error per character.
UNEXPECTED_CHAR
    : .
    ;
