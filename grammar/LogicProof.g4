// The LogicProof equation language (.lpl): relay close-and-trip logic in an IEC 61131-style form.
// Keywords are case-insensitive, as in IEC 61131-3. Function blocks (TON, TOF, TP, R_TRIG, F_TRIG, SR, RS),
// functions (ABS, MIN, MAX) and past-time operators (PREV, ROSE, FELL, ONCE, HISTORICALLY, HELD, WITHIN) are
// ordinary calls resolved by name after parsing, so the grammar stays small and error messages stay precise.
grammar LogicProof;

options { caseInsensitive = true; }

// ---------------------------------------------------------------- file structure

scheme
    : header section* EOF
    ;

header
    : SCHEME name=IDENT description? SEMI
      FREQUENCY frequency=NUMBER frequencyUnit=IDENT SEMI
      SCAN scanInterval=duration SEMI
    ;

section
    : INPUTS inputDecl* END                     # inputsSection
    | SETTINGS settingDecl* END                 # settingsSection
    | LOCALS variableDecl* END                  # localsSection
    | OUTPUTS variableDecl* END                 # outputsSection
    | LOGIC equation* END                       # logicSection
    | ROLES roleBinding* END                    # rolesSection
    | BREAKER_MODEL plantSetting* END           # breakerModelSection
    | REQUIRE name=IDENT COLON expr SEMI        # requireStatement
    | ASSUME (name=IDENT COLON)? expr SEMI      # assumeStatement
    ;

description
    : STRING
    ;

// ---------------------------------------------------------------- declarations

inputDecl
    : name=IDENT COLON typeName range? description? SEMI
    ;

range
    : RANGE low=signedNumber DOTDOT high=signedNumber
    ;

settingDecl
    : name=IDENT COLON typeName EQ value=literal description? SEMI
    ;

// `init retained`: a non-volatile memory that keeps its value across a relay restart (IEC 61131-3 RETAIN). The
// word is an IDENT checked after parsing, so `retained` stays usable as a name elsewhere.
variableDecl
    : name=IDENT COLON typeName (INIT (initial=literal | retained=IDENT))? description? SEMI
    ;

typeName
    : BOOL
    | REAL
    | TIME
    ;

literal
    : TRUE                                      # trueLiteral
    | FALSE                                     # falseLiteral
    | signedNumber                              # numberLiteral
    | duration                                  # durationLiteral
    ;

signedNumber
    : MINUS? NUMBER
    ;

duration
    : TIME_LITERAL                              # iecDuration
    | NUMBER unit=IDENT                         # unitDuration
    ;

// ---------------------------------------------------------------- equations and formulas

equation
    : target=IDENT ASSIGN expr SEMI
    ;

// ANTLR gives the first alternative the tightest binding. From tightest to loosest: unary NOT and -, * /, + -,
// comparison, AND, XOR, OR, SINCE, -> (right-associative). The others are left-associative.
expr
    : op=(NOT | MINUS) operand=expr                                 # unaryExpr
    | left=expr op=(STAR | SLASH) right=expr                        # multiplicativeExpr
    | left=expr op=(PLUS | MINUS) right=expr                        # additiveExpr
    | left=expr op=(EQ | NEQ | LT | LE | GT | GE) right=expr         # compareExpr
    | left=expr AND right=expr                                      # andExpr
    | left=expr XOR right=expr                                      # xorExpr
    | left=expr OR right=expr                                       # orExpr
    | left=expr SINCE right=expr                                    # sinceExpr
    | <assoc = right> left=expr IMPLIES right=expr                   # impliesExpr
    | primary                                                       # primaryExpr
    ;

primary
    : LPAREN expr RPAREN                        # parenPrimary
    | TRUE                                      # truePrimary
    | FALSE                                     # falsePrimary
    | duration                                  # durationPrimary
    | NUMBER                                    # numberPrimary
    | callee=IDENT LPAREN (argument (COMMA argument)*)? RPAREN      # callPrimary
    | IDENT                                     # namePrimary
    ;

argument
    : (name=IDENT ASSIGN)? expr
    ;

// ---------------------------------------------------------------- roles and plant

roleBinding
    : role=IDENT EQ roleValue (COMMA roleValue)* SEMI
    ;

roleValue
    : IDENT                                     # nameRoleValue
    | duration                                  # durationRoleValue
    | TRUE                                      # trueRoleValue
    | FALSE                                     # falseRoleValue
    ;

plantSetting
    : key=IDENT EQ plantValue SEMI
    ;

plantValue
    : low=duration DOTDOT high=duration         # durationRangeValue
    | duration                                  # singleDurationValue
    | TRUE                                      # truePlantValue
    | FALSE                                     # falsePlantValue
    | IDENT                                     # namePlantValue
    ;

// ---------------------------------------------------------------- lexer

SCHEME          : 'scheme';
FREQUENCY       : 'frequency';
SCAN            : 'scan';
INPUTS          : 'inputs';
SETTINGS        : 'settings';
LOCALS          : 'locals';
OUTPUTS         : 'outputs';
LOGIC           : 'logic';
ROLES           : 'roles';
BREAKER_MODEL   : 'breaker_model';
END             : 'end';
REQUIRE         : 'require';
ASSUME          : 'assume';
BOOL            : 'bool';
REAL            : 'real';
TIME            : 'time';
RANGE           : 'range';
INIT            : 'init';
TRUE            : 'true';
FALSE           : 'false';
NOT             : 'not';
AND             : 'and';
OR              : 'or';
XOR             : 'xor';
SINCE           : 'since';

TIME_LITERAL    : ('t' | 'time') '#' [0-9a-z_.]+;

ASSIGN          : ':=';
IMPLIES         : '->';
DOTDOT          : '..';
NEQ             : '<>';
LE              : '<=';
GE              : '>=';
LT              : '<';
GT              : '>';
EQ              : '=';
PLUS            : '+';
MINUS           : '-';
STAR            : '*';
SLASH           : '/';
LPAREN          : '(';
RPAREN          : ')';
COMMA           : ',';
COLON           : ':';
SEMI            : ';';

NUMBER          : [0-9]+ ('.' [0-9]+)?;
IDENT           : [a-z_] [a-z0-9_]*;
STRING          : '"' (~["\r\n] | '""')* '"';

LINE_COMMENT    : '//' ~[\r\n]* -> channel(HIDDEN);
BLOCK_COMMENT   : '(*' .*? '*)' -> channel(HIDDEN);
WS              : [ \t\r\n\f]+ -> channel(HIDDEN);

// Any other character becomes a token the parser rejects, so the error names the character and its position.
UNEXPECTED_CHAR : .;
